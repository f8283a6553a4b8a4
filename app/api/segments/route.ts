import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { createSegment, listSegments } from '@/lib/data/segments';
import { csvResponse, toCsv } from '@/lib/server/csv';
import { DESK_ROLES, label } from '@/lib/domain/vocabulary';
import { bodyOf, handle, parseOrThrow, searchParamsOf, wantsCsv } from '@/lib/server/http';
import { segmentInputSchema, segmentListQuerySchema } from '@/lib/validation/segments';

/** A page of segments, or with `?format=csv` every segment the same filter matches (SI columns). */
export const GET = handle(async (request: Request) => {
  const user = await requireUser();
  const query = parseOrThrow(segmentListQuerySchema, searchParamsOf(request));
  if (!wantsCsv(request)) return NextResponse.json(await listSegments(user, query));
  const { items } = await listSegments(user, query, true);
  return csvResponse('segments', toCsv(items, [
    { header: 'Segment', value: (s) => s.label },
    { header: 'Site', value: (s) => s.site?.name },
    { header: 'Material', value: (s) => label(s.material) },
    { header: 'Nominal size (mm)', value: (s) => s.nominalSizeMm },
    { header: 'Inside diameter (mm)', value: (s) => s.insideDiameterMm },
    { header: 'Length (mm)', value: (s) => s.lengthMm },
    { header: 'Depth (mm)', value: (s) => s.depthMm },
    { header: 'Archived', value: (s) => (s.archivedAt ? 'yes' : 'no') },
  ]));
});

/** A new segment between two access points of one site (422 when an end is on another site). */
export const POST = handle(async (request: Request) => {
  const user = await requireUser(DESK_ROLES);
  const input = parseOrThrow(segmentInputSchema, await bodyOf(request));
  return NextResponse.json(await createSegment(user, input), { status: 201 });
});
