import { createSegment, listSegments } from '@/lib/data/segments';
import { DESK_ROLES, label } from '@/lib/domain/vocabulary';
import { recordCollection } from '@/lib/routes/records';
import { segmentInputSchema, segmentListQuerySchema } from '@/lib/validation/segments';

// GET: A page of segments, or with `?format=csv` every segment the same filter matches (SI columns).
// POST: A new segment between two access points of one site (422 when an end is on another site).
const routes = recordCollection({
  csvName: 'segments',
  writers: DESK_ROLES,
  querySchema: segmentListQuerySchema,
  inputSchema: segmentInputSchema,
  list: listSegments,
  create: createSegment,
  csv: [
    { header: 'Segment', value: (s) => s.label },
    { header: 'Site', value: (s) => s.site?.name },
    { header: 'Material', value: (s) => label(s.material) },
    { header: 'Nominal size (mm)', value: (s) => s.nominalSizeMm },
    { header: 'Inside diameter (mm)', value: (s) => s.insideDiameterMm },
    { header: 'Length (mm)', value: (s) => s.lengthMm },
    { header: 'Depth (mm)', value: (s) => s.depthMm },
    { header: 'Archived', value: (s) => (s.archivedAt ? 'yes' : 'no') },
  ],
});
export const GET = routes.GET;
export const POST = routes.POST;
