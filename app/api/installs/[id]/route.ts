import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { getInstallView } from '@/lib/data/installs';
import { notFound } from '@/lib/server/errors';
import { handle } from '@/lib/server/http';
import { uuidSchema } from '@/lib/validation/common';

export const GET = handle(async (_request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const user = await requireUser();
  const { id } = await params;
  // A malformed id cannot name an install of this company: same answer as a foreign one.
  if (!uuidSchema.safeParse(id).success) throw notFound('Install');
  const view = await getInstallView(user, id);
  // The clock moves: a cached copy would show the crew a stale plan.
  return NextResponse.json(view, { headers: { 'Cache-Control': 'no-store' } });
});
