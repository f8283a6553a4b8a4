import type { Metadata } from 'next';
import { FilterSelect, ListToolbar, exportHrefOf } from '@/components/desk/list-toolbar';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { listResinSystems } from '@/lib/data/resin-systems';
import { ADMIN_ONLY, RESIN_CHEMISTRIES, label } from '@/lib/domain/vocabulary';
import { resinSystemListQuerySchema } from '@/lib/validation/resin-systems';
import { ResinSystemsTable } from './resin-systems-table';
import { filledParams } from '@/lib/validation/list';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'Resin systems' };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(ADMIN_ONLY);
  const raw = await searchParams;
  const parsed = resinSystemListQuerySchema.safeParse(filledParams(raw));
  const query = parsed.success ? parsed.data : resinSystemListQuerySchema.parse({});
  const [list, company] = await Promise.all([listResinSystems(user, query), getCompany(user)]);
  return (
    <div className="space-y-4">
      <PageHeader back={{ href: '/admin', label: 'Company' }} title="Resin systems" />
      <ListToolbar
        search={query.q}
        placeholder="Name"
        exportHref={exportHrefOf('/api/resin-systems', raw)}
        newHref="/admin/resin-systems/new"
        newLabel="New resin system"
      >
        <FilterSelect
          name="chemistry"
          label="Chemistry"
          value={query.chemistry}
          options={RESIN_CHEMISTRIES.map((c) => ({ value: c, label: label(c) }))}
        />
        <FilterSelect
          name="archived"
          label="Archived"
          value={query.archived === 'false' ? '' : query.archived}
          options={[
            { value: 'true', label: 'Include archived' },
            { value: 'only', label: 'Only archived' },
          ]}
        />
      </ListToolbar>
      <ResinSystemsTable list={list} sort={query.sort} dir={query.dir} units={company.unitSystem} />
    </div>
  );
}
