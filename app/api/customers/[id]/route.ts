import { archiveCustomer, getCustomer, updateCustomer } from '@/lib/data/customers';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { recordItem } from '@/lib/routes/records';
import { customerPatchSchema } from '@/lib/validation/customers';

const routes = recordItem({
  kind: 'customer',
  what: 'Customer',
  patchSchema: customerPatchSchema,
  get: getCustomer,
  update: updateCustomer,
  archive: archiveCustomer,
  writers: DESK_ROLES,
});
export const GET = routes.GET;
export const PATCH = routes.PATCH;
/** Archives the customer when anything depends on it, deletes it otherwise. */
export const DELETE = routes.DELETE;
