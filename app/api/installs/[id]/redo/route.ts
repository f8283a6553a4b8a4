import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { redoInstall } from '@/lib/data/redo';
import { bodyOf, handle, idOf, parseOrThrow } from '@/lib/http';
import { redoInstallSchema } from '@/lib/validation/install-events';

export type RedoInstallResponse = Awaited<ReturnType<typeof redoInstall>>;

/**
 * "Redo this patch": a new install on the same repair, linked to the one it replaces (201; a retry
 * with the same id answers 200). Foreman of the install's crew or an admin (403 otherwise); another
 * company's install is 404; only after a failed inspection or a send-back (409 otherwise).
 */
export const POST = handle(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const user = await requireUser();
  const id = await idOf(params, 'Install');
  // The body is optional: without one the server makes the new install's id.
  const text = await request.clone().text();
  const input = parseOrThrow(redoInstallSchema, text.trim() ? await bodyOf(request) : {});
  const { install, created } = await redoInstall(user, id, input);
  return NextResponse.json({ install, created }, { status: created ? 201 : 200 });
});
