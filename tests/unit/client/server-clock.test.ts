import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { clockOffsetMs, recordServerDate, resetServerClock, serverNow } from '@/lib/client/server-time';

const T0 = Date.UTC(2026, 4, 4, 8, 0, 0);
const httpDate = (ms: number) => new Date(ms).toUTCString(); // whole seconds, truncated

beforeEach(() => resetServerClock());
afterEach(() => vi.useRealTimers());

describe('recordServerDate', () => {
  it('is 0 before any sample', () => {
    expect(clockOffsetMs()).toBe(0);
  });

  it('takes the middle of what one sample allows: server second + 0.5 s − the request midpoint', () => {
    // Request sent at T0, answered at T0 + 200 ms by device time; the server says T0 + 60 s.
    expect(recordServerDate(httpDate(T0 + 60_000), T0, T0 + 200)).toBe(true);
    // Bounds: [60 000 − 200, 61 000 − 0] → middle 60 400.
    expect(clockOffsetMs()).toBe(60_400);
  });

  it('narrows with agreeing samples to the true offset within tens of ms', () => {
    const trueOffset = -123_456; // the tablet runs two minutes fast
    // Requests of 80 ms at varied moments within the second; the server stamps mid-flight.
    for (const startAt of [0, 130, 270, 410, 555, 690, 820, 960].map((ms, i) => T0 + i * 10_000 + ms)) {
      const serverAt = startAt + 40 + trueOffset;
      recordServerDate(httpDate(serverAt), startAt, startAt + 80);
    }
    expect(Math.abs(clockOffsetMs() - trueOffset)).toBeLessThanOrEqual(80);
  });

  it('follows the newest sample when the device clock has been moved (samples disagree)', () => {
    recordServerDate(httpDate(T0), T0, T0 + 100);
    expect(Math.abs(clockOffsetMs())).toBeLessThan(1000);
    // The tablet clock is set one hour back: the same server moment now reads an hour ahead.
    recordServerDate(httpDate(T0 + 20_000), T0 + 20_000 - 3_600_000, T0 + 20_100 - 3_600_000);
    expect(Math.abs(clockOffsetMs() - 3_600_000)).toBeLessThan(1000);
  });

  it('ignores a missing or bad header and an answer too slow to say anything', () => {
    expect(recordServerDate(null, T0, T0 + 100)).toBe(false);
    expect(recordServerDate('not a date', T0, T0 + 100)).toBe(false);
    expect(recordServerDate(httpDate(T0), T0, T0 + 60_000)).toBe(false);
    expect(recordServerDate(httpDate(T0), T0 + 100, T0)).toBe(false);
    expect(clockOffsetMs()).toBe(0);
  });
});

describe('serverNow', () => {
  it('is the device clock plus the offset', () => {
    vi.useFakeTimers();
    vi.setSystemTime(T0);
    recordServerDate(httpDate(T0 + 3_600_000), T0 - 100, T0 + 100);
    expect(serverNow().getTime() - T0).toBe(clockOffsetMs());
    expect(clockOffsetMs()).toBe(3_600_500); // [3 599 900, 3 601 100]
  });
});
