import type { Metadata } from 'next';
import { FilterSelect, ListToolbar, exportHrefOf } from '@/components/desk/list-toolbar';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { listPackers } from '@/lib/data/packers';
import { packerListQuerySchema } from '@/lib/validation/packers';
import { PackersTable } from './packers-table';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';
import { filledParams } from '@/lib/validation/list';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'Packers' };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(ADMIN_ONLY);
  const raw = await searchParams;
  const parsed = packerListQuerySchema.safeParse(filledParams(raw));
  const query = parsed.success ? parsed.data : packerListQuerySchema.parse({});
  const [list, company] = await Promise.all([listPackers(user, query), getCompany(user)]);
  return (
    <div className="space-y-4">
      <PageHeader back={{ href: '/admin', label: 'Company' }} title="Packers" />
      <ListToolbar
        search={query.q}
        placeholder="Name or serial"
        exportHref={exportHrefOf('/api/packers', raw)}
        newHref="/admin/packers/new"
        newLabel="New packer"
      >
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
      <PackersTable list={list} sort={query.sort} dir={query.dir} units={company.unitSystem} />
    </div>
  );
}
