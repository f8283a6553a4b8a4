// Thrown for any input the resin clock cannot honestly answer; callers show the message
// rather than a plan built on NaN or an Invalid Date.
export class CureInputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'CureInputError';
  }
}
