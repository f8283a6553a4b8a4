'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import type { FieldValues, UseFormSetError } from 'react-hook-form';
import { useCloseEditSection } from '@/components/desk/edit-section';
import { applyServerErrors, submitJson, type ApiFailure } from '@/lib/client/submit-json';

/**
 * Saving a desk record's form: `save` POSTs to the collection (new) or PATCHes `collection/id` (edit). A failure
 * puts the server's field messages on the form (`rename` maps the API's field names to the form's) and keeps the
 * general one in `message`; a success closes the EditSection, goes to `next(savedId)` and refreshes.
 *
 * Settings forms pass `dirty` (the form's dirtyFields): an edit then PATCHes only the fields the admin changed, so
 * an untouched value is never rounded again on its way through the company's units (nothing changed: no request).
 * `together` lists fields that travel as a group when any of them changed.
 */
export function useSaveRecord<F extends FieldValues>(setError: UseFormSetError<F>) {
  const router = useRouter();
  const closeEdit = useCloseEditSection();
  const [message, setMessage] = useState<string>();
  const save = async ({
    collection,
    id,
    body,
    next,
    rename = (error) => error,
    dirty,
    together = [],
  }: {
    collection: string;
    id?: string;
    body: Record<string, unknown>;
    next: (savedId: string) => string;
    rename?: (error: ApiFailure) => ApiFailure;
    dirty?: Partial<Record<string, unknown>>;
    together?: string[];
  }) => {
    const done = (savedId: string) => {
      closeEdit?.();
      router.push(next(savedId));
      router.refresh();
    };
    let sent = body;
    if (id && dirty) {
      const changed = new Set(Object.keys(dirty).filter((key) => key in body));
      if (together.some((key) => changed.has(key))) together.forEach((key) => changed.add(key));
      sent = Object.fromEntries([...changed].map((key) => [key, body[key]]));
    }
    if (id && dirty && Object.keys(sent).length === 0) return done(id);
    const result = id
      ? await submitJson<{ id: string }>(`${collection}/${id}`, 'PATCH', sent)
      : await submitJson<{ id: string }>(collection, 'POST', sent);
    if (!result.ok) return setMessage(applyServerErrors(rename(result.error), setError));
    setMessage(undefined);
    done(result.data.id);
  };
  return { message, setMessage, save };
}
