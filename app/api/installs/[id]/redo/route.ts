import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { REDO_ROLES, redoInstall } from '@/lib/data/redo';
import { handle, idOf, optionalBodyOf, parseOrThrow } from '@/lib/server/http';
import { redoInstallSchema } from '@/lib/validation/install-events';

/**
 * "Redo this patch": a new install on the same repair, linked to the one it replaces (201; a retry
 * with the same id answers 200). Foreman of the install's crew or an admin (403 otherwise); another
 * company's install is 404; only after a failed inspection or a send-back (409 otherwise).
 */
export const POST = handle(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  // Who may, before what they sent: a refused caller learns nothing from the body's checks.
  const user = await requireUser(REDO_ROLES);
  const id = await idOf(params, 'Install');
  // The body is optional: without one the server makes the new install's id.
  const input = parseOrThrow(redoInstallSchema, (await optionalBodyOf(request)) ?? {});
  const { install, created } = await redoInstall(user, id, input);
  return NextResponse.json({ install, created }, { status: created ? 201 : 200 });
});
