import 'server-only';
import { ensureDerived, settingsOf } from './install-derive';
import { QueryTypes } from 'sequelize';
import { Crew } from '@/models';
import { sequelize } from '@/lib/data/db';
import type { SessionUser } from '@/lib/auth/session';
import { dayInZone } from '@/lib/time/dates';
import { isDeskRole } from '@/lib/auth/roles';
import { AppError, forbidden, notFound } from '@/lib/server/errors';
import { MAX_INSIGHTS_DAYS, type InsightsQuery } from '@/lib/validation/insights';
import { FLAG_LABELS } from '@/lib/review/flags';
import { getCompany } from './company';
import { cachedForCompany } from './company-cache';

/** How long an insights answer may be served again while the company's installs have not changed. */
export const INSIGHTS_CACHE_MS = 15_000;

/** What the installs of a period teach: GET /api/insights and the /insights page. */
export type Insights = {
  period: { from: string; to: string };
  crew: { id: string; name: string } | null;
  timeZone: string;
  /** Installs whose resin was mixed in the period (company-zone days). */
  installs: number;
  /** Installs with at least one quality flag. */
  flagged: number;
  /** Installs per flag kind (an install with two kinds counts once under each). */
  byFlag: Record<string, number>;
  /** Minutes from "bladder inflated" to the inflate-by time; negative when late. Null without inflated installs. */
  medianInflateMarginMin: number | null;
  worstInflateMarginMin: number | null;
  marginBins: { bin: MarginBin; installs: number }[];
  hold: {
    /** Installs with inflate, deflate and a planned hold. */
    measured: number;
    /** Deflated before the planned hold (with the company's reserve) was up. */
    short: number;
    medianKeptMin: number | null;
    medianPlannedMin: number | null;
    /** Kept minus planned, the smallest (negative: deflated that many minutes early). */
    worstShortfallMin: number | null;
  };
  pressure: {
    /** Installs with a recorded pressure and a packer with a rating. */
    measured: number;
    /** Highest reading above the packer's maximum rating. */
    aboveMax: number;
    /** Highest reading below the packer's minimum rating (so every reading was). */
    belowMin: number;
    /** The highest reading as a percentage of the packer's maximum rating, median over installs. */
    medianPctOfMax: number | null;
    bins: { bin: PressureBin; installs: number }[];
  };
  weekly: InsightsWeek[];
  byCrew: {
    crewId: string | null;
    crewName: string | null;
    installs: number;
    flagged: number;
    medianInflateMarginMin: number | null;
  }[];
};

export type InsightsWeek = {
  /** Monday of the week (ISO weeks, company zone). */
  weekStart: string;
  installs: number;
  flagged: number;
  byFlag: Record<string, number>;
  medianInflateMarginMin: number | null;
  worstInflateMarginMin: number | null;
  medianHoldKeptMin: number | null;
  medianHoldPlannedMin: number | null;
};

export const MARGIN_BINS = ['late', '0-5', '5-10', '10-20', '20+'] as const;
export type MarginBin = (typeof MARGIN_BINS)[number];
export const PRESSURE_BINS = ['<50%', '50-75%', '75-90%', '90-100%', '>100%'] as const;
export type PressureBin = (typeof PRESSURE_BINS)[number];

/**
 * The insights of a period and optionally one crew, for the office. Every figure is aggregated in PostgreSQL over
 * the derived columns the tap keeps on `installs` (mixed_at, inflated_at, inflate_by, deflated_at, deflate_after,
 * hold_planned_min, max_pressure_kpa, flag_kinds): one statement, one pass, no install loaded into JavaScript.
 */
