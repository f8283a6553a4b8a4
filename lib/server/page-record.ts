import 'server-only';
import { notFound } from 'next/navigation';
import { AppError } from '@/lib/server/errors';
import { uuidSchema } from '@/lib/validation/common';

/**
 * Loads the record a detail page is about: a malformed id or a 404 from the data layer shows the
 * not-found page (the same for "not yours" as for "not there"); any other failure is a real error.
 */
export async function recordForPage<T>(id: string, load: (id: string) => Promise<T>): Promise<T> {
  if (!uuidSchema.safeParse(id).success) notFound();
  try {
    return await load(id);
  } catch (error) {
    if (error instanceof AppError && error.status === 404) notFound();
    throw error;
  }
}
