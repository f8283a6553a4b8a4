import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { createJob, listJobs } from '@/lib/data/jobs';
import { csvResponse, toCsv } from '@/lib/server/csv';
import { DESK_ROLES, label } from '@/lib/domain/vocabulary';
import { bodyOf, handle, parseOrThrow, searchParamsOf, wantsCsv } from '@/lib/server/http';
import { jobInputSchema, jobListQuerySchema } from '@/lib/validation/jobs';

/** A page of jobs, or with `?format=csv` every job the same filter matches. */
export const GET = handle(async (request: Request) => {
  const user = await requireUser();
  const query = parseOrThrow(jobListQuerySchema, searchParamsOf(request));
  if (!wantsCsv(request)) return NextResponse.json(await listJobs(user, query));
  const { items } = await listJobs(user, query, true);
  return csvResponse('jobs', toCsv(items, [
    { header: 'Number', value: (j) => j.number },
    { header: 'Title', value: (j) => j.title },
    { header: 'Customer', value: (j) => j.customer?.name },
    { header: 'Site', value: (j) => j.site?.addressLine },
    { header: 'City', value: (j) => j.site?.city },
    { header: 'Status', value: (j) => label(j.status) },
    { header: 'Scheduled', value: (j) => j.scheduledDate },
    { header: 'Crew', value: (j) => j.crew?.name },
    { header: 'Archived', value: (j) => (j.archivedAt ? 'yes' : 'no') },
  ]));
});

export const POST = handle(async (request: Request) => {
  const user = await requireUser(DESK_ROLES);
  const input = parseOrThrow(jobInputSchema, await bodyOf(request));
  return NextResponse.json(await createJob(user, input), { status: 201 });
});
