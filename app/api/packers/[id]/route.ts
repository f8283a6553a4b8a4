import { archivePacker, getPacker, updatePacker } from '@/lib/data/packers';
import { recordItem } from '@/lib/routes/records';
import { packerPatchSchema } from '@/lib/validation/packers';

export type PackerResponse = Awaited<ReturnType<typeof getPacker>>;

const routes = recordItem({
  kind: 'packer',
  what: 'Packer',
  patchSchema: packerPatchSchema,
  get: getPacker,
  update: updatePacker,
  archive: archivePacker,
  writers: ['admin'],
});
export const GET = routes.GET;
export const PATCH = routes.PATCH;
/** Archives a packer an install used, deletes an unused one. */
export const DELETE = routes.DELETE;
