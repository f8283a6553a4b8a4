import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { listReportSends } from '@/lib/data/report-sends';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { handle, idOf } from '@/lib/server/http';

export const GET = handle(async (_request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const user = await requireUser(DESK_ROLES);
  const id = await idOf(params, 'Job');
  return NextResponse.json(await listReportSends(user, id));
});
