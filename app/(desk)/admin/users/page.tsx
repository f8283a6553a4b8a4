import type { Metadata } from 'next';
import { ListPage } from '@/components/desk/list-page';
import { FilterSelect } from '@/components/desk/list-toolbar';
import { requirePageUser } from '@/lib/auth/session';
import { listUsers } from '@/lib/data/users';
import { ADMIN_ONLY, ROLES, labelledOptions } from '@/lib/domain/vocabulary';
import { userListQuerySchema } from '@/lib/validation/users';
import { UsersTable } from './users-table';
import { filledParams, queryOrDefaults } from '@/lib/validation/list';

export const metadata: Metadata = { title: 'Users' };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(ADMIN_ONLY);
  const raw = await searchParams;
  const query = queryOrDefaults(userListQuerySchema, filledParams(raw));
  const list = await listUsers(user, query);
  return (
    <ListPage
      title="Users"
      back={{ href: '/admin', label: 'Company settings' }}
      description="Deactivating someone, changing their role or resetting their password signs them out everywhere at once."
      search={query.q}
      placeholder="Name or e-mail"
      exportApi="/api/users"
      params={raw}
      newHref="/admin/users/new"
      newLabel="New user"
      filters={
        <>
          <FilterSelect name="role" label="Role" value={query.role} options={labelledOptions(ROLES)} />
          <FilterSelect
            name="active"
            label="Status"
            value={query.active}
            options={[
              { value: 'true', label: 'Active' },
              { value: 'false', label: 'Deactivated' },
            ]}
          />
        </>
      }
    >
      <UsersTable list={list} sort={query.sort} dir={query.dir} selfId={user.id} />
    </ListPage>
  );
}
