import { ADMIN_ONLY } from '@/lib/domain/vocabulary';
import { archiveResinSystem, getResinSystem, updateResinSystem } from '@/lib/data/resin-systems';
import { recordItem } from '@/lib/routes/records';
import { resinSystemPatchSchema } from '@/lib/validation/resin-systems';

const routes = recordItem({
  kind: 'resinSystem',
  what: 'Resin system',
  patchSchema: resinSystemPatchSchema,
  get: getResinSystem,
  update: updateResinSystem,
  archive: archiveResinSystem,
  writers: ADMIN_ONLY,
});
export const GET = routes.GET;
export const PATCH = routes.PATCH;
/** Archives a resin system that kits or installs name, deletes an unused one. */
export const DELETE = routes.DELETE;
