import { describe, expect, it } from 'vitest';
import { describeChecks, planRepair, type PlanInput } from '@/lib/planning/plan-repair';
import type { Packer } from '@/lib/sizing';

// Test inputs, not any maker's figures.
const packers: Packer[] = [
  {
    id: 'fits',
    name: 'Bore 200',
    minDiameterMm: 185,
    maxDiameterMm: 215,
    bladderLengthMm: 1200,
    endMarginMm: 100,
    minPressureKpa: 70,
    maxPressureKpa: 150,
  },
  {
    id: 'small',
    name: 'Bore 300',
    minDiameterMm: 280,
    maxDiameterMm: 320,
    bladderLengthMm: 1500,
    endMarginMm: 120,
    minPressureKpa: 50,
    maxPressureKpa: 120,
  },
  {
    id: 'short',
    name: 'Short 200',
    minDiameterMm: 185,
    maxDiameterMm: 215,
    bladderLengthMm: 900,
    endMarginMm: 100,
    minPressureKpa: 70,
    maxPressureKpa: 150,
  },
  {
    id: 'weak',
    name: 'Low rated 200',
    minDiameterMm: 185,
    maxDiameterMm: 215,
    bladderLengthMm: 1200,
    endMarginMm: 100,
    minPressureKpa: 5,
    maxPressureKpa: 20,
  },
];

const base: Omit<PlanInput, 'unitSystem'> = {
  insideDiameterMm: 200,
  defectLengthMm: 300,
  overlapPerEndMm: 305,
  packers,
};

/** Every sentence of a plan a person reads: warnings, notes, packer reasons, the resin basis and the checks run. */
function sentences(input: PlanInput) {
  const plan = planRepair(input);
  return [
    ...plan.warnings,
    ...plan.notes,
    ...plan.packers.flatMap((p) => p.reasons),
    plan.resin?.basis ?? '',
    plan.design?.summary ?? '',
  ].join('\n');
}

// Inputs that make every message appear: a short patch, packers that do not fit for each reason, groundwater of
// 2.5 m (above the weak packer's rating), a laminate too thin for it, and one that would close the pipe.
const everything = [
  { ...base, patchLengthMm: 800, groundwaterHeadMm: 2500, thicknessMm: 2 },
  { ...base, groundwaterHeadMm: 2500, thicknessMm: 120 },
  { ...base, groundwaterHeadMm: 0 },
  { ...base, packers: [packers[1]] },
];

// Unit symbols as NIST SP 811 writes them, after a number.
const METRIC = /\d\s?(mm|m|kPa|bar|°C|L|kN|MPa)\b/;
const IMPERIAL = /\d\s?(in|ft|psi|°F|US gal|lbf)\b/;

describe('planRepair — every message in the company’s units (NIST SP 811 symbols)', () => {
  it('an imperial company never reads mm, m, kPa, °C or litres', () => {
    for (const input of everything) {
      const text = sentences({ ...input, unitSystem: 'imperial' });
      expect(text).not.toMatch(METRIC);
      expect(text).toMatch(IMPERIAL);
    }
  });

  it('a metric company never reads inches, feet, psi, °F or gallons', () => {
    for (const input of everything) {
      const text = sentences({ ...input, unitSystem: 'metric' });
      expect(text).not.toMatch(IMPERIAL);
      expect(text).toMatch(METRIC);
    }
  });

  it('the messages say what they should, with values converted exactly (1 in = 25.4 mm, NIST SP 811)', () => {
    const plan = planRepair({ ...base, patchLengthMm: 800, unitSystem: 'imperial' });
    // Proposed 300 + 2 × 305 = 910 mm = 35.8 in.
    expect(plan.warnings[0]).toBe(
      'The chosen patch is shorter than the defect plus the company’s overlap at each end (35.8 in).',
    );
    expect(plan.packers.find((p) => p.id === 'small')!.reasons).toEqual([
      "Pipe 7.9 in is smaller than the packer's minimum of 11.0 in.",
    ]);
  });
});

