import { archiveSegment, getSegment, updateSegment } from '@/lib/data/segments';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { recordItem } from '@/lib/routes/records';
import { segmentPatchSchema } from '@/lib/validation/segments';

const routes = recordItem({
  kind: 'segment',
  what: 'Segment',
  patchSchema: segmentPatchSchema,
  get: getSegment,
  update: updateSegment,
  archive: archiveSegment,
  writers: DESK_ROLES,
});
/** The segment with its site, both access points and its repairs. */
export const GET = routes.GET;
export const PATCH = routes.PATCH;
/** Archives the segment when repairs depend on it, deletes it otherwise. */
export const DELETE = routes.DELETE;
