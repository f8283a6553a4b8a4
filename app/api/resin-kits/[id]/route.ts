import { ADMIN_ONLY } from '@/lib/domain/vocabulary';
import { archiveResinKit, getResinKit, updateResinKit } from '@/lib/data/resin-kits';
import { recordItem } from '@/lib/routes/records';
import { resinKitPatchSchema } from '@/lib/validation/resin-kits';

/** GET answers the kit with the installs that used it. */
const routes = recordItem({
  kind: 'resinKit',
  what: 'Resin kit',
  patchSchema: resinKitPatchSchema,
  get: getResinKit,
  update: updateResinKit,
  archive: archiveResinKit,
  writers: ADMIN_ONLY,
});
export const GET = routes.GET;
export const PATCH = routes.PATCH;
/** Archives a kit an install used, deletes an unused one. */
export const DELETE = routes.DELETE;
