'use client';

import dynamic from 'next/dynamic';
import type { ChartKind, InsightsChartProps } from './insights-chart';

// recharts draws in the browser only and is fetched only when this page's charts mount.
const Chart = dynamic(() => import('./insights-chart').then((m) => m.InsightsChartView), {
  ssr: false,
  loading: () => <div aria-hidden="true" className="h-64 animate-pulse rounded bg-slate-100" />,
});

export function InsightsChart(props: InsightsChartProps) {
  return <Chart {...props} />;
}

export type { ChartKind };
