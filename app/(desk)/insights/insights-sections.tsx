import type { ReactNode } from 'react';
import type { Insights } from '@/lib/data/insights';
import { FLAG_LABELS } from '@/lib/review/flags';
import { InsightsChart } from './insights-chart-lazy';

/** Each figure with its numbers beside it: the chart draws in the browser, the table is the same data as text. */
export function InsightsSections({ insights }: { insights: Insights }) {
  const { hold, pressure } = insights;
  const share = (n: number) => (insights.installs ? `${Math.round((100 * n) / insights.installs)} %` : '–');
  const flagRows = Object.entries(insights.byFlag).sort((a, b) => b[1] - a[1]);
  return (
    <div className="space-y-6">
      <Section id="weekly" title="Installs per week" chart={<InsightsChart kind="weekly" insights={insights} />}>
        <Table head={['Week of', 'Installs', 'Flagged', 'Median margin', 'Worst margin']}>
          {insights.weekly.map((w) => (
            <tr key={w.weekStart}>
              <td>{w.weekStart}</td>
              <td>{w.installs}</td>
              <td>{w.flagged}</td>
              <td>{minutes(w.medianInflateMarginMin)}</td>
              <td>{minutes(w.worstInflateMarginMin)}</td>
            </tr>
          ))}
        </Table>
      </Section>
      <Section
        id="flags"
        title="Share of installs with each flag"
        chart={<InsightsChart kind="flags" insights={insights} />}
      >
        {flagRows.length === 0 ? (
          <p className="text-sm text-slate-600">No flags in this period.</p>
        ) : (
          <Table head={['Flag', 'Installs', 'Share']}>
            {flagRows.map(([kind, n]) => (
              <tr key={kind}>
                <td>{FLAG_LABELS[kind as keyof typeof FLAG_LABELS] ?? kind}</td>
                <td>{n}</td>
                <td>{share(n)}</td>
              </tr>
            ))}
          </Table>
        )}
      </Section>
      <Section id="margin" title="Margin left at inflation" chart={<InsightsChart kind="margin" insights={insights} />}>
        <p className="text-sm text-slate-600">
          Minutes from “bladder inflated” to the inflate-by time; below zero the bladder went up late.
        </p>
        <dl className="grid grid-cols-2 gap-x-4 text-sm" data-testid="insights-margin">
          <dt className="text-slate-600">Median</dt>
          <dd className="font-semibold">{minutes(insights.medianInflateMarginMin)}</dd>
          <dt className="text-slate-600">Worst</dt>
          <dd className="font-semibold">{minutes(insights.worstInflateMarginMin)}</dd>
        </dl>
        <Table head={['Margin (min)', 'Installs']}>
          {insights.marginBins.map((b) => (
            <tr key={b.bin}>
              <td>{b.bin === 'late' ? 'late (below 0)' : b.bin}</td>
              <td>{b.installs}</td>
            </tr>
          ))}
        </Table>
      </Section>
      <Section id="hold" title="Hold kept against plan" chart={<InsightsChart kind="hold" insights={insights} />}>
        <p className="text-sm text-slate-600">
          Minutes the bladder stayed inflated against the planned hold (with the company&apos;s hold reserve).
        </p>
        <dl className="grid grid-cols-2 gap-x-4 text-sm">
          <dt className="text-slate-600">Installs measured</dt>
          <dd>{hold.measured}</dd>
          <dt className="text-slate-600">Deflated before the plan</dt>
          <dd>{hold.short}</dd>
          <dt className="text-slate-600">Median kept</dt>
          <dd>{minutes(hold.medianKeptMin)}</dd>
          <dt className="text-slate-600">Median planned</dt>
          <dd>{minutes(hold.medianPlannedMin)}</dd>
          <dt className="text-slate-600">Worst, kept − planned</dt>
          <dd>{minutes(hold.worstShortfallMin)}</dd>
        </dl>
      </Section>
      <Section
        id="pressure"
        title="Pressure against the packer's rating"
        chart={<InsightsChart kind="pressure" insights={insights} />}
      >
        <p className="text-sm text-slate-600">
          The highest reading of each install as a share of its packer&apos;s maximum rating.
        </p>
        <dl className="grid grid-cols-2 gap-x-4 text-sm">
          <dt className="text-slate-600">Installs measured</dt>
          <dd>{pressure.measured}</dd>
          <dt className="text-slate-600">Above the maximum</dt>
          <dd>{pressure.aboveMax}</dd>
          <dt className="text-slate-600">All readings below the minimum</dt>
          <dd>{pressure.belowMin}</dd>
          <dt className="text-slate-600">Median share of the maximum</dt>
          <dd>{pressure.medianPctOfMax === null ? '–' : `${pressure.medianPctOfMax} %`}</dd>
        </dl>
        <Table head={['Share of maximum', 'Installs']}>
          {pressure.bins.map((b) => (
            <tr key={b.bin}>
              <td>{b.bin}</td>
              <td>{b.installs}</td>
            </tr>
          ))}
        </Table>
      </Section>
      {!insights.crew && insights.byCrew.length > 0 && (
        <section aria-labelledby="insights-crews" className="rounded-lg bg-white p-4 ring-1 ring-slate-200">
          <h2 id="insights-crews" className="mb-2 text-lg font-semibold">
            By crew
          </h2>
          <Table head={['Crew', 'Installs', 'Flagged', 'Median margin']}>
            {insights.byCrew.map((c) => (
              <tr key={c.crewId ?? 'none'}>
                <td>{c.crewName ?? 'No crew'}</td>
                <td>{c.installs}</td>
                <td>{c.flagged}</td>
                <td>{minutes(c.medianInflateMarginMin)}</td>
              </tr>
            ))}
          </Table>
        </section>
      )}
    </div>
  );
}

function Section({ id, title, chart, children }: { id: string; title: string; chart: ReactNode; children: ReactNode }) {
  return (
    <section
      aria-labelledby={`insights-${id}`}
      data-testid={`insights-${id}`}
      className="rounded-lg bg-white p-4 ring-1 ring-slate-200"
    >
      <h2 id={`insights-${id}`} className="mb-3 text-lg font-semibold">
        {title}
      </h2>
      <div className="grid gap-4 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <div className="min-h-64">{chart}</div>
        <div className="space-y-3">{children}</div>
      </div>
    </section>
  );
}

function Table({ head, children }: { head: string[]; children: ReactNode }) {
  return (
    <table className="w-full text-left text-sm [&_td]:border-t [&_td]:border-slate-100 [&_td]:py-1 [&_td]:pr-3">
      <thead>
        <tr>
          {head.map((h) => (
            <th key={h} scope="col" className="pb-1 pr-3 font-semibold text-slate-700">
              {h}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>{children}</tbody>
    </table>
  );
}

const minutes = (value: number | null) => (value === null ? '–' : `${value.toFixed(1)} min`);
