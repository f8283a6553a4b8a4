import type { Metadata } from 'next';
import { ListToolbar, FilterSelect, exportHrefOf } from '@/components/desk/list-toolbar';
import { requirePageUser } from '@/lib/auth/session';
import { listCustomerChoices, listSites } from '@/lib/data/sites';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { siteListQuerySchema } from '@/lib/validation/sites';
import { SitesTable } from './sites-table';
import { filledParams } from '@/lib/validation/list';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'Sites' };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(DESK_ROLES);
  const raw = await searchParams;
  // A hand-edited URL with a bad value falls back to the defaults rather than failing the page.
  const parsed = siteListQuerySchema.safeParse(filledParams(raw));
  const query = parsed.success ? parsed.data : siteListQuerySchema.parse({});
  const [list, customers] = await Promise.all([listSites(user, query), listCustomerChoices(user)]);
  const newHref = query.customerId ? `/sites/new?customerId=${query.customerId}` : '/sites/new';
  return (
    <div className="space-y-4">
      <PageHeader title="Sites" />
      <ListToolbar
        search={query.q}
        placeholder="Name, street or city"
        exportHref={exportHrefOf('/api/sites', raw)}
        newHref={newHref}
        newLabel="New site"
      >
        <FilterSelect
          name="customerId"
          label="Customer"
          value={query.customerId}
          options={customers.map((c) => ({ value: c.id, label: c.name }))}
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
      <SitesTable list={list} sort={query.sort} dir={query.dir} />
    </div>
  );
}
