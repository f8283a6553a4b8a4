import type { LibMessage } from '@/lib/i18n/message';

// Expected failures carry an HTTP status and a sentence for the user; anything else is a bug. `said` is the same
// sentence as a catalogue message, for a route that answers in the user's language (lib/server/in-language.ts).
export class AppError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly fields?: Record<string, string[]>,
    readonly said?: LibMessage,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

export const unauthorized = () => new AppError(401, 'Please sign in.');
export const forbidden = (message = 'Your role does not allow this.') => new AppError(403, message);
export const notFound = (what = 'That record') => new AppError(404, `${what} was not found.`);

/** A refusal of pure code (`{ text, detail }`) as an AppError that can be answered in the user's language. */
export const refused = (status: number, r: { text: string; detail: LibMessage }, fields?: Record<string, string[]>) =>
  new AppError(status, r.text, fields, r.detail);
