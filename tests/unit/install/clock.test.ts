import { describe, expect, it } from 'vitest';
import { installClock, type InstallClockInput } from '@/lib/install/plan-and-flags';
import { deriveInstallState } from '@/lib/install/state';
import { typicalEpoxy } from '../cure/fixtures';
import { at, cleanLog, conditions, ev } from './events';

const base = (events = cleanLog(), over: Partial<InstallClockInput> = {}): InstallClockInput => ({
  state: deriveInstallState(events),
  resin: typicalEpoxy,
  packer: { minPressureKpa: 70, maxPressureKpa: 150 },
  resinKitExpiresOn: '2099-12-31',
  safetyMargin: 0.2,
  unitSystem: 'metric',
  now: at(300),
  ...over,
});

describe('installClock', () => {
  it('gives no plan and no flags before the resin is known', () => {
    expect(installClock(base([], { resin: null }))).toEqual({ plan: null, flags: [], problem: null });
  });

  it('previews the plan from now before mixing, so the crew sees GO before it mixes', () => {
    const log = cleanLog().slice(0, 5);
    const { plan, flags } = installClock(base(log, { now: at(14) }));
    expect(plan?.preview).toBe(true);
    expect(plan?.go).toBe(true);
    // The example epoxy's 30 min pot life at 20 °C, started now.
    expect(plan?.inflateBy).toEqual(at(14 + 30));
    expect(flags).toEqual([]);
  });

  it('says NO-GO without a dry run, and flags it', () => {
    const { plan, flags } = installClock(base([ev('conditions_recorded', 0, conditions)], { now: at(1) }));
    expect(plan?.go).toBe(false);
    expect(flags.map((f) => f.kind)).toEqual(['no-dry-run']);
  });

  it('runs the clock from the mix once mixed, and a clean install raises no flags', () => {
    const { plan, flags } = installClock(base());
    expect(plan?.preview).toBe(false);
    expect(plan?.inflateBy).toEqual(at(16 + 30));
    expect(plan?.deflateAfter).toEqual(at(32 + 90));
    expect(flags).toEqual([]);
  });

  it('flags a late inflate, an early deflate, a pressure outside the packer and an expired kit', () => {
    const late = cleanLog().map((e) => (e.type === 'bladder_inflated' ? { ...e, deviceTime: at(50) } : e));
    expect(installClock(base(late)).flags.map((f) => f.kind)).toContain('late-inflate');
    const early = cleanLog().map((e) => (e.type === 'bladder_deflated' ? { ...e, deviceTime: at(60) } : e));
    expect(installClock(base(early)).flags.map((f) => f.kind)).toContain('early-deflate');
    const high = cleanLog().map((e) => (e.type === 'pressure_reading' ? { ...e, payload: { pressureKpa: 200 } } : e));
    expect(installClock(base(high)).flags.map((f) => f.kind)).toEqual(['pressure-out-of-range']);
    expect(installClock(base(undefined, { resinKitExpiresOn: '2026-11-30' })).flags.map((f) => f.kind)).toEqual([
      'expired-resin',
    ]);
  });

  it('does not throw on a log the clock cannot read; it says why', () => {
    const odd = [ev('resin_mixed', 30), ev('bladder_inflated', 10, { pressureKpa: 100 })];
    const clock = installClock(base(odd));
    expect(clock.plan).toBeNull();
    expect(clock.problem).toMatch(/inflated before/);
  });
});
