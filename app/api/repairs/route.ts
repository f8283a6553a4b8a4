import { createRepair, listRepairs } from '@/lib/data/repairs';
import { DESK_ROLES, label } from '@/lib/domain/vocabulary';
import { recordCollection } from '@/lib/routes/records';
import { repairInputSchema, repairListQuerySchema } from '@/lib/validation/repairs';

/** A page of repairs, or with `?format=csv` every repair the same filter matches (lengths in mm, as stored). */
const routes = recordCollection({
  csvName: 'repairs',
  writers: DESK_ROLES,
  querySchema: repairListQuerySchema,
  inputSchema: repairInputSchema,
  list: listRepairs,
  create: createRepair,
  csv: [
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
  ],
});
export const GET = routes.GET;
export const POST = routes.POST;
