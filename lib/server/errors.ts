// Expected failures carry an HTTP status and a sentence for the user; anything else is a bug.
export class AppError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly fields?: Record<string, string[]>,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

export const unauthorized = () => new AppError(401, 'Please sign in.');
export const forbidden = (message = 'Your role does not allow this.') => new AppError(403, message);
export const notFound = (what = 'That record') => new AppError(404, `${what} was not found.`);
