import { createUser, listUsers } from '@/lib/data/users';
import { ADMIN_ONLY, label } from '@/lib/domain/vocabulary';
import { recordCollection } from '@/lib/routes/records';
import { userInputSchema, userListQuerySchema } from '@/lib/validation/users';

/** A page of the company's users, or with `?format=csv` every user the same filter matches. Admin only. */
const routes = recordCollection({
  csvName: 'users',
  readers: ADMIN_ONLY,
  writers: ADMIN_ONLY,
  querySchema: userListQuerySchema,
  inputSchema: userInputSchema,
  list: listUsers,
  create: createUser,
  csv: [
    { header: 'Name', value: (u) => u.name },
    { header: 'E-mail', value: (u) => u.email },
    { header: 'Role', value: (u) => label(u.role) },
    { header: 'Active', value: (u) => (u.active ? 'yes' : 'no') },
  ],
});
export const GET = routes.GET;
export const POST = routes.POST;
