'use client';

import {
  Bar,
  BarChart,
  CartesianGrid,
  Cell,
  Legend,
  Line,
  LineChart,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import type { Insights } from '@/lib/data/insights';
import { FLAG_LABELS } from '@/lib/review/flags';

export type ChartKind = 'weekly' | 'flags' | 'margin' | 'hold' | 'pressure';
export type InsightsChartProps = { kind: ChartKind; insights: Insights };

// The design system's semantic colours (tailwind.config.ts): brand teal, amber near, red missed, green safe.
const BRAND = '#115e59';
const NEAR = '#f59e0b';
const MISSED = '#dc2626';
const SAFE = '#16a34a';
const SLATE = '#94a3b8';

const LABELS: Record<ChartKind, string> = {
  weekly: 'Bar chart: installs and flagged installs per week.',
  flags: 'Bar chart: share of installs with each flag.',
  margin: 'Bar chart: installs by minutes left at inflation, and the weekly median and worst margin.',
  hold: 'Bar chart: median hold kept against the median hold planned, per week.',
  pressure: "Bar chart: installs by their highest pressure as a share of the packer's maximum rating.",
};

/** One chart of the insights page; the same numbers are in the table beside it. */
export function InsightsChartView({ kind, insights }: InsightsChartProps) {
  return (
    <div role="img" aria-label={`${LABELS[kind]} The numbers are in the table beside it.`} className="h-64 w-full">
      <ResponsiveContainer width="100%" height="100%">
        {chartOf(kind, insights)}
      </ResponsiveContainer>
    </div>
  );
}

function chartOf(kind: ChartKind, insights: Insights) {
  const common = { accessibilityLayer: false, margin: { top: 8, right: 8, bottom: 8, left: 0 } };
  switch (kind) {
    case 'weekly':
      return (
        <BarChart data={insights.weekly} {...common}>
          <CartesianGrid strokeDasharray="3 3" vertical={false} />
          <XAxis dataKey="weekStart" tick={{ fontSize: 11 }} />
          <YAxis allowDecimals={false} width={32} />
          <Tooltip />
          <Legend />
          <Bar dataKey="installs" name="Installs" fill={BRAND} isAnimationActive={false} />
          <Bar dataKey="flagged" name="Flagged" fill={NEAR} isAnimationActive={false} />
        </BarChart>
      );
    case 'flags': {
      const data = Object.entries(insights.byFlag).map(([flag, n]) => ({
        flag: FLAG_LABELS[flag as keyof typeof FLAG_LABELS] ?? flag,
        share: insights.installs ? Math.round((1000 * n) / insights.installs) / 10 : 0,
      }));
      return (
        <BarChart data={data} layout="vertical" {...common}>
          <CartesianGrid strokeDasharray="3 3" horizontal={false} />
          <XAxis type="number" unit=" %" domain={[0, 100]} />
          <YAxis type="category" dataKey="flag" width={150} tick={{ fontSize: 12 }} />
          <Tooltip />
          <Bar dataKey="share" name="Share of installs" fill={NEAR} isAnimationActive={false} />
        </BarChart>
      );
    }
    case 'margin':
      return insights.weekly.length > 1 ? (
        <LineChart data={insights.weekly} {...common}>
          <CartesianGrid strokeDasharray="3 3" vertical={false} />
          <XAxis dataKey="weekStart" tick={{ fontSize: 11 }} />
          <YAxis unit=" min" width={56} />
          <Tooltip />
          <Legend />
          <ReferenceLine y={0} stroke={MISSED} strokeDasharray="4 2" />
          <Line
            dataKey="medianInflateMarginMin"
            name="Median margin"
            stroke={BRAND}
            connectNulls
            isAnimationActive={false}
          />
          <Line
            dataKey="worstInflateMarginMin"
            name="Worst margin"
            stroke={MISSED}
            connectNulls
            isAnimationActive={false}
          />
        </LineChart>
      ) : (
        <BarChart data={insights.marginBins} {...common}>
          <XAxis dataKey="bin" />
          <YAxis allowDecimals={false} width={32} />
          <Tooltip />
          <Bar dataKey="installs" name="Installs" isAnimationActive={false}>
            {insights.marginBins.map((b) => (
              <Cell key={b.bin} fill={b.bin === 'late' ? MISSED : b.bin === '0-5' ? NEAR : SAFE} />
            ))}
          </Bar>
        </BarChart>
      );
    case 'hold':
      return (
        <BarChart data={insights.weekly} {...common}>
          <CartesianGrid strokeDasharray="3 3" vertical={false} />
          <XAxis dataKey="weekStart" tick={{ fontSize: 11 }} />
          <YAxis unit=" min" width={56} />
          <Tooltip />
          <Legend />
          <Bar dataKey="medianHoldPlannedMin" name="Planned (median)" fill={SLATE} isAnimationActive={false} />
          <Bar dataKey="medianHoldKeptMin" name="Kept (median)" fill={BRAND} isAnimationActive={false} />
        </BarChart>
      );
    case 'pressure':
      return (
        <BarChart data={insights.pressure.bins} {...common}>
          <XAxis dataKey="bin" />
          <YAxis allowDecimals={false} width={32} />
          <Tooltip />
          <Bar dataKey="installs" name="Installs" isAnimationActive={false}>
            {insights.pressure.bins.map((b) => (
              <Cell key={b.bin} fill={b.bin === '>100%' ? MISSED : b.bin === '90-100%' ? NEAR : SAFE} />
            ))}
          </Bar>
        </BarChart>
      );
  }
}
