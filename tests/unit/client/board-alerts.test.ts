import { describe, expect, it } from 'vitest';
import { alertsToRaise, boardTone, runningClock } from '@/lib/client/board-alerts';

// The live board's alert rules: which clock runs, and when an install is raised as amber or red.

const T = Date.parse('2026-12-02T15:00:00Z');
const at = (min: number) => new Date(T + min * 60_000).toISOString();
const blank = { mixedAt: null, inflatedAt: null, deflatedAt: null, inflateBy: null, deflateAfter: null };

describe('runningClock', () => {
  it('runs inflate-by from the mix, deflate-after from the inflate, nothing before the mix or after deflating', () => {
    expect(runningClock(blank)).toBeNull();
    expect(runningClock({ ...blank, mixedAt: at(0), inflateBy: at(30) })).toEqual({
      kind: 'inflate-by',
      label: 'Inflate by',
      start: new Date(at(0)),
      deadline: new Date(at(30)),
    });
    const held = { mixedAt: at(0), inflateBy: at(30), inflatedAt: at(20), deflateAfter: at(110), deflatedAt: null };
    expect(runningClock(held)).toMatchObject({
      kind: 'deflate-after',
      start: new Date(at(20)),
      deadline: new Date(at(110)),
    });
    expect(runningClock({ ...held, deflatedAt: at(115) })).toBeNull();
    // Outside the resin's rated range the plan has no hold: no countdown rather than a wrong one.
    expect(runningClock({ ...held, deflateAfter: null })).toBeNull();
  });

  it('takes its tone from the countdown: amber in the last fifth (at least 5 min), red once passed', () => {
    const mixed = { ...blank, mixedAt: at(0), inflateBy: at(30) };
    expect(boardTone(mixed, new Date(at(23)))).toBe('neutral');
    // 30 min window: the last max(6 min, 5 min) are near.
    expect(boardTone(mixed, new Date(at(24)))).toBe('near');
    expect(boardTone(mixed, new Date(at(30.01)))).toBe('missed');
    expect(boardTone(blank, new Date(at(100)))).toBe('neutral');
  });
});

describe('alertsToRaise', () => {
  it('raises an install that turns amber, then again when it turns red, never twice for the same tone', () => {
    const seen = new Map<string, 'neutral' | 'near' | 'missed'>([
      ['a:inflate-by', 'neutral'],
      ['b:inflate-by', 'near'],
    ]);
    expect(
      alertsToRaise(seen, [
        { key: 'a:inflate-by', tone: 'neutral' },
        { key: 'b:inflate-by', tone: 'near' },
      ]),
    ).toEqual([]);
    expect(
      alertsToRaise(seen, [
        { key: 'a:inflate-by', tone: 'near' },
        { key: 'b:inflate-by', tone: 'missed' },
      ]),
    ).toEqual([
      { key: 'a:inflate-by', tone: 'near' },
      { key: 'b:inflate-by', tone: 'missed' },
    ]);
  });

  it('raises what is already amber or red when first seen, and a new clock of the same install afresh', () => {
    const seen = new Map<string, 'neutral' | 'near' | 'missed'>([['a:inflate-by', 'missed']]);
    expect(
      alertsToRaise(seen, [
        { key: 'c:inflate-by', tone: 'missed' },
        { key: 'a:deflate-after', tone: 'near' },
      ]),
    ).toEqual([
      { key: 'c:inflate-by', tone: 'missed' },
      { key: 'a:deflate-after', tone: 'near' },
    ]);
    // Getting better (a corrected tap) raises nothing.
    expect(alertsToRaise(seen, [{ key: 'a:inflate-by', tone: 'neutral' }])).toEqual([]);
  });
});
