import { describe, expect, it } from 'vitest';
import { correctsDecision, deviceTimeProblem, isClosedInstall } from '@/lib/install/record-rules';

const received = new Date('2026-12-02T12:00:00Z');
const offset = (ms: number) => new Date(received.getTime() + ms);

describe('deviceTimeProblem', () => {
  it('takes times from 14 days before to 5 minutes after the receive time, bounds included', () => {
    for (const ms of [0, 5 * 60_000, -14 * 24 * 3600_000, -3600_000, 60_000])
      expect(deviceTimeProblem(offset(ms), received)).toBeNull();
  });

  it('names the bound that was broken', () => {
    expect(deviceTimeProblem(offset(5 * 60_000 + 1), received)).toMatch(/^deviceTime is more than 5 minutes after/);
    expect(deviceTimeProblem(offset(-14 * 24 * 3600_000 - 1), received)).toMatch(
      /^deviceTime is more than 14 days before/,
    );
    expect(deviceTimeProblem(offset(-15 * 24 * 3600_000).toISOString(), received, 'The corrected time')).toMatch(
      /^The corrected time is more than 14 days/,
    );
    expect(deviceTimeProblem('not a date', received)).toMatch(/not a date/);
  });
});

describe('closed installs and decisions', () => {
  it('closes approved and abandoned installs only', () => {
    expect(['approved', 'abandoned'].map(isClosedInstall)).toEqual([true, true]);
    expect(['not_started', 'in_progress', 'awaiting_review', 'sent_back'].some(isClosedInstall)).toBe(false);
  });

  it('treats a correction of a go decision or a sign-off, or one carrying their keys, as a decision', () => {
    expect(correctsDecision('go_decision', {})).toBe(true);
    expect(correctsDecision('signed_off', { name: 'X' })).toBe(true);
    expect(correctsDecision('bladder_inflated', { pressureKpa: 90 })).toBe(false);
    expect(correctsDecision('bladder_inflated', { overrideReason: 'x' })).toBe(true);
    expect(correctsDecision(undefined, { go: true })).toBe(true);
    expect(correctsDecision(undefined, {})).toBe(false);
  });
});
