import { archiveResinKit, getResinKit, updateResinKit } from '@/lib/data/resin-kits';
import { settingsRecord } from '@/lib/server/settings-routes';
import { resinKitPatchSchema } from '@/lib/validation/resin-kits';

/** GET answers the kit with the installs that used it. */
const routes = settingsRecord({ kind: 'resinKit', what: 'Resin kit', patchSchema: resinKitPatchSchema, get: getResinKit, update: updateResinKit, archive: archiveResinKit });
export const GET = routes.GET;
export const PATCH = routes.PATCH;
/** Archives a kit an install used, deletes an unused one. */
export const DELETE = routes.DELETE;
