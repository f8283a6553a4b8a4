import { describe, expect, it } from 'vitest';
import { minutesText, tickStep, timelineGeometry } from '@/lib/review/timeline';

// Mixed at a round quarter hour, so the 15-minute ticks start at the mix.
const T0 = Date.parse('2026-12-01T15:00:00Z');
const at = (min: number) => new Date(T0 + min * 60_000);

// 1180 wide, 120 for labels, no right pad: a plot of 1060 units. The instants below span 100 min;
// with 3 % of air either side the axis spans 106 min, so one minute is exactly 10 units and
// x(t) = 120 + (t + 3) × 10. Every value below is worked out by hand from that.
const LAYOUT = { width: 1180, labelWidth: 120, rightPad: 0 };
const late = {
  mixedAt: at(0),
  safeInflateBy: at(24),
  inflateBy: at(30),
  inflatedAt: at(35),
  deflateAfter: at(80),
  deflatedAt: at(70),
  returnToService: at(100),
};

describe('timelineGeometry', () => {
  it('draws a late inflate and an early deflate in red, with the stretch each missed by', () => {
    const g = timelineGeometry(late, LAYOUT)!;
    expect(g.plotLeft).toBe(120);
    expect(g.plotRight).toBe(1180);
    expect(g.start).toEqual(at(-3));
    expect(g.end).toEqual(at(103));
    expect(g.lanes.map((l) => [l.key, l.y, l.height])).toEqual([
      ['working', 8, 28],
      ['hold', 48, 28],
      ['cure', 88, 28],
    ]);
    expect(g.axisY).toBe(128);
    expect(g.height).toBe(156);

    const [working, hold, cure] = g.lanes;
    expect(working.plan).toMatchObject({ x: 150, width: 300, tone: 'plan' });
    expect(working.actual).toMatchObject({ x: 150, width: 350, tone: 'missed' });
    expect(working.miss).toMatchObject({ x: 450, width: 50, tone: 'missed', label: 'Inflated 5 min late' });
    expect(working.mark).toMatchObject({ x: 500, tone: 'missed', label: 'Inflated' });

    expect(hold.plan).toMatchObject({ x: 500, width: 450, tone: 'plan' });
    expect(hold.actual).toMatchObject({ x: 500, width: 350, tone: 'missed' });
    expect(hold.miss).toMatchObject({ x: 850, width: 100, tone: 'missed', label: 'Deflated 10 min early' });
    expect(hold.mark).toMatchObject({ x: 850, tone: 'missed' });

    expect(cure.plan).toMatchObject({ x: 500, width: 650, tone: 'plan' });
    expect(cure.actual).toBeNull();
    expect(cure.mark).toMatchObject({ x: 1150, label: 'Return to service' });

    // 106 min on the axis: 10-minute steps would give 11 ticks, 15-minute ones 7 (0, 15 … 90).
    expect(g.tickMinutes).toBe(15);
    expect(g.ticks.map((t) => t.x)).toEqual([150, 300, 450, 600, 750, 900, 1050]);
    expect(g.ticks[0].at).toEqual(at(0));
  });

  it('marks an inflate inside the safety margin amber and a kept plan green', () => {
    const close = timelineGeometry({ ...late, inflatedAt: at(26), deflatedAt: at(90), deflateAfter: at(71) }, LAYOUT)!;
    expect(close.lanes[0].actual?.tone).toBe('near');
    expect(close.lanes[0].miss).toMatchObject({ tone: 'near', from: at(24), to: at(26) });
    expect(close.lanes[1].actual?.tone).toBe('done');
    expect(close.lanes[1].miss).toBeNull();

    const kept = timelineGeometry({ ...late, inflatedAt: at(20), deflateAfter: at(65), deflatedAt: at(70) }, LAYOUT)!;
    expect(kept.lanes.map((l) => l.actual?.tone ?? null)).toEqual(['done', 'done', null]);
    expect(kept.lanes.every((l) => l.miss === null)).toBe(true);
  });

  it('shows only the working window before the inflate, and nothing before the mix', () => {
    const mixed = timelineGeometry(
      {
        mixedAt: at(0),
        inflateBy: at(30),
        inflatedAt: null,
        deflatedAt: null,
        deflateAfter: at(99),
        returnToService: at(200),
      },
      LAYOUT,
    )!;
    expect(mixed.lanes.map((l) => l.key)).toEqual(['working']);
    expect(mixed.lanes[0].actual).toBeNull();
    expect(mixed.lanes[0].mark).toBeNull();
    // 30 min span + 2 × 0.9 min of air: the plan bar fills the plot between the pads.
    expect(mixed.lanes[0].plan.width).toBeCloseTo((1060 * 30) / 31.8, 0);
    expect(timelineGeometry({ ...late, mixedAt: null })).toBeNull();
    expect(timelineGeometry({ ...late, inflateBy: null })).toBeNull();
  });

  it('fits the default layout', () => {
    const g = timelineGeometry(late)!;
    expect(g.width).toBe(720);
    for (const lane of g.lanes) {
      for (const bar of [lane.plan, lane.actual, lane.miss].filter((b) => b !== null)) {
        expect(bar.x).toBeGreaterThanOrEqual(g.plotLeft);
        expect(bar.x + bar.width).toBeLessThanOrEqual(g.plotRight + 0.1);
      }
    }
  });
});

describe('tickStep and minutesText', () => {
  it('picks the smallest round step that keeps to the tick budget', () => {
    expect(tickStep(106 * 60_000, 8)).toBe(15);
    expect(tickStep(60 * 60_000, 8)).toBe(10);
    expect(tickStep(8 * 3600_000, 8)).toBe(60);
    expect(tickStep(30 * 86_400_000, 8)).toBe(1440);
  });
  it('writes minutes and hours', () => {
    expect(minutesText(7 * 60_000)).toBe('7 min');
    expect(minutesText(65 * 60_000)).toBe('1 h 05 min');
  });
});
