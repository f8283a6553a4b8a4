import 'server-only';
import { randomUUID } from 'node:crypto';
import { NextResponse } from 'next/server';
import type { z } from 'zod';
import { AppError } from '@/lib/server/errors';
import { MAX_BODY_BYTES } from '@/lib/server/http-limits';
import { filledParams } from '@/lib/validation/list';

/**
 * Wraps a route handler: expected failures become their status with `{ error: { message, fields? } }`;
 * anything else is logged with a request id and answered with a generic 500.
 */
export function handle<Args extends unknown[]>(fn: (...args: Args) => Promise<Response>) {
  return async (...args: Args): Promise<Response> => {
    try {
      return await fn(...args);
    } catch (error) {
      if (error instanceof AppError) {
        return NextResponse.json(
          { error: { message: error.message, ...(error.fields ? { fields: error.fields } : {}) } },
          { status: error.status },
        );
      }
      const refused = databaseRefusal(error);
      if (refused) {
        // The database's own constraints caught what validation let through: still the client's input, so a 4xx
        // (the transaction rolled back), logged so the missing check gets written.
        console.warn('database refused input:', (error as Error).message);
        return NextResponse.json({ error: { message: refused.message } }, { status: refused.status });
      }
      const requestId = randomUUID();
      console.error(`[${requestId}]`, error);
      return NextResponse.json({ error: { message: 'Something went wrong on our side.', requestId } }, { status: 500 });
    }
  };
}

/** PostgreSQL error classes that mean "this input does not fit", by SQLSTATE (PostgreSQL manual, Appendix A). */
const INPUT_ERRORS: Record<string, { status: number; message: string }> = {
  '23514': { status: 422, message: 'Those values do not fit together: check the related fields.' },
  '23505': { status: 409, message: 'A record with those details already exists.' },
  '23503': { status: 422, message: 'That refers to a record that does not exist.' },
  '23502': { status: 400, message: 'A required value is missing.' },
  '22001': { status: 400, message: 'A text is too long.' },
  '22003': { status: 400, message: 'A number is out of range.' },
  '22007': { status: 400, message: 'A date or time is not valid.' },
  '22008': { status: 400, message: 'A date or time is out of range.' },
  '22021': { status: 400, message: 'A text holds a character that cannot be stored.' },
  '22P02': { status: 400, message: 'A value has the wrong form.' },
};

function databaseRefusal(error: unknown) {
  const code = (error as { parent?: { code?: unknown }; original?: { code?: unknown } } | null)?.parent?.code;
  return typeof code === 'string' ? INPUT_ERRORS[code] : undefined;
}

/** Parses input with a zod schema or throws a 400 with the message of each field. */
export function parseOrThrow<S extends z.ZodType>(schema: S, input: unknown, status = 400): z.infer<S> {
  const result = schema.safeParse(input);
  if (result.success) return result.data;
  const fields: Record<string, string[]> = {};
  for (const issue of result.error.issues) {
    const key = issue.path.join('.') || '_';
    (fields[key] ??= []).push(issue.message);
  }
  const first = result.error.issues[0];
  const where = first.path.length ? `${first.path.join('.')}: ` : '';
  throw new AppError(status, `Invalid input — ${where}${first.message}`, fields);
}

/** Query-string parameters as a plain object for zod. */
export const searchParamsOf = (request: Request) =>
  withoutNul(filledParams(Object.fromEntries(new URL(request.url).searchParams)));

/**
 * The body as text, counting bytes as they arrive: over `limit` is a 413 and reading stops, so a body
 * sent without a Content-Length (chunked) is held to the same limit as one that declares it.
 */
export async function readBodyText(request: Request, limit = MAX_BODY_BYTES): Promise<string> {
  const declared = Number(request.headers.get('content-length'));
  if (Number.isFinite(declared) && declared > limit) throw tooLarge(limit);
  if (!request.body) return '';
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > limit) {
      await reader.cancel().catch(() => undefined);
      throw tooLarge(limit);
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks).toString('utf8');
}

const tooLarge = (limit: number) =>
  new AppError(413, `The request body is larger than ${Math.round(limit / 1024)} KB.`);

/** True when the request says its body is JSON (`application/json`, any parameters). */
const isJsonRequest = (request: Request) =>
  /^application\/json\s*(;|$)/i.test(request.headers.get('content-type')?.trim() ?? '');

/**
 * The JSON body of a request. Empty is a 400, a body that is not declared `application/json` is a 415
 * (a cross-site form can post text/plain, never JSON), over 1 MB is a 413, unparsable is a 400 — never a 500.
 */
export async function bodyOf(request: Request): Promise<unknown> {
  const body = await optionalBodyOf(request);
  if (body === undefined) throw new AppError(400, 'Send a JSON body.');
  return body;
}

/** The same as bodyOf, except that an empty body is `undefined` (for routes whose body is optional). */
export const optionalBodyOf = (request: Request) => jsonBodyOf(request, { unparsable: 'refuse' });

/** The same as bodyOf, except that a missing or unparsable body is `undefined` (for routes that validate it as empty). */
export const bodyOrUndefined = (request: Request) => jsonBodyOf(request, { unparsable: 'undefined' });

async function jsonBodyOf(request: Request, options: { unparsable: 'refuse' | 'undefined' }): Promise<unknown> {
  const text = await readBodyText(request);
  if (!text.trim()) return undefined;
  if (!isJsonRequest(request)) throw new AppError(415, 'Send the body as application/json.');
  let body: unknown;
  try {
    body = JSON.parse(text);
  } catch {
    if (options.unparsable === 'undefined') return undefined;
    throw new AppError(400, 'The body is not valid JSON.');
  }
  // Text with a NUL character is a 400 either way.
  return withoutNul(body);
}

/**
 * PostgreSQL text cannot hold U+0000: a string carrying one would fail in the database as a 500. Refused here,
 * at the edge, for every key and value of a JSON body.
 */
function withoutNul<T>(value: T): T {
  const hasNul = (v: unknown): boolean => {
    if (typeof v === 'string') return v.includes('\u0000');
    if (Array.isArray(v)) return v.some(hasNul);
    if (v && typeof v === 'object')
      return Object.entries(v).some(([key, item]) => key.includes('\u0000') || hasNul(item));
    return false;
  };
  if (hasNul(value)) throw new AppError(400, 'Text may not contain the NUL character (U+0000).');
  return value;
}

/** The `[id]` of a dynamic route; a malformed id cannot name a row of this company, so it is a plain 404. */
export async function idOf(params: Promise<Record<string, string>>, what = 'That record', key = 'id'): Promise<string> {
  const id = (await params)[key];
  if (!UUID.test(id ?? '')) throw new AppError(404, `${what} was not found.`);
  return id;
}
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** True when a list request asks for its CSV export (`?format=csv`) rather than a JSON page. */
export const wantsCsv = (request: Request) => new URL(request.url).searchParams.get('format') === 'csv';
