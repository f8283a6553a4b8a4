import type { Metadata } from 'next';
import { ListPage } from '@/components/desk/list-page';
import { FilterSelect } from '@/components/desk/list-toolbar';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { listResinSystems } from '@/lib/data/resin-systems';
import { ADMIN_ONLY, RESIN_CHEMISTRIES, labelledOptions } from '@/lib/domain/vocabulary';
import { resinSystemListQuerySchema } from '@/lib/validation/resin-systems';
import { ResinSystemsTable } from './resin-systems-table';
import { filledParams, queryOrDefaults } from '@/lib/validation/list';

export const metadata: Metadata = { title: 'Resin systems' };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(ADMIN_ONLY);
  const raw = await searchParams;
  const query = queryOrDefaults(resinSystemListQuerySchema, filledParams(raw));
  const [list, company] = await Promise.all([listResinSystems(user, query), getCompany(user)]);
  const chemistries = labelledOptions(RESIN_CHEMISTRIES);
  return (
    <ListPage
      title="Resin systems"
      back={{ href: '/admin', label: 'Company' }}
      search={query.q}
      placeholder="Name"
      exportApi="/api/resin-systems"
      params={raw}
      newHref="/admin/resin-systems/new"
      newLabel="New resin system"
      filters={<FilterSelect name="chemistry" label="Chemistry" value={query.chemistry} options={chemistries} />}
      archived={{ value: query.archived }}
    >
      <ResinSystemsTable list={list} sort={query.sort} dir={query.dir} units={company.unitSystem} />
    </ListPage>
  );
}
