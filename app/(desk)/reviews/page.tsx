import type { Metadata } from 'next';
import { ListPage } from '@/components/desk/list-page';
import { FilterSelect } from '@/components/desk/list-toolbar';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { listInstalls } from '@/lib/data/install-list';
import { DESK_ROLES, INSTALL_STATUSES, labelledOptions } from '@/lib/domain/vocabulary';
import { queryOrDefaults } from '@/lib/validation/list';
import { installListQuerySchema } from '@/lib/validation/reviews';
import { ReviewsTable } from './reviews-table';

export const metadata: Metadata = { title: 'Review' };

export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(DESK_ROLES);
  const raw = await searchParams;
  // No status in the URL is the queue; "Any" (an empty status) lists every install.
  const { status, ...rest } = raw;
  const asked = { ...rest, ...(status === undefined ? { status: 'awaiting_review' } : status ? { status } : {}) };
  const query = queryOrDefaults(installListQuerySchema, asked, { status: 'awaiting_review' });
  const [list, company] = await Promise.all([listInstalls(user, query), getCompany(user)]);
  return (
    <ListPage
      title="Review"
      intro={
        <p className="max-w-3xl text-sm text-slate-600">
          Installs the crews signed off, with the quality flags worked out from what they recorded. Open one to see its
          timeline and approve it or send it back.
        </p>
      }
      search={query.q}
      placeholder="Job number or customer"
      exportApi="/api/installs"
      params={asked}
      filters={
        <FilterSelect name="status" label="Status" value={query.status} options={labelledOptions(INSTALL_STATUSES)} />
      }
    >
      <ReviewsTable
        list={list}
        sort={query.sort}
        dir={query.dir}
        timeZone={company.timeZone}
        unitSystem={company.unitSystem}
      />
    </ListPage>
  );
}
