import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { listJobs } from '@/lib/data/jobs';
import { handle, parseOrThrow, searchParamsOf } from '@/lib/http';
import { jobListQuerySchema } from '@/lib/validation/jobs';

export type JobListResponse = Awaited<ReturnType<typeof listJobs>>;

export const GET = handle(async (request: Request) => {
  const user = await requireUser();
  const query = parseOrThrow(jobListQuerySchema, searchParamsOf(request));
  return NextResponse.json(await listJobs(user, query));
});
