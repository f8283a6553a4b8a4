import { ADMIN_ONLY } from '@/lib/domain/vocabulary';
import { getUser, updateUser } from '@/lib/data/users';
import { recordItem } from '@/lib/routes/records';
import { userPatchSchema } from '@/lib/validation/users';

const routes = recordItem({
  kind: 'user',
  what: 'User',
  patchSchema: userPatchSchema,
  get: getUser,
  update: updateUser,
  readers: ADMIN_ONLY,
  writers: ADMIN_ONLY,
});
export const GET = routes.GET;
/** Rename, change role, `active: false` to deactivate (sessions end at once), `active: true` to reactivate. */
export const PATCH = routes.PATCH;
