import { ADMIN_ONLY } from '@/lib/domain/vocabulary';
import { archiveCrew, getCrew, updateCrew } from '@/lib/data/crews';
import { recordItem } from '@/lib/routes/records';
import { crewPatchSchema } from '@/lib/validation/crews';

const routes = recordItem({
  kind: 'crew',
  what: 'Crew',
  patchSchema: crewPatchSchema,
  get: getCrew,
  update: updateCrew,
  archive: archiveCrew,
  writers: ADMIN_ONLY,
});
export const GET = routes.GET;
export const PATCH = routes.PATCH;
/** Archives the crew when it has jobs, deletes it otherwise. */
export const DELETE = routes.DELETE;
