import { describe, expect, it } from 'vitest';
import { CureInputError, flagsFor, planCure, type InstallRecord } from '@/lib/cure';
import { installClock } from '@/lib/install/plan-and-flags';
import { deriveInstallState } from '@/lib/install/state';
import { SAFETY_DEFERRAL, SAFETY_REMINDERS } from '@/lib/install/safety';
import { at, plusMin, typicalEpoxy } from './fixtures';

// The example epoxy of fixtures.ts: 30 min pot life, 90 min hold, 240 min full cure at 20 °C,
// rated 5–40 °C, times halving every 10 °C warmer (the trade's rule of thumb, common practice).
const mixedAt = at('2026-06-02T08:00:00Z');
const base = { mixedAt, mixTempC: 20, pipeTempC: 20, dryRunSeconds: 10 * 60 };

describe('GO / NO-GO counts the whole pull (preparation + dry run + reserve)', () => {
  it('the same 10 min pull is GO without preparation and NO-GO with 15 min of wet-out and loading', () => {
    // 30 min window less the default 20 % reserve leaves 24 min (project choice of reserve).
    expect(planCure(typicalEpoxy, { ...base, prepMinutes: 0 }).go).toBe(true);
    const plan = planCure(typicalEpoxy, { ...base, prepMinutes: 15 });
    expect(plan.neededMin).toBe(25);
    expect(plan.go).toBe(false);
    expect(plan.reasons[0]).toMatch(/plus 15 min of preparation needs 25 min/);
  });

  it('says exactly what was counted', () => {
    const plan = planCure(typicalEpoxy, { ...base, prepMinutes: 12 });
    expect(plan.prepMinutes).toBe(12);
    expect(plan.counted).toBe(
      "Counted: 12 min from mixing to patch on the packer + the dry run's pull of 0:10:00 = 22 min; " +
        "the working window of 30 min at the resin's 20 °C, less the 20 % reserve, leaves 24 min.",
    );
    expect(plan.go).toBe(true);
  });
});

