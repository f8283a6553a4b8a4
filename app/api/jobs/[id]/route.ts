import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { getJob } from '@/lib/data/jobs';
import { notFound } from '@/lib/errors';
import { handle } from '@/lib/http';
import { uuidSchema } from '@/lib/validation/common';

export type JobResponse = NonNullable<Awaited<ReturnType<typeof getJob>>>;

export const GET = handle(async (_request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const user = await requireUser();
  const { id } = await params;
  // A malformed id cannot name a job of this company: same answer as a foreign one.
  const job = uuidSchema.safeParse(id).success ? await getJob(user, id) : null;
  if (!job) throw notFound('Job');
  return NextResponse.json(job);
});
