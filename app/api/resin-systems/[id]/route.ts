import { archiveResinSystem, getResinSystem, updateResinSystem } from '@/lib/data/resin-systems';
import { settingsRecord } from '@/lib/server/settings-routes';
import { resinSystemPatchSchema } from '@/lib/validation/resin-systems';

const routes = settingsRecord({ kind: 'resinSystem', what: 'Resin system', patchSchema: resinSystemPatchSchema, get: getResinSystem, update: updateResinSystem, archive: archiveResinSystem });
export const GET = routes.GET;
export const PATCH = routes.PATCH;
/** Archives a resin system that kits or installs name, deletes an unused one. */
export const DELETE = routes.DELETE;
