import type { Metadata } from 'next';
import { ListPage } from '@/components/desk/list-page';
import { requirePageUser } from '@/lib/auth/session';
import { listCrews } from '@/lib/data/crews';
import { crewListQuerySchema } from '@/lib/validation/crews';
import { CrewsTable } from './crews-table';
import { ADMIN_ONLY } from '@/lib/domain/vocabulary';
import { filledParams, queryOrDefaults } from '@/lib/validation/list';

export const metadata: Metadata = { title: 'Crews' };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(ADMIN_ONLY);
  const raw = await searchParams;
  const query = queryOrDefaults(crewListQuerySchema, filledParams(raw));
  const list = await listCrews(user, query);
  return (
    <ListPage
      title="Crews"
      back={{ href: '/admin', label: 'Company settings' }}
      search={query.q}
      placeholder="Crew name"
      exportApi="/api/crews"
      params={raw}
      newHref="/admin/crews/new"
      newLabel="New crew"
      archived={{ value: query.archived }}
    >
      <CrewsTable list={list} sort={query.sort} dir={query.dir} />
    </ListPage>
  );
}