describe('the warmer of resin and air sets the working window (10 °C halving rule, common practice)', () => {
  it('resin at 20 °C, air at 30 °C: the window is the 30 °C one, 15 min', () => {
    const plan = planCure(typicalEpoxy, { ...base, airTempC: 30 });
    expect(plan.windowTempC).toBe(30);
    expect(plan.workingWindowMin).toBe(15);
    expect(plan.inflateBy).toEqual(at('2026-06-02T08:15:00Z'));
    expect(plan.counted).toMatch(/30 °C, the warmer of resin \(20 °C\) and air \(30 °C\)/);
  });

  it('air cooler than the resin does not lengthen the window', () => {
    expect(planCure(typicalEpoxy, { ...base, mixTempC: 30, airTempC: 10 }).workingWindowMin).toBe(15);
  });

  it('resin colder than its rated minimum is NO-GO with a reason and raises the cold-cure flag, naming the mix', () => {
    const plan = planCure(typicalEpoxy, { ...base, mixTempC: 3 });
    expect(plan.go).toBe(false);
    expect(plan.reasons.join(' ')).toMatch(/resin at 3 °C is colder than its minimum of 5 °C/);
    const flags = flagsFor({ resin: typicalEpoxy, mixedAt, mixTempC: 3, pipeTempC: 20, dryRunSeconds: 60 });
    expect(flags.map((f) => f.kind)).toEqual(['cold-cure']);
    expect(flags[0].message).toMatch(/^Resin mixed at 3 °C, below the resin's minimum of 5 °C\.$/);
    // Pipe and mix both cold: still one cold-cure flag, naming both.
    const both = flagsFor({ resin: typicalEpoxy, mixedAt, mixTempC: 3, pipeTempC: 2, dryRunSeconds: 60 });
    expect(both.map((f) => f.kind)).toEqual(['cold-cure']);
    expect(both[0].message).toMatch(/pipe at 2 °C.*mixed at 3 °C/);
  });

  it('mixing in air warmer than the rated maximum is NO-GO and raises the hot-cure flag, naming the mix, in the company units', () => {
    const plan = planCure(typicalEpoxy, { ...base, airTempC: 45, unitSystem: 'imperial' });
    expect(plan.go).toBe(false);
    // 45 °C = 113 °F, 40 °C = 104 °F (NIST SP 811 B.9: t/°F = 1.8 t/°C + 32).
    expect(plan.reasons.join(' ')).toMatch(/Mixing at 113 °F is warmer than this resin's maximum of 104 °F/);
    expect(
      flagsFor({ resin: typicalEpoxy, mixedAt, mixTempC: 20, airTempC: 45, pipeTempC: 20, dryRunSeconds: 60 }).map(
        (f) => f.kind,
      ),
    ).toEqual(['hot-cure']);
  });
});

describe('no clock outside the rated pipe range', () => {
  const inflatedAt = plusMin(mixedAt, 10);

  it('a pipe at 3 °C (minimum 5 °C): no hold, no full cure, no deflate-after, no return to service, NO-GO', () => {
    const plan = planCure(typicalEpoxy, { ...base, pipeTempC: 3, inflatedAt });
    expect(plan.holdMin).toBeNull();
    expect(plan.fullCureMin).toBeNull();
    expect(plan.keepInflatedMin).toBeNull();
    expect(plan.holdSource).toBeNull();
    expect(plan).not.toHaveProperty('deflateAfter');
    expect(plan).not.toHaveProperty('returnToService');
    expect(plan.go).toBe(false);
    expect(plan.reasons.join(' ')).toMatch(/colder than this resin's minimum of 5 °C/);
    expect(plan.reasons.join(' ')).toMatch(/hold time from the resin maker's sheet/);
  });

  it("with the maker's hold entered on override, the deflate countdown runs to it (plus the reserve); hold stays null", () => {
    const plan = planCure(typicalEpoxy, { ...base, pipeTempC: 45, inflatedAt, makerHoldMin: 120, holdReserve: 0.1 });
    expect(plan.holdMin).toBeNull();
    expect(plan.holdSource).toBe('maker');
    expect(plan.makerHoldMin).toBe(120);
    expect(plan.keepInflatedMin).toBeCloseTo(132, 9);
    expect(plan.deflateAfter).toEqual(plusMin(inflatedAt, 132));
    expect(plan).not.toHaveProperty('returnToService');
    expect(plan.go).toBe(false);
  });

  it("the maker's hold is ignored inside the rated range: the resin's corrected hold counts", () => {
    const plan = planCure(typicalEpoxy, { ...base, inflatedAt, makerHoldMin: 5 });
    expect(plan.holdSource).toBe('resin');
    expect(plan.deflateAfter).toEqual(plusMin(inflatedAt, 90));
  });
});

describe('hold reserve: deflateAfter = inflatedAt + holdMin × (1 + holdReserve)', () => {
  const inflatedAt = at('2026-06-02T08:10:00Z');

  it('10 % on a 90 min hold: keep inflated 99 min; holdMin itself unchanged', () => {
    const plan = planCure(typicalEpoxy, { ...base, inflatedAt, holdReserve: 0.1 });
    expect(plan.holdMin).toBe(90);
    expect(plan.holdReserve).toBe(0.1);
    expect(plan.keepInflatedMin).toBeCloseTo(99, 9);
    expect(plan.deflateAfter).toEqual(at('2026-06-02T09:49:00Z'));
    // The full cure is not stretched by the hold reserve.
    expect(plan.returnToService).toEqual(at('2026-06-02T12:10:00Z'));
  });

  it('defaults to 0', () => {
    const plan = planCure(typicalEpoxy, { ...base, inflatedAt });
    expect(plan.holdReserve).toBe(0);
    expect(plan.deflateAfter).toEqual(at('2026-06-02T09:40:00Z'));
  });

  it.each([[-0.1], [1.5], [Number.NaN]])('refuses a reserve of %s', (holdReserve) => {
    expect(() => planCure(typicalEpoxy, { ...base, holdReserve })).toThrow(CureInputError);
  });

  it('deflating inside the reserve is a warning, before the hold a critical flag', () => {
    const install: InstallRecord = {
      resin: typicalEpoxy,
      mixedAt,
      mixTempC: 20,
      pipeTempC: 20,
      dryRunSeconds: 60,
      holdReserve: 0.1,
      inflatedAt,
    };
    const after = (min: number) => flagsFor({ ...install, deflatedAt: plusMin(inflatedAt, min) });
    expect(after(100)).toEqual([]);
    expect(after(95)).toEqual([expect.objectContaining({ kind: 'early-deflate', severity: 'warning' })]);
    expect(after(95)[0].message).toMatch(/inside the company's 10 % hold reserve/);
    expect(after(85)).toEqual([expect.objectContaining({ kind: 'early-deflate', severity: 'critical' })]);
  });
});

describe('times in flags are in the company zone, never a raw ISO instant', () => {
  it('a late inflate read in America/Denver (UTC−6 in June, IANA tz database)', () => {
    const events = [
      {
        id: 'a',
        type: 'conditions_recorded' as const,
        deviceTime: '2026-06-02T07:55:00Z',
        payload: { mixTempC: 20, pipeTempC: 20, resinKitId: 'k', packerId: 'p', patchLengthMm: 600 },
      },
      { id: 'b', type: 'dry_run_finished' as const, deviceTime: '2026-06-02T07:56:00Z', payload: { seconds: 300 } },
      { id: 'c', type: 'resin_mixed' as const, deviceTime: '2026-06-02T08:00:00Z', payload: {} },
      {
        id: 'd',
        type: 'bladder_inflated' as const,
        deviceTime: '2026-06-02T08:40:23.409Z',
        payload: { pressureKpa: 120 },
      },
    ];
    const clock = installClock({
      state: deriveInstallState(events),
      resin: typicalEpoxy,
      packer: null,
      resinKitExpiresOn: null,
      safetyMargin: 0.2,
      unitSystem: 'metric',
      timeZone: 'America/Denver',
      now: at('2026-06-02T09:00:00Z'),
    });
    const text = clock.flags.map((f) => f.message).join(' ');
    expect(clock.flags.map((f) => f.kind)).toEqual(['late-inflate']);
    // The zone's name is what the runtime's ICU gives: "MDT" or "GMT-6".
    expect(text).toMatch(/Inflated at 2026-06-02 02:40 (MDT|GMT-6)/);
    expect(text).toMatch(/inflate-by time 2026-06-02 02:30 (MDT|GMT-6)/);
    expect(text).not.toMatch(/\d{4}-\d{2}-\d{2}T\d{2}:\d{2}/);
  });
});

describe('cautions: flow control, bypass and sewage hygiene (common practice)', () => {
  const text = (id: string) => SAFETY_REMINDERS.find((r) => r.id === id)?.text ?? '';

  it('warns that plugs can blow out under back-pressure and never to stand in line with one', () => {
    expect(text('plugs')).toMatch(/blow out under back-pressure/);
    expect(text('plugs')).toMatch(/never stand in line with a plug/);
  });

  it('warns of sewage backing up into buildings while plugged: occupants and upstream levels', () => {
    expect(text('backup')).toMatch(/back up into buildings/);
    expect(text('backup')).toMatch(/warn the occupants/);
    expect(text('backup')).toMatch(/upstream levels/);
  });

  it('gives sewage hygiene (gloves, washing, vaccinations as local rules advise) and still defers to local codes', () => {
    expect(text('hygiene')).toMatch(/gloves/);
    expect(text('hygiene')).toMatch(/wash hands/);
    expect(text('hygiene')).toMatch(/vaccinations .* as your local health rules advise/);
    expect(SAFETY_DEFERRAL).toMatch(/local codes/);
  });
});
