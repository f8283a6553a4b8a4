import { describe, expect, it } from 'vitest';
import { ALARM_LATE_MS, alarmsDue, countdownState, type Alarm } from '@/lib/client/countdown';

const START = new Date(Date.UTC(2026, 4, 4, 8, 0, 0));
const at = (ms: number) => new Date(START.getTime() + ms);
const MIN = 60_000;

describe('countdownState', () => {
  const forty = { start: START, deadline: at(40 * MIN) };

  it('a 40 min window: neutral with 31 min left, still neutral just over 8, near at 8 (20 % of 40)', () => {
    expect(countdownState({ ...forty, now: at(9 * MIN) })).toMatchObject({
      tone: 'neutral',
      remainingMs: 31 * MIN,
      label: '0:31:00',
    });
    expect(countdownState({ ...forty, now: at(32 * MIN - 1000) }).tone).toBe('neutral');
    expect(countdownState({ ...forty, now: at(32 * MIN) })).toMatchObject({ tone: 'near', label: '0:08:00' });
    expect(countdownState({ ...forty, now: at(39 * MIN) }).tone).toBe('near');
  });

  it('a 10 min window: near at 5 min left (the 5-minute floor beats 20 % = 2 min)', () => {
    const ten = { start: START, deadline: at(10 * MIN) };
    expect(countdownState({ ...ten, now: at(5 * MIN - 1000) }).tone).toBe('neutral');
    expect(countdownState({ ...ten, now: at(5 * MIN) })).toMatchObject({ tone: 'near', label: '0:05:00' });
  });

  it('a long cure: near in the last fifth', () => {
    const fiveHours = { start: START, deadline: at(300 * MIN) };
    expect(countdownState({ ...fiveHours, now: at(239 * MIN) }).tone).toBe('neutral');
    expect(countdownState({ ...fiveHours, now: at(240 * MIN) })).toMatchObject({ tone: 'near', label: '1:00:00' });
  });

  it('missed once passed, with the time over', () => {
    expect(countdownState({ ...forty, now: at(40 * MIN) })).toMatchObject({
      tone: 'near',
      remainingMs: 0,
      label: '0:00:00',
    });
    expect(countdownState({ ...forty, now: at(40 * MIN + 1) })).toMatchObject({
      tone: 'missed',
      label: '+0:00:01 over',
    });
    expect(countdownState({ ...forty, now: at(41 * MIN + 5000) })).toMatchObject({
      tone: 'missed',
      remainingMs: -(MIN + 5000),
      label: '+0:01:05 over',
    });
    expect(countdownState({ ...forty, now: at(40 * MIN + 2 * 3600_000) }).label).toBe('+2:00:00 over');
  });

  it('rounds the seconds left up: 0:00:00 shows only at the deadline itself', () => {
    expect(countdownState({ ...forty, now: at(40 * MIN - 1) }).label).toBe('0:00:01');
    expect(countdownState({ ...forty, now: at(40 * MIN - 1001) }).label).toBe('0:00:02');
    expect(countdownState({ ...forty, now: at(0) }).label).toBe('0:40:00');
  });

  it('shows hours past 24 without wrapping', () => {
    expect(countdownState({ start: START, deadline: at(30 * 3600_000), now: START })).toMatchObject({
      tone: 'neutral',
      label: '30:00:00',
    });
  });

  it('treats a deadline before its start as a 5-minute window', () => {
    const odd = { start: at(10 * MIN), deadline: at(5 * MIN) };
    expect(countdownState({ ...odd, now: at(0) }).tone).toBe('near');
    expect(countdownState({ ...odd, now: at(-MIN) }).tone).toBe('neutral');
  });

  it('refuses an invalid date', () => {
    expect(() => countdownState({ ...forty, now: new Date('nonsense') })).toThrow(RangeError);
  });
});

describe('alarmsDue', () => {
  const deadline = at(40 * MIN);
  /** Ticks once a second from `from` to `to` (ms after START), firing like a screen would. */
  function run(from: number, to: number, fired = new Set<string>(), extra: { start?: Date; id?: string } = {}) {
    const sounded: (Alarm & { now: number })[] = [];
    for (let t = from; t <= to; t += 1000) {
      for (const alarm of alarmsDue({ now: at(t), deadline, alreadyFired: fired, ...extra })) {
        fired.add(alarm.key);
        sounded.push({ ...alarm, now: t });
      }
    }
    return sounded;
  }

  it('fires 5 min before, 1 min before and at the deadline, each exactly once', () => {
    const sounded = run(30 * MIN, 50 * MIN);
    expect(sounded.map((a) => [a.kind, a.now])).toEqual([
      ['five-minutes', 35 * MIN],
      ['one-minute', 39 * MIN],
      ['deadline', 40 * MIN],
    ]);
    expect(sounded.map((a) => a.message)).toEqual(['5 minutes left.', '1 minute left.', 'Time is up.']);
    expect(new Set(sounded.map((a) => a.key)).size).toBe(3);
  });

  it('sounds nothing before the first alarm time', () => {
    expect(alarmsDue({ now: at(35 * MIN - 1), deadline, alreadyFired: new Set() })).toEqual([]);
  });

  it('after a sleep, sounds only the latest alarm due, not the ones it passed', () => {
    const sounded = run(39 * MIN + 30_000, 39 * MIN + 30_000);
    expect(sounded.map((a) => a.kind)).toEqual(['one-minute']);
  });

  it('does not sound an alarm much later than due', () => {
    expect(alarmsDue({ now: at(40 * MIN + ALARM_LATE_MS + 1), deadline, alreadyFired: new Set() })).toEqual([]);
    expect(alarmsDue({ now: at(40 * MIN + ALARM_LATE_MS), deadline, alreadyFired: new Set() })).toHaveLength(1);
  });

  it('skips an alarm due before the clock started (a window shorter than 5 min)', () => {
    const sounded = run(37 * MIN, 41 * MIN, new Set(), { start: at(37 * MIN) });
    expect(sounded.map((a) => a.kind)).toEqual(['one-minute', 'deadline']);
  });

  it('keys alarms by clock, so two clocks ending together both sound', () => {
    const fired = new Set<string>();
    const a = alarmsDue({ now: deadline, deadline, alreadyFired: fired, id: 'inflate' });
    a.forEach((alarm) => fired.add(alarm.key));
    const b = alarmsDue({ now: deadline, deadline, alreadyFired: fired, id: 'pot-life' });
    expect([...a, ...b].map((alarm) => alarm.key)).toEqual(['inflate:deadline', 'pot-life:deadline']);
  });
});
