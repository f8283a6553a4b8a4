import { ADMIN_ONLY } from '@/lib/domain/vocabulary';
import { archivePacker, getPacker, updatePacker } from '@/lib/data/packers';
import { recordItem } from '@/lib/routes/records';
import { packerPatchSchema } from '@/lib/validation/packers';

const routes = recordItem({
  kind: 'packer',
  what: 'Packer',
  patchSchema: packerPatchSchema,
  get: getPacker,
  update: updatePacker,
  archive: archivePacker,
  writers: ADMIN_ONLY,
});
export const GET = routes.GET;
export const PATCH = routes.PATCH;
/** Archives a packer an install used, deletes an unused one. */
export const DELETE = routes.DELETE;
