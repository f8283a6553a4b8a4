import type { Metadata } from 'next';
import Link from 'next/link';
import { ListToolbar, FilterSelect, exportHrefOf } from '@/components/desk/list-toolbar';
import { requirePageUser } from '@/lib/auth/session';
import { listCrews } from '@/lib/data/crews';
import { crewListQuerySchema } from '@/lib/validation/crews';
import { CrewsTable } from './crews-table';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';
import { filledParams } from '@/lib/validation/list';

export const metadata: Metadata = { title: 'Crews' };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(ADMIN_ONLY);
  const raw = await searchParams;
  const parsed = crewListQuerySchema.safeParse(filledParams(raw));
  const query = parsed.success ? parsed.data : crewListQuerySchema.parse({});
  const list = await listCrews(user, query);
  return (
    <div className="space-y-4">
      <div>
        <Link href="/admin" className="text-sm text-brand-700 hover:underline">← Company settings</Link>
        <h1 className="mt-1 text-2xl font-bold">Crews</h1>
      </div>
      <ListToolbar search={query.q} placeholder="Crew name" exportHref={exportHrefOf('/api/crews', raw)} newHref="/admin/crews/new" newLabel="New crew">
        <FilterSelect name="archived" label="Archived" value={query.archived === 'false' ? '' : query.archived} options={[{ value: 'true', label: 'Include archived' }, { value: 'only', label: 'Only archived' }]} />
      </ListToolbar>
      <CrewsTable list={list} sort={query.sort} dir={query.dir} />
    </div>
  );
}
