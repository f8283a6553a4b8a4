import type { Metadata } from 'next';
import { ListPage } from '@/components/desk/list-page';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { listPackers } from '@/lib/data/packers';
import { packerListQuerySchema } from '@/lib/validation/packers';
import { PackersTable } from './packers-table';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';
import { filledParams, queryOrDefaults } from '@/lib/validation/list';

export const metadata: Metadata = { title: 'Packers' };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(ADMIN_ONLY);
  const raw = await searchParams;
  const query = queryOrDefaults(packerListQuerySchema, filledParams(raw));
  const [list, company] = await Promise.all([listPackers(user, query), getCompany(user)]);
  return (
    <ListPage
      title="Packers"
      back={{ href: '/admin', label: 'Company' }}
      search={query.q}
      placeholder="Name or serial"
      exportApi="/api/packers"
      params={raw}
      newHref="/admin/packers/new"
      newLabel="New packer"
      archived={{ value: query.archived }}
    >
      <PackersTable list={list} sort={query.sort} dir={query.dir} units={company.unitSystem} />
    </ListPage>
  );
}
