import { NextResponse } from 'next/server';
import { requireUser } from '@/lib/auth/session';
import { createRepair, listRepairs } from '@/lib/data/repairs';
import { csvResponse, toCsv } from '@/lib/server/csv';
import { DESK_ROLES, label } from '@/lib/domain/vocabulary';
import { bodyOf, handle, parseOrThrow, searchParamsOf, wantsCsv } from '@/lib/server/http';
import { repairInputSchema, repairListQuerySchema } from '@/lib/validation/repairs';

/** A page of repairs, or with `?format=csv` every repair the same filter matches (lengths in mm, as stored). */
export const GET = handle(async (request: Request) => {
  const user = await requireUser();
  const query = parseOrThrow(repairListQuerySchema, searchParamsOf(request));
  if (!wantsCsv(request)) return NextResponse.json(await listRepairs(user, query));
  const { items } = await listRepairs(user, query, true);
  return csvResponse('repairs', toCsv(items, [
    { header: 'Job', value: (r) => r.job.number },
    { header: 'Position', value: (r) => r.position },
    { header: 'Segment', value: (r) => r.segment.label },
    { header: 'Distance (mm)', value: (r) => r.distanceMm },
    { header: 'Defect', value: (r) => label(r.defectType) },
    { header: 'Grade', value: (r) => r.conditionGrade },
    { header: 'Defect length (mm)', value: (r) => r.defectLengthMm },
    { header: 'Clock position', value: (r) => r.clockPosition },
    { header: 'Patch length (mm)', value: (r) => r.plannedPatchLengthMm },
    { header: 'Status', value: (r) => label(r.status) },
    { header: 'Notes', value: (r) => r.notes },
  ]));
});

export const POST = handle(async (request: Request) => {
  const user = await requireUser(DESK_ROLES);
  const input = parseOrThrow(repairInputSchema, await bodyOf(request));
  return NextResponse.json(await createRepair(user, input), { status: 201 });
});
