import { archivePacker, getPacker, updatePacker } from '@/lib/data/packers';
import { settingsRecord } from '@/lib/server/settings-routes';
import { packerPatchSchema } from '@/lib/validation/packers';

const routes = settingsRecord({ kind: 'packer', what: 'Packer', patchSchema: packerPatchSchema, get: getPacker, update: updatePacker, archive: archivePacker });
export const GET = routes.GET;
export const PATCH = routes.PATCH;
/** Archives a packer an install used, deletes an unused one. */
export const DELETE = routes.DELETE;
