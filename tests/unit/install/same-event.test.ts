import { describe, expect, it } from 'vitest';
import { deepEqual, isSameEvent } from '@/lib/install/same-event';
import { mayDecide, mayWorkOn } from '@/lib/install/access';

describe('isSameEvent', () => {
  const stored = {
    installId: 'i1',
    type: 'bladder_inflated',
    deviceTime: new Date('2026-12-01T15:00:00Z'),
    payload: { pressureKpa: 100, confirmedOutOfRange: false },
    correctsEventId: null,
  };

  it('matches a replay: the same instant in another offset, keys in another order', () => {
    expect(
      isSameEvent(stored, {
        ...stored,
        deviceTime: '2026-12-01T08:00:00-07:00',
        payload: { confirmedOutOfRange: false, pressureKpa: 100 },
      }),
    ).toBe(true);
  });

  it('tells a different event apart', () => {
    expect(isSameEvent(stored, { ...stored, installId: 'i2' })).toBe(false);
    expect(isSameEvent(stored, { ...stored, type: 'pressure_reading' })).toBe(false);
    expect(isSameEvent(stored, { ...stored, deviceTime: '2026-12-01T15:00:01Z' })).toBe(false);
    expect(isSameEvent(stored, { ...stored, payload: { pressureKpa: 101, confirmedOutOfRange: false } })).toBe(false);
    expect(isSameEvent(stored, { ...stored, correctsEventId: 'e1' })).toBe(false);
  });
});

describe('deepEqual', () => {
  it('compares JSON values structurally', () => {
    expect(deepEqual({ a: [1, { b: 'x' }] }, { a: [1, { b: 'x' }] })).toBe(true);
    expect(deepEqual({ a: [1, 2] }, { a: [2, 1] })).toBe(false);
    expect(deepEqual({ a: 1 }, { a: 1, b: undefined })).toBe(true);
    expect(deepEqual({ a: 1 }, { a: 1, b: null })).toBe(false);
    expect(deepEqual([], {})).toBe(false);
  });
});

describe('who may work on an install', () => {
  it('lets the office and admins in, and field users only on their own crews', () => {
    expect(mayWorkOn({ role: 'office', crewIds: [] }, ['c1'])).toBe(true);
    expect(mayWorkOn({ role: 'admin', crewIds: [] }, [null])).toBe(true);
    expect(mayWorkOn({ role: 'technician', crewIds: ['c1'] }, ['c1'])).toBe(true);
    expect(mayWorkOn({ role: 'technician', crewIds: ['c2'] }, ['c1', null])).toBe(false);
    expect(mayWorkOn({ role: 'foreman', crewIds: [] }, [null])).toBe(false);
  });

  it('leaves sign-off and no-go overrides to the foreman, the office and admins', () => {
    expect(mayDecide({ role: 'technician', crewIds: [] })).toBe(false);
    for (const role of ['foreman', 'office', 'admin'] as const) expect(mayDecide({ role, crewIds: [] })).toBe(true);
  });
});
