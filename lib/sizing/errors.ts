// One error type for impossible sizing input, so a form can show the message instead of a
// patch length or resin quantity computed from NaN.
export class SizingInputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'SizingInputError';
  }
}
