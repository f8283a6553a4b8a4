// The geometry of an install's plan-against-reality chart: pure, so the review page's SVG and
// the repair report's PDF draw the same picture from the same numbers. No I/O, no React.

/** The planned deadlines (from lib/cure's plan) and the recorded moments of one install. */
export type TimelineInput = {
  mixedAt: Date | null;
  /** Inflate-by less the company's safety margin; inflating after it is cutting it close. */
  safeInflateBy?: Date | null;
  inflateBy: Date | null;
  inflatedAt: Date | null;
  deflateAfter?: Date | null;
  deflatedAt: Date | null;
  returnToService?: Date | null;
};

/** plan: what the resin allowed; done: reality kept the plan; near: inside the safety margin; missed: reality missed the plan. */
export type TimelineTone = 'plan' | 'done' | 'near' | 'missed';

export type TimelineBar = { x: number; width: number; from: Date; to: Date; tone: TimelineTone; label: string };
export type TimelineMark = { x: number; at: Date; tone: TimelineTone; label: string };

export type TimelineLane = {
  key: 'working' | 'hold' | 'cure';
  label: string;
  /** Top of the lane and its height, in the chart's units. */
  y: number;
  height: number;
  plan: TimelineBar;
  actual: TimelineBar | null;
  /** The stretch where reality missed the plan (late inflate, early deflate) or came close. */
  miss: TimelineBar | null;
  mark: TimelineMark | null;
};

export type TimelineTick = { x: number; at: Date };

export type TimelineGeometry = {
  width: number;
  height: number;
  plotLeft: number;
  plotRight: number;
  /** Where the time axis is drawn (below the lanes). */
  axisY: number;
  start: Date;
  end: Date;
  tickMinutes: number;
  ticks: TimelineTick[];
  lanes: TimelineLane[];
};

export type TimelineLayout = {
  width: number;
  /** Room on the left for the lane labels. */
  labelWidth: number;
  rightPad: number;
  topPad: number;
  laneHeight: number;
  laneGap: number;
  axisHeight: number;
  maxTicks: number;
};

export const DEFAULT_TIMELINE_LAYOUT: TimelineLayout = {
  width: 720,
  labelWidth: 120,
  rightPad: 16,
  topPad: 8,
  laneHeight: 28,
  laneGap: 12,
  axisHeight: 28,
  maxTicks: 8,
};

const MIN = 60_000;
const TICK_STEPS_MIN = [1, 2, 5, 10, 15, 20, 30, 60, 120, 180, 240, 360, 720, 1440];

/**
 * Lanes for the working window (mix → inflate-by, actual mix → inflate), the hold (inflate →
 * deflate-after, actual inflate → deflate) and the full cure (inflate → return to service), on one
 * time axis. Null when the install has no clock yet (not mixed, or no plan).
 */