export async function getInsights(user: SessionUser, query: InsightsQuery, now = new Date()): Promise<Insights> {
  if (!isDeskRole(user.role)) throw forbidden('Insights are for the office.');
  const company = await getCompany(user);
  // The figures read the derived columns: rows seeded or imported without a tap are derived first.
  await ensureDerived(user, settingsOf(company));
  const timeZone = company.timeZone;
  const period = resolvePeriod(query, dayInZone(now, timeZone));
  let crew: Insights['crew'] = null;
  if (query.crewId) {
    const row = await Crew.findOne({
      where: { id: query.crewId, companyId: user.companyId },
      attributes: ['id', 'name'],
    });
    if (!row) throw notFound('Crew');
    crew = { id: row.id, name: row.name };
  }
  const rows = await cachedForCompany(
    user.companyId,
    `insights|${timeZone}|${period.from}|${period.to}|${crew?.id ?? ''}`,
    INSIGHTS_CACHE_MS,
    () =>
      sequelize.query<GroupRow>(INSIGHTS_SQL, {
        type: QueryTypes.SELECT,
        replacements: {
          companyId: user.companyId,
          tz: timeZone,
          from: period.from,
          to: period.to,
          crewId: crew?.id ?? null,
        },
      }),
  );
  // One row for the whole period (always there, even with no install), one per week and one per crew that has any.
  const all = rows.find((r) => r.part === 'all')!;
  const weeks = new Map(rows.filter((r) => r.part === 'week').map((r) => [r.week_start, r]));
  const bins = <B extends string>(names: readonly B[], prefix: 'margin_bin_' | 'pressure_bin_') =>
    names.map((bin, index) => ({ bin, installs: Number(all[`${prefix}${index}`] ?? 0) }));
  return {
    period,
    crew,
    timeZone,
    installs: Number(all.installs),
    flagged: Number(all.flagged),
    byFlag: byFlagOf(all),
    medianInflateMarginMin: num(all.median_margin),
    worstInflateMarginMin: num(all.worst_margin),
    marginBins: bins(MARGIN_BINS, 'margin_bin_'),
    hold: {
      measured: Number(all.hold_measured),
      short: Number(all.hold_short),
      medianKeptMin: num(all.hold_median_kept),
      medianPlannedMin: num(all.hold_median_planned),
      worstShortfallMin: num(all.hold_worst_shortfall),
    },
    pressure: {
      measured: Number(all.pressure_measured),
      aboveMax: Number(all.pressure_above),
      belowMin: Number(all.pressure_below),
      medianPctOfMax: num(all.pressure_median_pct),
      bins: bins(PRESSURE_BINS, 'pressure_bin_'),
    },
    weekly: weekStartsOf(period).map((weekStart) => {
      const week = weeks.get(weekStart);
      return {
        weekStart,
        installs: Number(week?.installs ?? 0),
        flagged: Number(week?.flagged ?? 0),
        byFlag: week ? byFlagOf(week) : {},
        medianInflateMarginMin: num(week?.median_margin),
        worstInflateMarginMin: num(week?.worst_margin),
        medianHoldKeptMin: num(week?.hold_median_kept),
        medianHoldPlannedMin: num(week?.hold_median_planned),
      };
    }),
    byCrew: rows
      .filter((r) => r.part === 'crew')
      .map((c) => ({
        crewId: c.crew_id,
        crewName: c.crew_name,
        installs: Number(c.installs),
        flagged: Number(c.flagged),
        medianInflateMarginMin: num(c.median_margin),
      })),
  };
}

/** The period asked for, or the 12 weeks up to today (company zone); refuses a reversed or over-long one (400). */
export function resolvePeriod(query: Pick<InsightsQuery, 'from' | 'to'>, today: string) {
  const to = query.to ?? (query.from && query.from > today ? query.from : today);
  const from = query.from ?? shiftDay(to, -83);
  const days = (Date.parse(to) - Date.parse(from)) / 86_400_000 + 1;
  if (days < 1)
    throw new AppError(400, 'Invalid input — to: The period ends before it starts', {
      to: ['The period ends before it starts'],
    });
  if (days > MAX_INSIGHTS_DAYS) {
    throw new AppError(400, 'Invalid input — to: Choose a period of at most two years', {
      to: ['Choose a period of at most two years'],
    });
  }
  return { from, to };
}

/** The Mondays of the ISO weeks the period touches, first to last. */
function weekStartsOf(period: { from: string; to: string }) {
  const monday = (day: string) => shiftDay(day, -((new Date(`${day}T00:00:00Z`).getUTCDay() + 6) % 7));
  const weeks = [];
  for (let week = monday(period.from); week <= period.to; week = shiftDay(week, 7)) weeks.push(week);
  return weeks;
}

/** The flag kinds an install counts under, as `{ kind: installs }` with the kinds no install has left out. */
const byFlagOf = (row: GroupRow) =>
  Object.fromEntries(
    FLAG_KINDS.map((kind, index) => [kind, Number(row[`flag_${index}`] ?? 0)] as const).filter(([, n]) => n > 0),
  );

