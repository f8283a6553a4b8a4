import { describe, expect, it } from 'vitest';
import { ticksBetween, timelineLayout } from '@/lib/report/timeline';

const T0 = Date.UTC(2026, 11, 1, 15, 0);
const at = (min: number) => new Date(T0 + min * 60_000);
const marks = [
  { id: 'mixed', label: 'Resin mixed', at: at(0) },
  { id: 'loaded', label: 'Patch loaded', at: at(6) },
  { id: 'inflated', label: 'Bladder inflated', at: at(16) },
  { id: 'deflated', label: 'Bladder deflated', at: at(120) },
];
const bands = [
  { id: 'window', label: 'Working window', from: at(0), to: at(30) },
  { id: 'cure', label: 'Full cure', from: at(16), to: at(256) },
];

describe('timelineLayout', () => {
  it('maps the earliest and latest instants to the padded ends, linearly in between', () => {
    const g = timelineLayout(marks, bands, { width: 540, padding: 20 });
    expect(g.left).toBe(20);
    expect(g.right).toBe(520);
    expect(g.marks[0].x).toBe(20); // mixing is the earliest instant
    expect(g.bands[1].x + g.bands[1].width).toBeCloseTo(520, 9); // full cure ends last
    // 120 of 256 minutes along 500 px: 20 + 500 × 120/256 = 254.375
    expect(g.marks[3].x).toBeCloseTo(254.375, 9);
    expect(g.bands[0].width).toBeCloseTo((500 * 30) / 256, 9);
  });

  it('puts labels that would overlap on separate rows above the axis, and bands below it', () => {
    const g = timelineLayout(marks, bands, { width: 540, padding: 20, charWidth: 5 });
    // Mixed (x 20) and loaded (x 31.7) are 12 px apart with ~60 px labels: different rows.
    expect(g.marks[0].labelY).not.toBe(g.marks[1].labelY);
    // Deflated is far from the others: back on the first row.
    expect(g.marks[3].labelY).toBe(g.marks[0].labelY);
    for (const m of g.marks) expect(m.labelY).toBeLessThan(g.axisY);
    for (const b of g.bands) expect(b.y).toBeGreaterThan(g.axisY);
    expect(g.height).toBeGreaterThan(g.bands[1].y);
  });

  it('copes with a single instant and with nothing at all', () => {
    const one = timelineLayout([marks[0]], [], { width: 300 });
    expect(Number.isFinite(one.marks[0].x)).toBe(true);
    expect(timelineLayout([], [], { width: 300 })).toMatchObject({ height: 0, marks: [], bands: [], ticks: [] });
    expect(() => timelineLayout(marks, [], { width: 50, padding: 40 })).toThrow(RangeError);
  });
});

describe('ticksBetween', () => {
  it('uses the smallest round step giving at most 8 ticks, on whole multiples of it', () => {
    // 256 minutes: 30-minute steps would give 9, so 60-minute steps: 16:00, 17:00, 18:00, 19:00 UTC.
    const ticks = ticksBetween(T0, T0 + 256 * 60_000);
    expect(ticks.map((t) => new Date(t).toISOString().slice(11, 16))).toEqual([
      '15:00',
      '16:00',
      '17:00',
      '18:00',
      '19:00',
    ]);
    const short = ticksBetween(T0 + 60_000, T0 + 31 * 60_000);
    expect(short.map((t) => (t - T0) / 60_000)).toEqual([5, 10, 15, 20, 25, 30]);
  });
});