describe('planRepair — the thickness check and its floors (ASTM F1216 X1, from memory)', () => {
  it('runs with no groundwater (head 0): X1.4 stiffness at the F1216 minimum modulus and DR ≤ 100', () => {
    const plan = planRepair({ ...base, groundwaterHeadMm: 0, thicknessMm: 6, unitSystem: 'metric' });
    // D = 200 mm = 7.874 in. X1.4 with E = 250 000 psi: t = 7.874 × (12 × 0.093/250 000)^(1/3) = 0.1296 in = 3.29 mm;
    // DR ≤ 100: t = 7.874/100 = 0.0787 in = 2.00 mm. Stiffness governs.
    expect(plan.design!.checks.dimensionRatio).toBeCloseTo(0.07874, 5);
    expect(plan.design!.checks.minimumStiffness).toBeCloseTo(0.12965, 5);
    expect(plan.design!.governing).toBe('minimumStiffness');
    expect(plan.design!.requiredThicknessMm).toBeCloseTo(3.29, 2);
    expect(plan.design!.summary).toBe('X1.4 stiffness, DR ≤ 100');
    expect(plan.design!.thick).toBe(true);
    expect(plan.assumptions.shortTermModulusPsi).toBe(250_000);
  });

  it('does not run while the groundwater head is unknown, and says how to start it', () => {
    const plan = planRepair({ ...base, thicknessMm: 6, unitSystem: 'metric' });
    expect(plan.design).toBeNull();
    expect(plan.notes.join(' ')).toMatch(/0 when there is none/);
  });

  it('names the checks it ran, with the head in the company’s units', () => {
    const checks = { buckling: 0.2, minimumStiffness: 0.13 };
    // 914.4 mm = 3.0 ft (1 ft = 304.8 mm, NIST SP 811, exact).
    expect(describeChecks(checks, 914.4, 'imperial')).toBe('X1.1 buckling at 3.0 ft of water, X1.4 stiffness');
    expect(describeChecks(checks, 914.4, 'metric')).toBe('X1.1 buckling at 0.91 m of water, X1.4 stiffness');
    expect(describeChecks({ ...checks, ovality: 0.1 }, 914.4, 'metric')).toBe(
      'X1.1 buckling at 0.91 m of water, X1.2 ovality bending, X1.4 stiffness',
    );
  });
});

describe('planRepair — resin from the resin system, pressure against groundwater', () => {
  it('takes the resin system’s ratio and excess, on the patch’s actual ring volume', () => {
    const resin = { id: 'r1', name: 'Slow epoxy', resinToFabricRatio: 1.5, excessPct: 15 };
    const plan = planRepair({ ...base, thicknessMm: 6, resin, unitSystem: 'metric' });
    // By hand: π × (200 − 6) × 6 × 910 = 3 327 701 mm³ = 3.3277 L; resin 1.5/(1 + 1.5) = 0.6 of it; × 1.15.
    expect(plan.resin!.laminateL).toBeCloseTo(3.3277, 4);
    expect(plan.resin!.resinL).toBeCloseTo(3.3277 * 0.6 * 1.15, 3);
    expect(plan.resin!.basis).toBe('Slow epoxy: resin to fabric 1.5 by volume, 15 % extra');
  });

  it('without a resin system uses the common-practice defaults and says so', () => {
    const plan = planRepair({ ...base, thicknessMm: 6, unitSystem: 'metric' });
    expect(plan.resin!.resinL).toBeCloseTo(3.3277 * 0.5 * 1.1, 3);
    expect(plan.resin!.basis).toMatch(/common practice/);
  });

  it('a packer rated below the groundwater pressure does not fit; the note asks to inflate above the head', () => {
    // 2.5 m of water = 24.5 kPa (1 m of water = 9.806 65 kPa, NIST SP 811 conventional): above the weak packer's 20 kPa.
    const plan = planRepair({ ...base, groundwaterHeadMm: 2500, unitSystem: 'metric' });
    expect(plan.groundwaterKpa).toBeCloseTo(24.52, 2);
    const weak = plan.packers.find((p) => p.id === 'weak')!;
    expect(weak.fits).toBe(false);
    expect(weak.reasons).toEqual(['Rated only to 20 kPa: it cannot press the patch against 25 kPa of groundwater.']);
    expect(plan.packers.find((p) => p.id === 'fits')!.fits).toBe(true);
    expect(plan.notes[0]).toBe(
      'Groundwater stands 2.50 m above the invert (25 kPa): inflate above that, within the packer’s rating.',
    );
  });
});
