import type { Metadata } from 'next';
import { ListToolbar, FilterSelect, exportHrefOf } from '@/components/desk/list-toolbar';
import { requirePageUser } from '@/lib/auth/session';
import { listUsers } from '@/lib/data/users';
import { ADMIN_ONLY, ROLES, label } from '@/lib/domain/vocabulary';
import { userListQuerySchema } from '@/lib/validation/users';
import { UsersTable } from './users-table';
import { filledParams } from '@/lib/validation/list';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'Users' };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(ADMIN_ONLY);
  const raw = await searchParams;
  // A hand-edited URL with a bad value falls back to the defaults rather than failing the page.
  const parsed = userListQuerySchema.safeParse(filledParams(raw));
  const query = parsed.success ? parsed.data : userListQuerySchema.parse({});
  const list = await listUsers(user, query);
  return (
    <div className="space-y-4">
      <PageHeader
        back={{ href: '/admin', label: 'Company settings' }}
        title="Users"
        description="Deactivating someone, changing their role or resetting their password signs them out everywhere at once."
      />
      <ListToolbar
        search={query.q}
        placeholder="Name or e-mail"
        exportHref={exportHrefOf('/api/users', raw)}
        newHref="/admin/users/new"
        newLabel="New user"
      >
        <FilterSelect
          name="role"
          label="Role"
          value={query.role}
          options={ROLES.map((role) => ({ value: role, label: label(role) }))}
        />
        <FilterSelect
          name="active"
          label="Status"
          value={query.active}
          options={[
            { value: 'true', label: 'Active' },
            { value: 'false', label: 'Deactivated' },
          ]}
        />
      </ListToolbar>
      <UsersTable list={list} sort={query.sort} dir={query.dir} selfId={user.id} />
    </div>
  );
}
