import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { createInstall, type InstallRow } from '@/lib/data/installs';
import { handle, parseOrThrow } from '@/lib/http';
import { createInstallSchema } from '@/lib/validation/install-events';

export type CreateInstallResponse = { install: InstallRow };

/** Starts an install; a retried create (same id and repair) answers 200 with the first one. */
export const POST = handle(async (request: Request) => {
  const user = await requireUser();
  const input = parseOrThrow(createInstallSchema, await request.json().catch(() => undefined));
  const { install, created } = await createInstall(user, input);
  return NextResponse.json({ install } satisfies CreateInstallResponse, { status: created ? 201 : 200 });
});
