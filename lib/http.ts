import 'server-only';
import { randomUUID } from 'node:crypto';
import { NextResponse } from 'next/server';
import type { z } from 'zod';
import { AppError } from '@/lib/errors';

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
        return NextResponse.json({ error: { message: error.message, ...(error.fields ? { fields: error.fields } : {}) } }, { status: error.status });
      }
      const requestId = randomUUID();
      console.error(`[${requestId}]`, error);
      return NextResponse.json({ error: { message: 'Something went wrong on our side.', requestId } }, { status: 500 });
    }
  };
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
export const searchParamsOf = (request: Request) => Object.fromEntries(new URL(request.url).searchParams);