const shiftDay = (day: string, days: number) =>
  new Date(Date.parse(`${day}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);
const num = (value: string | number | null | undefined) =>
  value === null || value === undefined ? null : Number(value);

type Num = string | number | null;
type GroupRow = {
  part: 'all' | 'week' | 'crew';
  week_start: string | null;
  crew_id: string | null;
  crew_name: string | null;
  installs: Num;
  flagged: Num;
  median_margin: Num;
  worst_margin: Num;
  hold_measured: Num;
  hold_short: Num;
  hold_median_kept: Num;
  hold_median_planned: Num;
  hold_worst_shortfall: Num;
  pressure_measured: Num;
  pressure_above: Num;
  pressure_below: Num;
  pressure_median_pct: Num;
  [bin: `${'margin_bin_' | 'pressure_bin_' | 'flag_'}${number}`]: Num;
};

// Day boundaries are the company's: a local day D runs from D 00:00 to D+1 00:00 in :tz, turned into instants with
// `timestamp AT TIME ZONE`, so the (company_id, crew_id, mixed_at) index serves the range. Weeks are ISO weeks
// (Monday) of the local time. Planned hold = deflate-after − inflated (the hold with the company's reserve, as the
// tablet's countdown had it), else the stored hold_planned_min. The stored flag kinds are those of the last tap;
// time passing adds one: mixed, never inflated, and the inflate-by time gone is a late inflate (as the review shows).
// One pass: GROUPING SETS give the period's row, one per week and one per crew from a single read of the rows
// (an index-only scan of installs_company_mixed_cover), each figure a FILTERed aggregate instead of a sub-select.
const FLAG_KINDS = Object.keys(FLAG_LABELS) as (keyof typeof FLAG_LABELS)[];
const MARGIN_BIN_SQL = [
  'margin_min < 0',
  'margin_min >= 0 AND margin_min < 5',
  'margin_min >= 5 AND margin_min < 10',
  'margin_min >= 10 AND margin_min < 20',
  'margin_min >= 20',
];
const PRESSURE_BIN_SQL = [
  'pct < 50',
  'pct >= 50 AND pct < 75',
  'pct >= 75 AND pct < 90',
  'pct >= 90 AND pct <= 100',
  'pct > 100',
];
const HELD = 'kept_min IS NOT NULL AND planned_min IS NOT NULL';
const PRESSED = 'pressure_kpa IS NOT NULL AND rated_max_kpa > 0';
const median = (of: string, filter = '') =>
  `round(CAST(percentile_cont(0.5) WITHIN GROUP (ORDER BY ${of})${filter && ` FILTER (WHERE ${filter})`} AS numeric), 1)`;
const counts = (prefix: string, conditions: string[]) =>
  conditions.map((condition, index) => `count(*) FILTER (WHERE ${condition}) AS ${prefix}${index}`).join(',\n  ');

const INSIGHTS_SQL = `
WITH base AS (
  SELECT i.crew_id, cr.name AS crew_name, i.flag_kinds,
    (i.inflated_at IS NULL AND i.inflate_by < now()) AS late_now,
    date_trunc('week', i.mixed_at AT TIME ZONE :tz)::date AS week_start,
    date_part('epoch', i.inflate_by - i.inflated_at) / 60 AS margin_min,
    date_part('epoch', i.deflated_at - i.inflated_at) / 60 AS kept_min,
    COALESCE(date_part('epoch', i.deflate_after - i.inflated_at) / 60, i.hold_planned_min::float8) AS planned_min,
    i.max_pressure_kpa::float8 AS pressure_kpa,
    p.min_pressure_kpa::float8 AS rated_min_kpa,
    p.max_pressure_kpa::float8 AS rated_max_kpa,
    100 * i.max_pressure_kpa::float8 / NULLIF(p.max_pressure_kpa::float8, 0) AS pct
  FROM installs i
  LEFT JOIN packers p ON p.id = i.packer_id AND p.company_id = i.company_id
  LEFT JOIN crews cr ON cr.id = i.crew_id AND cr.company_id = i.company_id
  WHERE i.company_id = :companyId
    AND i.mixed_at >= (CAST(:from AS date)::timestamp AT TIME ZONE :tz)
    AND i.mixed_at < ((CAST(:to AS date) + 1)::timestamp AT TIME ZONE :tz)
    AND (CAST(:crewId AS uuid) IS NULL OR i.crew_id = CAST(:crewId AS uuid))
)
SELECT
  CASE WHEN GROUPING(week_start) = 0 THEN 'week' WHEN GROUPING(crew_id) = 0 THEN 'crew' ELSE 'all' END AS part,
  to_char(week_start, 'YYYY-MM-DD') AS week_start, crew_id, crew_name,
  count(*) AS installs,
  count(*) FILTER (WHERE late_now OR cardinality(flag_kinds) > 0) AS flagged,
  ${median('margin_min')} AS median_margin,
  round(CAST(min(margin_min) AS numeric), 1) AS worst_margin,
  count(*) FILTER (WHERE ${HELD}) AS hold_measured,
  count(*) FILTER (WHERE ${HELD} AND kept_min < planned_min) AS hold_short,
  ${median('kept_min', HELD)} AS hold_median_kept,
  ${median('planned_min', HELD)} AS hold_median_planned,
  round(CAST(min(kept_min - planned_min) AS numeric), 1) AS hold_worst_shortfall,
  count(*) FILTER (WHERE ${PRESSED}) AS pressure_measured,
  count(*) FILTER (WHERE ${PRESSED} AND pressure_kpa > rated_max_kpa) AS pressure_above,
  count(*) FILTER (WHERE ${PRESSED} AND pressure_kpa < rated_min_kpa) AS pressure_below,
  ${median('pct', PRESSED)} AS pressure_median_pct,
  ${counts('margin_bin_', MARGIN_BIN_SQL)},
  ${counts(
    'pressure_bin_',
    PRESSURE_BIN_SQL.map((bin) => `${PRESSED} AND ${bin}`),
  )},
  ${counts(
    'flag_',
    FLAG_KINDS.map((kind) => `${kind === 'late-inflate' ? 'late_now OR ' : ''}'${kind}' = ANY (flag_kinds)`),
  )}
FROM base
GROUP BY GROUPING SETS ((), (week_start), (crew_id, crew_name))
ORDER BY part, week_start, crew_name NULLS LAST
`;
