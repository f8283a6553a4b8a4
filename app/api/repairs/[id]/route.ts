import { getRepair, removeRepair, updateRepair } from '@/lib/data/repairs';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { recordItem } from '@/lib/routes/records';
import { repairPatchSchema } from '@/lib/validation/repairs';

const routes = recordItem({
  kind: 'repair',
  what: 'Repair',
  patchSchema: repairPatchSchema,
  get: getRepair,
  update: updateRepair,
  archive: removeRepair,
  writers: DESK_ROLES,
});
export const GET = routes.GET;
/** Edits the defect, saves the plan (patch length, packer, thickness, groundwater, ovality), cancels or restores. */
export const PATCH = routes.PATCH;
/** Cancels the repair when an install has started on it, deletes it otherwise. */
export const DELETE = routes.DELETE;
