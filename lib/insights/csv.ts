import { toCsv, type CsvColumn } from '@/lib/server/csv';
import { FLAG_LABELS } from '@/lib/review/flags';
import type { Insights, InsightsWeek } from '@/lib/data/insights';

/**
 * The weekly table of the insights as CSV: one row per week (Monday, company zone) with a count per flag kind,
 * then a last row "Whole period" with the period's own figures (medians are of the period, not of the weeks).
 */
export function insightsCsv(insights: Insights): string {
  const kinds = [...new Set([...Object.keys(FLAG_LABELS), ...Object.keys(insights.byFlag)])];
  const total: InsightsWeek & { label: string } = {
    label: 'Whole period',
    weekStart: insights.period.from,
    installs: insights.installs,
    flagged: insights.flagged,
    byFlag: insights.byFlag,
    medianInflateMarginMin: insights.medianInflateMarginMin,
    worstInflateMarginMin: insights.worstInflateMarginMin,
    medianHoldKeptMin: insights.hold.medianKeptMin,
    medianHoldPlannedMin: insights.hold.medianPlannedMin,
  };
  const rows: (InsightsWeek & { label?: string })[] = [...insights.weekly, total];
  const columns: CsvColumn<InsightsWeek & { label?: string }>[] = [
    { header: 'Week starting', value: (w) => w.label ?? w.weekStart },
    { header: 'Installs (resin mixed)', value: (w) => w.installs },
    { header: 'Flagged', value: (w) => w.flagged },
    ...kinds.map((kind) => ({
      header: FLAG_LABELS[kind as keyof typeof FLAG_LABELS] ?? kind,
      value: (w: InsightsWeek) => w.byFlag[kind] ?? 0,
    })),
    { header: 'Median margin at inflation (min)', value: (w) => w.medianInflateMarginMin },
    { header: 'Worst margin at inflation (min)', value: (w) => w.worstInflateMarginMin },
    { header: 'Median hold kept (min)', value: (w) => w.medianHoldKeptMin },
    { header: 'Median hold planned (min)', value: (w) => w.medianHoldPlannedMin },
  ];
  return toCsv(rows, columns);
}
