import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { resinClockSpec } from '@/lib/cure/resin-spec';
import { dayInZone } from '@/lib/time/dates';
import { installClock } from '@/lib/install/plan-and-flags';
import { deriveInstallState } from '@/lib/install/state';
import { invoiceTotals } from '@/lib/invoice/money';
import { patchLength } from '@/lib/sizing/patch-length';

// The demo seed builds its rows in CommonJS (sequelize-cli requires seeders). These checks hold the rows it
// would store to what the app computes itself, so the demo cannot drift from lib/ again.

type Row = Record<string, unknown> & { id: string };
type Tables = Record<string, Row[]>;
type Spec = {
  company: { min_overlap_per_end_mm: number; hold_reserve?: number; unit_system: 'imperial' | 'metric' };
  jobs: { repairs: unknown[]; install?: { shape?: 'clean' | 'late-inflate' | 'early-deflate' } }[];
};

const require = createRequire(import.meta.url);
const { buildCompany } = require('../../../scripts/demo/build.cjs') as {
  buildCompany: (spec: Spec, options: { now: Date; passwordHash: string }) => Tables;
};
const SCENARIOS: [string, Spec][] = [
  ['main', require('../../../scripts/demo/scenario-main.cjs') as Spec],
  ['second', require('../../../scripts/demo/scenario-second.cjs') as Spec],
];
const NOW = new Date('2026-12-02T15:00:00Z');
// The company default of the migration that added it (companies.hold_reserve), which the demo leaves alone.
const DEFAULT_HOLD_RESERVE = 0.1;

describe.each(SCENARIOS)('the %s demo company', (_name, spec) => {
  const t = buildCompany(spec, { now: NOW, passwordHash: 'not-a-hash' });
  const company = t.companies[0] as Row & {
    min_overlap_per_end_mm: number;
    working_window_safety_margin: number;
    time_zone: string;
  };

  it('plans each patch at the length lib/sizing gives (defect plus the company overlap at each end)', () => {
    expect(t.repairs.length).toBeGreaterThan(0);
    for (const repair of t.repairs) {
      const expected = patchLength({
        defectLengthMm: repair.defect_length_mm as number,
        overlapPerEndMm: company.min_overlap_per_end_mm,
      });
      expect(repair.planned_patch_length_mm).toBe(expected);
    }
  });

  it('stores job days as lib/dates gives them in the company zone', () => {
    for (const kit of t.resin_kits) expect(kit.received_on).toBe(dayInZone(NOW, company.time_zone, -60));
  });

  it('times every install so that lib/install/clock flags exactly the shape the scenario meant', () => {
    // build.cjs makes installs job by job, repair by repair; the first repair of a job takes the job's shape.
    const shapes = spec.jobs.flatMap((job) =>
      job.install ? job.repairs.map((_, position) => (position === 0 ? (job.install!.shape ?? 'clean') : 'clean')) : [],
    );
    expect(t.installs).toHaveLength(shapes.length);
    t.installs.forEach((install, index) => {
      const { plan, flags, problem } = clockOf(t, install, spec);
      expect(problem).toBeNull();
      expect(plan?.deflateAfter).toBeInstanceOf(Date);
      const kinds = flags.map((flag) => flag.kind);
      expect(kinds.includes('late-inflate')).toBe(shapes[index] === 'late-inflate');
      expect(kinds.includes('early-deflate')).toBe(shapes[index] === 'early-deflate');
      // The patch length the crew recorded is the planned one.
      const repair = t.repairs.find((r) => r.id === install.repair_id)!;
      expect(install.patch_length_mm).toBe(repair.planned_patch_length_mm);
    });
  });

  it('totals each invoice with lib/invoice/money (lines, tax on the subtotal, total)', () => {
    for (const invoice of t.invoices) {
      const lines = t.invoice_lines.filter((line) => line.invoice_id === invoice.id);
      const totals = invoiceTotals(
        lines.map((line) => ({ quantity: line.quantity as number, unitPriceCents: line.unit_price_cents as number })),
        invoice.tax_rate_bp as number,
      );
      expect(lines.map((line) => line.amount_cents)).toEqual(totals.amounts);
      expect([invoice.subtotal_cents, invoice.tax_cents, invoice.total_cents]).toEqual([
        totals.subtotalCents,
        totals.taxCents,
        totals.totalCents,
      ]);
    }
  });
});

describe('the demo install shapes', () => {
  it('include clean installs, a late inflation and an early deflation, as the clock tells them apart', () => {
    const spec = SCENARIOS[0][1];
    const t = buildCompany(spec, { now: NOW, passwordHash: 'not-a-hash' });
    const kinds = t.installs.map((install) => clockOf(t, install, spec).flags.map((flag) => flag.kind));
    const clean = kinds.filter((k) => !k.includes('late-inflate') && !k.includes('early-deflate'));
    expect(clean.length).toBeGreaterThan(0);
    expect(kinds.filter((k) => k.includes('late-inflate')).length).toBeGreaterThan(0);
    expect(kinds.filter((k) => k.includes('early-deflate')).length).toBeGreaterThan(0);
  });
});

/** The install's state and lib/install/clock's plan and flags, from the rows the demo would store. */
function clockOf(t: Tables, install: Row, spec: Spec) {
  const company = t.companies[0] as Row & { working_window_safety_margin: number };
  const events = t.install_events
    .filter((event) => event.install_id === install.id)
    .map((event) => ({
      id: event.id,
      type: event.type as never,
      deviceTime: event.device_time as Date,
      payload: JSON.parse(event.payload as string) as Record<string, unknown>,
    }));
  const resin = t.resin_systems.find((r) => r.id === install.resin_system_id)!;
  const kit = t.resin_kits.find((k) => k.id === install.resin_kit_id)!;
  const packer = t.packers.find((p) => p.id === install.packer_id)!;
  const state = deriveInstallState(events);
  const { plan, flags, problem } = installClock({
    state,
    resin: resinClockSpec({
      refTempC: resin.ref_temp_c as number,
      potLifeMin: resin.pot_life_min as number,
      holdMin: resin.hold_min as number,
      fullCureMin: resin.full_cure_min as number,
      minTempC: resin.min_temp_c as number,
      maxTempC: resin.max_temp_c as number,
      sensitivityKind: resin.sensitivity_kind as 'doubling' | 'arrhenius',
      doublingC: (resin.doubling_c as number | undefined) ?? null,
      activationEnergyKj: (resin.activation_energy_kj as number | undefined) ?? null,
    }),
    packer: { minPressureKpa: packer.min_pressure_kpa as number, maxPressureKpa: packer.max_pressure_kpa as number },
    resinKitExpiresOn: kit.expires_on as string,
    safetyMargin: company.working_window_safety_margin,
    holdReserve: spec.company.hold_reserve ?? DEFAULT_HOLD_RESERVE,
    unitSystem: spec.company.unit_system,
    now: install.finished_at as Date,
  });
  return { plan, flags, problem };
}
