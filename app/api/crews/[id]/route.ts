import { archiveCrew, getCrew, updateCrew } from '@/lib/data/crews';
import { recordItem } from '@/lib/routes/records';
import { crewPatchSchema } from '@/lib/validation/crews';

export type CrewResponse = Awaited<ReturnType<typeof getCrew>>;

const routes = recordItem({
  kind: 'crew',
  what: 'Crew',
  patchSchema: crewPatchSchema,
  get: getCrew,
  update: updateCrew,
  archive: archiveCrew,
  writers: ['admin'],
});
export const GET = routes.GET;
export const PATCH = routes.PATCH;
/** Archives the crew when it has jobs, deletes it otherwise. */
export const DELETE = routes.DELETE;
