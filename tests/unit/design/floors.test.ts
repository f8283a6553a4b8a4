import { describe, expect, it } from 'vitest';
import { MAX_DIMENSION_RATIO, designLiner } from '@/lib/design';

// Check values: ASTM F1216 Appendix X1 (from memory). X1.2.1: with no groundwater above the invert a partially
// deteriorated design should have DR = D/t ≤ 100. X1.4: E·I/D³ ≥ 0.093 psi with I = t³/12.
const dry = { condition: 'partial' as const, meanDiameterIn: 12, ovalityPct: 2, longTermModulusPsi: 125_000 };

describe('designLiner — the floors ASTM F1216 X1 sets beside the equations', () => {
  it('DR ≤ 100 governs a partially deteriorated design with no groundwater and no short-term modulus', () => {
    expect(MAX_DIMENSION_RATIO).toBe(100);
    const d = designLiner(dry);
    // By hand: t = D/100 = 12 in/100 = 0.12 in = 3.048 mm (1 in = 25.4 mm, NIST SP 811, exact).
    expect(d.checks).toEqual({ dimensionRatio: 0.12 });
    expect(d.governing).toBe('dimensionRatio');
    expect(d.thicknessIn).toBe(0.12);
    expect(d.thicknessMm).toBeCloseTo(3.048, 12);
  });

  it('no groundwater no longer throws, and a groundwater head of 0 ft is the same as none', () => {
    expect(designLiner({ ...dry, groundwaterFtAboveInvert: 0 }).governing).toBe('dimensionRatio');
  });

  it('X1.4 stiffness joins whenever the short-term modulus is known, and governs the dry 12 in pipe at 250 000 psi', () => {
    const d = designLiner({ ...dry, shortTermModulusPsi: 250_000 });
    // By hand: t = D·(12 × 0.093 / E)^(1/3) = 12 × (4.464e-6)^(1/3) = 12 × 0.016 465 = 0.1976 in.
    expect(d.checks.minimumStiffness).toBeCloseTo(0.1976, 4);
    expect(d.checks.dimensionRatio).toBe(0.12);
    expect(d.governing).toBe('minimumStiffness');
  });

  it('with groundwater above the invert the DR floor is not the rule: buckling and stiffness are', () => {
    const d = designLiner({ ...dry, groundwaterFtAboveInvert: 3, shortTermModulusPsi: 250_000 });
    expect(d.checks.dimensionRatio).toBeUndefined();
    expect(d.checks.buckling).toBeGreaterThan(0);
    expect(d.checks.minimumStiffness).toBeCloseTo(0.1976, 4);
  });

  it('a fully deteriorated design has no DR floor (X1.3 carries it)', () => {
    const d = designLiner({
      ...dry,
      condition: 'full',
      waterAboveTopFt: 0,
      soilCoverFt: 10,
      soilDensityPcf: 120,
      soilModulusPsi: 1_000,
    });
    expect(d.checks.dimensionRatio).toBeUndefined();
    expect(d.governing).toBe('fullyDeteriorated');
  });
});

describe('X1.3 edition', () => {
  it('C inside the root (F1216-07b and later) gives 1.01 in on the textbook example; the older form about 6 % more', () => {
    // The older editions' form by hand: q_t = (C/N)·[32·R_w·B′·E′s·(E_L·I/D³)]^½ on the same example.
    const [D, Hw, H, w, Ws, Es, EL, N] = [48, 8, 16, 120, 0.35, 1_000, 125_000, 2];
    const C = Math.pow(0.98 / Math.pow(1.02, 2), 3);
    const Rw = 1 - (0.33 * Hw) / H;
    const B = 1 / (1 + 4 * Math.exp(-0.065 * H));
    const qt = 0.433 * Hw + (w * H * Rw) / 144 + Ws;
    const older = Math.cbrt((12 * Math.pow((N * qt) / C, 2) * D ** 3) / (32 * Rw * B * Es * EL));
    const current = designLiner({
      condition: 'full',
      meanDiameterIn: D,
      ovalityPct: 2,
      longTermModulusPsi: EL,
      waterAboveTopFt: Hw,
      soilCoverFt: H,
      soilDensityPcf: w,
      liveLoadPsi: Ws,
      soilModulusPsi: Es,
    }).checks.fullyDeteriorated!;
    expect(current).toBeCloseTo(1.01, 2);
    expect(older).toBeCloseTo(1.07, 2);
    expect(older / current).toBeCloseTo(1.06, 2);
  });
});
