import type { Metadata } from 'next';
import { buttonVariants } from '@/components/ui/button';
import { requirePageUser } from '@/lib/auth/session';
import { listCrews } from '@/lib/data/crews';
import { getInsights } from '@/lib/data/insights';
import { DESK_ROLES } from '@/lib/domain/vocabulary';
import { AppError } from '@/lib/server/errors';
import { crewListQuerySchema } from '@/lib/validation/crews';
import { insightsQuerySchema } from '@/lib/validation/insights';
import { InsightsSections } from './insights-sections';

export const metadata: Metadata = { title: 'Insights' };

/** What the installs teach over a period and a crew: flags, margin left at inflation, hold, pressure; charts + tables. */
export default async function Page({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const user = await requirePageUser(DESK_ROLES);
  const raw = await searchParams;
  const asked = { from: raw.from || undefined, to: raw.to || undefined, crewId: raw.crewId || undefined };
  const parsed = insightsQuerySchema.safeParse(asked);
  let problem = parsed.success ? null : parsed.error.issues[0].message;
  const crews = await listCrews(user, crewListQuerySchema.parse({ pageSize: '100', sort: 'name' }));
  let insights;
  try {
    insights = await getInsights(user, parsed.success ? parsed.data : {});
  } catch (error) {
    // A crew of another company (404) or a period the schema let through: show the default view with the reason.
    if (!(error instanceof AppError) || error.status >= 500) throw error;
    problem = error.message;
    insights = await getInsights(user, {});
  }
  const { period, crew } = insights;
  const csvHref = `/api/insights?${new URLSearchParams({ from: period.from, to: period.to, ...(crew ? { crewId: crew.id } : {}), format: 'csv' })}`;
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-bold">Insights</h1>
        <p className="max-w-3xl text-sm text-slate-600">
          What the installs of a period teach: how often each flag came up, how much of the working window was left when
          the bladder went up, whether the hold was kept, and how the pressure sat against the packer&apos;s rating.
          Installs count in the week their resin was mixed ({insights.timeZone}).
        </p>
      </div>
      <form
        method="get"
        className="flex flex-wrap items-end gap-3 rounded-lg bg-white p-3 ring-1 ring-slate-200"
        aria-label="Period and crew"
      >
        <div className="text-sm font-medium">
          <label htmlFor="insights-from">From</label>
          <input
            id="insights-from"
            type="date"
            name="from"
            defaultValue={period.from}
            className="mt-1 block h-9 rounded-md border border-slate-300 px-2"
          />
        </div>
        <div className="text-sm font-medium">
          <label htmlFor="insights-to">To</label>
          <input
            id="insights-to"
            type="date"
            name="to"
            defaultValue={period.to}
            className="mt-1 block h-9 rounded-md border border-slate-300 px-2"
          />
        </div>
        <div className="text-sm font-medium">
          <label htmlFor="insights-crewId">Crew</label>
          <select
            id="insights-crewId"
            name="crewId"
            defaultValue={crew?.id ?? ''}
            className="mt-1 block h-9 rounded-md border border-slate-300 px-2"
          >
            <option value="">All crews</option>
            {crews.items.map((c) => (
              <option key={c.id} value={c.id}>
                {c.name}
              </option>
            ))}
          </select>
        </div>
        <button type="submit" className={buttonVariants()}>
          Show
        </button>
        <a href={csvHref} download className={buttonVariants({ variant: 'secondary' })} data-testid="insights-csv">
          Download CSV
        </a>
      </form>
      {problem && (
        <p role="alert" className="text-sm font-medium text-missed-700">
          {problem} Showing {period.from} to {period.to} instead.
        </p>
      )}
      <p className="text-sm" data-testid="insights-summary">
        <strong>{insights.installs}</strong> installs mixed from {period.from} to {period.to}
        {crew ? ` by ${crew.name}` : ' by all crews'}; <strong>{insights.flagged}</strong> with a flag.
      </p>
      <InsightsSections insights={insights} />
      <p className="max-w-3xl text-xs text-slate-600">
        These figures read what the crews recorded. They do not replace the resin maker&apos;s instructions, the packer
        maker&apos;s pressure limits, local codes or a competent person&apos;s judgement on site.
      </p>
    </div>
  );
}
