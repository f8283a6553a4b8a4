import { FROM_CACHE_HEADER } from './cache-rules';
import { recordServerDate } from '@/lib/client/server-time';

/** A non-2xx answer (status and the server's message) or no answer at all (status 0). */
export class FetchError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly fields?: Record<string, string[]>,
  ) {
    super(message);
    this.name = 'FetchError';
  }
}

/**
 * The one SWR fetcher: JSON or a FetchError carrying the server's `error.message`. Every
 * response fresh from the network also corrects the clock the countdowns run on.
 */
export async function fetchJson<T = unknown>(url: string, init?: RequestInit): Promise<T> {
  const started = Date.now();
  const headers = new Headers(init?.headers);
  if (!headers.has('accept')) headers.set('accept', 'application/json');
  let response: Response;
  try {
    // no-store: an answer from the HTTP cache would carry an old Date header and old data.
    response = await fetch(url, { cache: 'no-store', ...init, headers });
  } catch {
    throw new FetchError(0, 'Could not reach the server. Check the signal and try again.');
  }
  if (!response.headers.get(FROM_CACHE_HEADER)) recordServerDate(response.headers.get('date'), started, Date.now());

  const body: unknown = await response.json().catch(() => undefined);
  if (!response.ok) {
    const error = errorOf(body);
    throw new FetchError(response.status, error?.message ?? `The server answered ${response.status}.`, error?.fields);
  }
  return body as T;
}

/** The `{ error: { message, fields? } }` shape every route answers with (lib/http.ts). */
export function errorOf(body: unknown): { message: string; fields?: Record<string, string[]> } | undefined {
  if (typeof body !== 'object' || body === null || !('error' in body)) return undefined;
  const error = (body as { error: unknown }).error;
  if (typeof error !== 'object' || error === null || typeof (error as { message?: unknown }).message !== 'string')
    return undefined;
  return error as { message: string; fields?: Record<string, string[]> };
}
