// Geometry of the install timeline drawn on the repair report (PDF and web page): a time axis with
// the clock events as ticks and the working window, hold and full cure as bars. Pure: the caller
// draws the shapes (react-pdf Svg or HTML SVG) and formats the times in the company's zone.

export type TimelineMark = { id: string; label: string; at: Date };
export type TimelineBand = { id: string; label: string; from: Date; to: Date };
export type TimelineLayout = {
  width: number;
  height: number;
  axisY: number;
  left: number;
  right: number;
  ticks: { at: Date; x: number }[];
  marks: (TimelineMark & { x: number; labelY: number })[];
  bands: (TimelineBand & { x: number; y: number; width: number; height: number })[];
};

export type TimelineOptions = {
  width: number;
  /** Horizontal room kept free at both ends, so end labels are not cut. */
  padding?: number;
  /** Average glyph width used to keep labels of one row apart (px per character). */
  charWidth?: number;
  bandHeight?: number;
  rowHeight?: number;
};

/** Tick steps in minutes, smallest first: the axis uses the first giving at most `maxTicks` ticks. */
export const TICK_STEPS_MIN = [5, 10, 15, 30, 60, 120, 240, 480, 720, 1440] as const;

export function timelineLayout(
  marks: readonly TimelineMark[],
  bands: readonly TimelineBand[],
  options: TimelineOptions,
): TimelineLayout {
  const { width, padding = 40, charWidth = 4.2, bandHeight = 9, rowHeight = 11 } = options;
  if (!(width > 2 * padding)) throw new RangeError('The timeline is narrower than its padding.');
  const times = [
    ...marks.map((m) => m.at.getTime()),
    ...bands.flatMap((b) => [b.from.getTime(), b.to.getTime()]),
  ].filter(Number.isFinite);
  const left = padding;
  const right = width - padding;
  if (times.length === 0) return { width, height: 0, axisY: 0, left, right, ticks: [], marks: [], bands: [] };

  const start = Math.min(...times);
  // A single instant still gets a one-minute axis, so x stays finite.
  const end = Math.max(Math.max(...times), start + 60_000);
  const xOf = (t: number) => left + ((t - start) / (end - start)) * (right - left);

  // Labels above the axis, in rows: each goes on the lowest row where it clears the previous label.
  const rowEnds: number[] = [];
  const placed = [...marks]
    .sort((a, b) => a.at.getTime() - b.at.getTime())
    .map((mark) => {
      const x = xOf(mark.at.getTime());
      const half = (mark.label.length * charWidth) / 2;
      let row = rowEnds.findIndex((endX) => endX + 4 <= x - half);
      if (row === -1) row = rowEnds.length;
      rowEnds[row] = x + half;
      return { ...mark, x, row };
    });
  const rows = Math.max(1, rowEnds.length);
  const axisY = rows * rowHeight + 6;
  const bandTop = axisY + 16;

  return {
    width,
    height: bandTop + bands.length * (bandHeight + 4),
    axisY,
    left,
    right,
    ticks: ticksBetween(start, end).map((t) => ({ at: new Date(t), x: xOf(t) })),
    marks: placed.map(({ row, ...mark }) => ({ ...mark, labelY: axisY - 6 - row * rowHeight })),
    bands: bands.map((band, i) => {
      const x = xOf(band.from.getTime());
      return {
        ...band,
        x,
        y: bandTop + i * (bandHeight + 4),
        width: Math.max(1, xOf(band.to.getTime()) - x),
        height: bandHeight,
      };
    }),
  };
}

/** Round-numbered instants (whole 5, 10, 15… minutes) inside [start, end], at most `maxTicks`. */
export function ticksBetween(start: number, end: number, maxTicks = 8): number[] {
  const spanMin = (end - start) / 60_000;
  const step =
    (TICK_STEPS_MIN.find((s) => spanMin / s <= maxTicks) ?? Math.ceil(spanMin / maxTicks / 1440) * 1440) * 60_000;
  const ticks: number[] = [];
  for (let t = Math.ceil(start / step) * step; t <= end; t += step) ticks.push(t);
  return ticks;
}
