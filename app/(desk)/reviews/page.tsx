import type { Metadata } from 'next';
import { ListToolbar, FilterSelect, exportHrefOf } from '@/components/desk/list-toolbar';
import { requirePageUser } from '@/lib/auth/session';
import { getCompany } from '@/lib/data/company';
import { listInstalls } from '@/lib/data/install-list';
import { DESK_ROLES, INSTALL_STATUSES, label } from '@/lib/domain/vocabulary';
import { installListQuerySchema } from '@/lib/validation/reviews';
import { ReviewsTable } from './reviews-table';
import { PageHeader } from '@/components/ui/page-header';

export const metadata: Metadata = { title: 'Review' };

/** The office's queue: installs awaiting review, worst flags first (any other status through the filter). */
export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(DESK_ROLES);
  const raw = await searchParams;
  // No status in the URL is the queue; "Any" (an empty status) lists every install.
  const { status, ...rest } = raw;
  const asked = { ...rest, ...(status === undefined ? { status: 'awaiting_review' } : status ? { status } : {}) };
  const parsed = installListQuerySchema.safeParse(asked);
  const query = parsed.success ? parsed.data : installListQuerySchema.parse({ status: 'awaiting_review' });
  const [list, company] = await Promise.all([listInstalls(user, query), getCompany(user)]);
  return (
    <div className="space-y-4">
      <PageHeader title="Review" />
      <p className="max-w-3xl text-sm text-slate-600">
        Installs the crews signed off, with the quality flags worked out from what they recorded. Open one to see its
        timeline and approve it or send it back.
      </p>
      <ListToolbar
        search={query.q}
        placeholder="Job number or customer"
        exportHref={exportHrefOf('/api/installs', asked)}
      >
        <FilterSelect
          name="status"
          label="Status"
          value={query.status}
          options={INSTALL_STATUSES.map((s) => ({ value: s, label: label(s) }))}
        />
      </ListToolbar>
      <ReviewsTable
        list={list}
        sort={query.sort}
        dir={query.dir}
        timeZone={company.timeZone}
        unitSystem={company.unitSystem}
      />
    </div>
  );
}