export function timelineGeometry(input: TimelineInput, layout: Partial<TimelineLayout> = {}): TimelineGeometry | null {
  const L = { ...DEFAULT_TIMELINE_LAYOUT, ...layout };
  const { mixedAt, inflateBy, inflatedAt, deflatedAt } = input;
  if (!mixedAt || !inflateBy) return null;
  const deflateAfter = inflatedAt ? (input.deflateAfter ?? null) : null;
  const returnToService = inflatedAt ? (input.returnToService ?? null) : null;

  const instants = [mixedAt, inflateBy, inflatedAt, deflateAfter, deflatedAt, returnToService, input.safeInflateBy]
    .filter((d): d is Date => d instanceof Date && Number.isFinite(d.getTime()))
    .map((d) => d.getTime());
  const first = Math.min(...instants);
  const last = Math.max(...instants, first + MIN);
  // A little air either side, so a mark at either end is not cut in half.
  const pad = (last - first) * 0.03;
  const start = first - pad;
  const end = last + pad;
  const plotLeft = L.labelWidth;
  const plotRight = L.width - L.rightPad;
  const x = (at: Date) => round(plotLeft + ((at.getTime() - start) / (end - start)) * (plotRight - plotLeft));
  const bar = (from: Date, to: Date, tone: TimelineTone, label: string): TimelineBar => ({
    x: x(from),
    width: Math.max(0, round(x(to) - x(from))),
    from,
    to,
    tone,
    label,
  });
  const mark = (at: Date, tone: TimelineTone, label: string): TimelineMark => ({ x: x(at), at, tone, label });

  const lanes: Omit<TimelineLane, 'y' | 'height'>[] = [];
  const inflateTone: TimelineTone | null = !inflatedAt
    ? null
    : inflatedAt > inflateBy
      ? 'missed'
      : input.safeInflateBy && inflatedAt > input.safeInflateBy
        ? 'near'
        : 'done';
  lanes.push({
    key: 'working',
    label: 'Working window',
    plan: bar(mixedAt, inflateBy, 'plan', 'Mix → inflate by'),
    actual: inflatedAt && inflateTone ? bar(mixedAt, inflatedAt, inflateTone, 'Mix → inflated') : null,
    miss:
      inflatedAt && inflateTone === 'missed'
        ? bar(
            inflateBy,
            inflatedAt,
            'missed',
            `Inflated ${minutesText(inflatedAt.getTime() - inflateBy.getTime())} late`,
          )
        : inflatedAt && inflateTone === 'near' && input.safeInflateBy
          ? bar(input.safeInflateBy, inflatedAt, 'near', 'Inflated inside the safety margin')
          : null,
    mark: inflatedAt && inflateTone ? mark(inflatedAt, inflateTone, 'Inflated') : null,
  });
  if (inflatedAt && deflateAfter) {
    const early = deflatedAt !== null && deflatedAt < deflateAfter;
    lanes.push({
      key: 'hold',
      label: 'Hold',
      plan: bar(inflatedAt, deflateAfter, 'plan', 'Inflated → deflate after'),
      actual: deflatedAt ? bar(inflatedAt, deflatedAt, early ? 'missed' : 'done', 'Inflated → deflated') : null,
      miss:
        deflatedAt && early
          ? bar(
              deflatedAt,
              deflateAfter,
              'missed',
              `Deflated ${minutesText(deflateAfter.getTime() - deflatedAt.getTime())} early`,
            )
          : null,
      mark: deflatedAt ? mark(deflatedAt, early ? 'missed' : 'done', 'Deflated') : null,
    });
  }
  if (inflatedAt && returnToService) {
    lanes.push({
      key: 'cure',
      label: 'Full cure',
      plan: bar(inflatedAt, returnToService, 'plan', 'Inflated → return to service'),
      actual: null,
      miss: null,
      mark: mark(returnToService, 'plan', 'Return to service'),
    });
  }

  const placed = lanes.map((lane, i) => ({
    ...lane,
    y: L.topPad + i * (L.laneHeight + L.laneGap),
    height: L.laneHeight,
  }));
  const axisY = L.topPad + lanes.length * (L.laneHeight + L.laneGap);
  const tickMinutes = tickStep(end - start, L.maxTicks);
  const ticks: TimelineTick[] = [];
  for (let t = Math.ceil(start / (tickMinutes * MIN)) * tickMinutes * MIN; t <= end; t += tickMinutes * MIN) {
    ticks.push({ x: x(new Date(t)), at: new Date(t) });
  }
  return {
    width: L.width,
    height: axisY + L.axisHeight,
    plotLeft,
    plotRight,
    axisY,
    start: new Date(start),
    end: new Date(end),
    tickMinutes,
    ticks,
    lanes: placed,
  };
}

/** The smallest round step (minutes) that keeps the axis to at most `maxTicks` ticks. */
export function tickStep(spanMs: number, maxTicks: number): number {
  return TICK_STEPS_MIN.find((step) => spanMs / (step * MIN) <= maxTicks) ?? TICK_STEPS_MIN[TICK_STEPS_MIN.length - 1];
}

/** "7 min", "1 h 05 min". */
export function minutesText(ms: number): string {
  const total = Math.round(ms / MIN);
  if (total < 60) return `${total} min`;
  return `${Math.floor(total / 60)} h ${String(total % 60).padStart(2, '0')} min`;
}

const round = (n: number) => Math.round(n * 10) / 10;
