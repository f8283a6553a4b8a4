import { archiveJob, findJob, updateJob } from '@/lib/data/jobs';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { recordItem } from '@/lib/routes/records';
import { jobPatchSchema } from '@/lib/validation/jobs';

const routes = recordItem({
  kind: 'job',
  what: 'Job',
  patchSchema: jobPatchSchema,
  get: findJob,
  update: updateJob,
  archive: archiveJob,
  writers: DESK_ROLES,
});
export const GET = routes.GET;
export const PATCH = routes.PATCH;
/** Archives the job when it has repairs or installs, deletes it otherwise. */
export const DELETE = routes.DELETE;
