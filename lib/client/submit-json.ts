import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { fetchJson, FetchError } from './fetch-json';

export type ApiFailure = { message: string; fields?: Record<string, string[]> };

/** Sends JSON to one of our API routes; resolves with the body, or with the API's error shape (never throws). */
export async function submitJson<T>(
  url: string,
  method: 'POST' | 'PATCH' | 'PUT' | 'DELETE',
  body?: unknown,
): Promise<{ ok: true; data: T } | { ok: false; error: ApiFailure }> {
  try {
    const init: RequestInit =
      body === undefined
        ? { method }
        : { method, headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) };
    return { ok: true, data: await fetchJson<T>(url, init) };
  } catch (error) {
    if (error instanceof FetchError) return { ok: false, error: { message: error.message, fields: error.fields } };
    throw error;
  }
}

/** Puts the server's per-field messages on the form's fields; returns the general message. */
export function applyServerErrors<F extends FieldValues>(error: ApiFailure, setError: UseFormSetError<F>) {
  for (const [field, messages] of Object.entries(error.fields ?? {})) {
    setError(field as Path<F>, { type: 'server', message: messages[0] });
  }
  return error.message;
}
