import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { revokeReportLinks } from '@/lib/data/report-links';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { handle, idOf } from '@/lib/server/http';

/**
 * Revokes every customer link of the job's reports made so far (office and admins): each then answers
 * like any bad link, the PDF too. 200 { revokedAt }. A later report send makes a new, working link.
 */
export const DELETE = handle(async (_request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const user = await requireUser(DESK_ROLES);
  const id = await idOf(params, 'Job');
  return NextResponse.json(await revokeReportLinks(user, id));
});
