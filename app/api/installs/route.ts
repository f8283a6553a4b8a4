import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { csvResponse, toCsv } from '@/lib/server/csv';
import { createInstall, type CreateInstallResponse } from '@/lib/data/installs';
import { listInstalls } from '@/lib/data/install-list';
import { label } from '@/lib/domain/vocabulary';
import { bodyOrUndefined, handle, parseOrThrow, searchParamsOf, wantsCsv } from '@/lib/server/http';
import { createInstallSchema } from '@/lib/validation/install-events';
import { installListQuerySchema } from '@/lib/validation/reviews';

/**
 * A page of installs with their quality flags (`?status=awaiting_review` is the office's queue;
 * `sort=severity` puts the worst flags first), or with `?format=csv` every install the filter matches.
 */
export const GET = handle(async (request: Request) => {
  const user = await requireUser();
  const query = parseOrThrow(installListQuerySchema, searchParamsOf(request));
  if (!wantsCsv(request)) return NextResponse.json(await listInstalls(user, query));
  const { items } = await listInstalls(user, query, true);
  return csvResponse(
    'installs',
    toCsv(items, [
      { header: 'Job', value: (i) => i.job.number },
      { header: 'Customer', value: (i) => i.customer.name },
      { header: 'Site', value: (i) => `${i.site.addressLine}, ${i.site.city}` },
      { header: 'Crew', value: (i) => i.crew?.name },
      { header: 'Repair', value: (i) => i.repair.position },
      { header: 'Status', value: (i) => label(i.status) },
      { header: 'Finished', value: (i) => i.finishedAt?.toISOString() },
      { header: 'Flags', value: (i) => i.flags.map((f) => `${f.severity}: ${f.message}`).join(' | ') },
    ]),
  );
});

/** Starts an install; a retried create (same id and repair) answers 200 with the first one. */
export const POST = handle(async (request: Request) => {
  const user = await requireUser();
  const input = parseOrThrow(createInstallSchema, await bodyOrUndefined(request));
  const { install, created } = await createInstall(user, input);
  return NextResponse.json({ install } satisfies CreateInstallResponse, { status: created ? 201 : 200 });
});
