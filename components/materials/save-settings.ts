'use client';

import type { FieldValues, UseFormSetError } from 'react-hook-form';
import { applyServerErrors, submitJson } from '@/lib/client/submit-json';

/**
 * Saves a settings form: POST the whole record when new; on an edit PATCH only the fields the admin
 * changed (so an untouched value is never rounded again on its way through the company's units).
 * `together` lists fields that travel as a group when any of them changed.
 * Resolves with the saved row's id, or undefined after putting the server's messages on the form.
 */
export async function saveSettings<F extends FieldValues>({
  collection,
  id,
  values,
  dirty,
  together = [],
  setError,
  setMessage,
}: {
  collection: string;
  id?: string;
  values: Record<string, unknown>;
  dirty: Partial<Record<string, unknown>>;
  together?: string[];
  setError: UseFormSetError<F>;
  setMessage: (message: string | undefined) => void;
}): Promise<string | undefined> {
  let body: Record<string, unknown> = values;
  if (id) {
    const changed = new Set(Object.keys(dirty).filter((key) => key in values));
    if (together.some((key) => changed.has(key))) together.forEach((key) => changed.add(key));
    body = Object.fromEntries([...changed].map((key) => [key, values[key]]));
    if (changed.size === 0) return id;
  }
  const result = id
    ? await submitJson<{ id: string }>(`${collection}/${id}`, 'PATCH', body)
    : await submitJson<{ id: string }>(collection, 'POST', body);
  if (!result.ok) {
    setMessage(applyServerErrors(result.error, setError));
    return undefined;
  }
  setMessage(undefined);
  return result.data.id;
}
