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
import { getCompany } from './company';

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
 * hold_planned_min, max_pressure_kpa, flag_kinds): one statement, no install loaded into JavaScript.
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
  const [row] = await sequelize.query<AggregateRow>(INSIGHTS_SQL, {
    type: QueryTypes.SELECT,
    replacements: {
      companyId: user.companyId,
      tz: timeZone,
      from: period.from,
      to: period.to,
      crewId: crew?.id ?? null,
    },
  });
  const binsOf = <B extends string>(names: readonly B[], counts: Record<string, number> | null) =>
    names.map((bin) => ({ bin, installs: Number(counts?.[bin] ?? 0) }));
  return {
    period,
    crew,
    timeZone,
    installs: Number(row.installs),
    flagged: Number(row.flagged),
    byFlag: numbers(row.by_flag),
    medianInflateMarginMin: num(row.median_margin),
    worstInflateMarginMin: num(row.worst_margin),
    marginBins: binsOf(MARGIN_BINS, row.margin_bins),
    hold: {
      measured: Number(row.hold_measured),
      short: Number(row.hold_short),
      medianKeptMin: num(row.hold_median_kept),
      medianPlannedMin: num(row.hold_median_planned),
      worstShortfallMin: num(row.hold_worst_shortfall),
    },
    pressure: {
      measured: Number(row.pressure_measured),
      aboveMax: Number(row.pressure_above),
      belowMin: Number(row.pressure_below),
      medianPctOfMax: num(row.pressure_median_pct),
      bins: binsOf(PRESSURE_BINS, row.pressure_bins),
    },
    weekly: (row.weekly ?? []).map((week) => ({
      weekStart: week.week_start,
      installs: Number(week.installs),
      flagged: Number(week.flagged),
      byFlag: numbers(week.by_flag),
      medianInflateMarginMin: num(week.median_margin),
      worstInflateMarginMin: num(week.worst_margin),
      medianHoldKeptMin: num(week.hold_kept),
      medianHoldPlannedMin: num(week.hold_planned),
    })),
    byCrew: (row.by_crew ?? []).map((c) => ({
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

const shiftDay = (day: string, days: number) =>
  new Date(Date.parse(`${day}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);
const num = (value: string | number | null | undefined) =>
  value === null || value === undefined ? null : Number(value);
const numbers = (counts: Record<string, number | string> | null | undefined) =>
  Object.fromEntries(Object.entries(counts ?? {}).map(([key, value]) => [key, Number(value)]));

type Num = string | number | null;
type AggregateRow = {
  installs: Num;
  flagged: Num;
  by_flag: Record<string, number> | null;
  median_margin: Num;
  worst_margin: Num;
  margin_bins: Record<string, number> | null;
  hold_measured: Num;
  hold_short: Num;
  hold_median_kept: Num;
  hold_median_planned: Num;
  hold_worst_shortfall: Num;
  pressure_measured: Num;
  pressure_above: Num;
  pressure_below: Num;
  pressure_median_pct: Num;
  pressure_bins: Record<string, number> | null;
  weekly:
    | {
        week_start: string;
        installs: Num;
        flagged: Num;
        by_flag: Record<string, number> | null;
        median_margin: Num;
        worst_margin: Num;
        hold_kept: Num;
        hold_planned: Num;
      }[]
    | null;
  by_crew:
    { crew_id: string | null; crew_name: string | null; installs: Num; flagged: Num; median_margin: Num }[] | null;
};

// Day boundaries are the company's: a local day D runs from D 00:00 to D+1 00:00 in :tz, turned into instants with
// `timestamp AT TIME ZONE`, so the (company_id, crew_id, mixed_at) index serves the range. Weeks are ISO weeks
// (Monday) of the local time. Planned hold = deflate-after − inflated (the hold with the company's reserve, as the
// tablet's countdown had it), else the stored hold_planned_min. The stored flag kinds are those of the last tap;
// time passing adds one: mixed, never inflated, and the inflate-by time gone is a late inflate (as the review shows).
const INSIGHTS_SQL = `
WITH base AS (
  SELECT i.id, i.crew_id,
    CASE WHEN i.inflated_at IS NULL AND i.inflate_by < now() AND NOT ('late-inflate' = ANY (i.flag_kinds))
      THEN i.flag_kinds || ARRAY['late-inflate']::varchar(32)[] ELSE i.flag_kinds END AS flag_kinds,
    date_trunc('week', i.mixed_at AT TIME ZONE :tz)::date AS week_start,
    EXTRACT(EPOCH FROM (i.inflate_by - i.inflated_at)) / 60 AS margin_min,
    EXTRACT(EPOCH FROM (i.deflated_at - i.inflated_at)) / 60 AS kept_min,
    COALESCE(EXTRACT(EPOCH FROM (i.deflate_after - i.inflated_at)) / 60, i.hold_planned_min::float8) AS planned_min,
    i.max_pressure_kpa::float8 AS pressure_kpa,
    p.min_pressure_kpa::float8 AS rated_min_kpa,
    p.max_pressure_kpa::float8 AS rated_max_kpa
  FROM installs i
  LEFT JOIN packers p ON p.id = i.packer_id AND p.company_id = i.company_id
  WHERE i.company_id = :companyId
    AND i.mixed_at >= (CAST(:from AS date)::timestamp AT TIME ZONE :tz)
    AND i.mixed_at < ((CAST(:to AS date) + 1)::timestamp AT TIME ZONE :tz)
    AND (CAST(:crewId AS uuid) IS NULL OR i.crew_id = CAST(:crewId AS uuid))
),
held AS (
  SELECT kept_min, planned_min FROM base WHERE kept_min IS NOT NULL AND planned_min IS NOT NULL
),
pressed AS (
  SELECT pressure_kpa, rated_min_kpa, rated_max_kpa, 100 * pressure_kpa / rated_max_kpa AS pct
  FROM base WHERE pressure_kpa IS NOT NULL AND rated_max_kpa > 0
),
weeks AS (
  SELECT generate_series(date_trunc('week', CAST(:from AS date)), date_trunc('week', CAST(:to AS date)), interval '1 week')::date
    AS week_start
),
week_flags AS (
  SELECT week_start, json_object_agg(kind, n) AS by_flag
  FROM (SELECT b.week_start, k.kind, count(DISTINCT b.id) AS n FROM base b, unnest(b.flag_kinds) AS k(kind) GROUP BY 1, 2) f
  GROUP BY week_start
),
weekly AS (
  SELECT w.week_start, count(b.id) AS installs,
    count(b.id) FILTER (WHERE cardinality(b.flag_kinds) > 0) AS flagged,
    round(CAST(percentile_cont(0.5) WITHIN GROUP (ORDER BY b.margin_min) AS numeric), 1) AS median_margin,
    round(CAST(min(b.margin_min) AS numeric), 1) AS worst_margin,
    round(CAST(percentile_cont(0.5) WITHIN GROUP (ORDER BY b.kept_min) FILTER (WHERE b.planned_min IS NOT NULL) AS numeric), 1)
      AS hold_kept,
    round(CAST(percentile_cont(0.5) WITHIN GROUP (ORDER BY b.planned_min) FILTER (WHERE b.kept_min IS NOT NULL) AS numeric), 1)
      AS hold_planned
  FROM weeks w LEFT JOIN base b ON b.week_start = w.week_start
  GROUP BY w.week_start
)
SELECT
  (SELECT count(*) FROM base) AS installs,
  (SELECT count(*) FROM base WHERE cardinality(flag_kinds) > 0) AS flagged,
  (SELECT json_object_agg(kind, n) FROM (
    SELECT k.kind, count(DISTINCT b.id) AS n FROM base b, unnest(b.flag_kinds) AS k(kind) GROUP BY 1
  ) f) AS by_flag,
  (SELECT round(CAST(percentile_cont(0.5) WITHIN GROUP (ORDER BY margin_min) AS numeric), 1) FROM base) AS median_margin,
  (SELECT round(CAST(min(margin_min) AS numeric), 1) FROM base) AS worst_margin,
  (SELECT json_object_agg(bin, n) FROM (
    SELECT CASE WHEN margin_min < 0 THEN 'late' WHEN margin_min < 5 THEN '0-5' WHEN margin_min < 10 THEN '5-10'
      WHEN margin_min < 20 THEN '10-20' ELSE '20+' END AS bin, count(*) AS n
    FROM base WHERE margin_min IS NOT NULL GROUP BY 1
  ) m) AS margin_bins,
  (SELECT count(*) FROM held) AS hold_measured,
  (SELECT count(*) FROM held WHERE kept_min < planned_min) AS hold_short,
  (SELECT round(CAST(percentile_cont(0.5) WITHIN GROUP (ORDER BY kept_min) AS numeric), 1) FROM held) AS hold_median_kept,
  (SELECT round(CAST(percentile_cont(0.5) WITHIN GROUP (ORDER BY planned_min) AS numeric), 1) FROM held) AS hold_median_planned,
  (SELECT round(CAST(min(kept_min - planned_min) AS numeric), 1) FROM held) AS hold_worst_shortfall,
  (SELECT count(*) FROM pressed) AS pressure_measured,
  (SELECT count(*) FROM pressed WHERE pressure_kpa > rated_max_kpa) AS pressure_above,
  (SELECT count(*) FROM pressed WHERE pressure_kpa < rated_min_kpa) AS pressure_below,
  (SELECT round(CAST(percentile_cont(0.5) WITHIN GROUP (ORDER BY pct) AS numeric), 1) FROM pressed) AS pressure_median_pct,
  (SELECT json_object_agg(bin, n) FROM (
    SELECT CASE WHEN pct < 50 THEN '<50%' WHEN pct < 75 THEN '50-75%' WHEN pct < 90 THEN '75-90%'
      WHEN pct <= 100 THEN '90-100%' ELSE '>100%' END AS bin, count(*) AS n
    FROM pressed GROUP BY 1
  ) p) AS pressure_bins,
  (SELECT json_agg(json_build_object(
      'week_start', to_char(w.week_start, 'YYYY-MM-DD'), 'installs', w.installs, 'flagged', w.flagged,
      'by_flag', COALESCE(f.by_flag, '{}'::json), 'median_margin', w.median_margin, 'worst_margin', w.worst_margin,
      'hold_kept', w.hold_kept, 'hold_planned', w.hold_planned
    ) ORDER BY w.week_start)
    FROM weekly w LEFT JOIN week_flags f ON f.week_start = w.week_start) AS weekly,
  (SELECT json_agg(json_build_object(
      'crew_id', c.crew_id, 'crew_name', c.crew_name, 'installs', c.installs, 'flagged', c.flagged, 'median_margin', c.median_margin
    ) ORDER BY c.crew_name NULLS LAST)
    FROM (
      SELECT b.crew_id, cr.name AS crew_name, count(*) AS installs,
        count(*) FILTER (WHERE cardinality(b.flag_kinds) > 0) AS flagged,
        round(CAST(percentile_cont(0.5) WITHIN GROUP (ORDER BY b.margin_min) AS numeric), 1) AS median_margin
      FROM base b LEFT JOIN crews cr ON cr.id = b.crew_id AND cr.company_id = :companyId
      GROUP BY b.crew_id, cr.name
    ) c) AS by_crew
`;
