import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { GET as planRoute } from '@/app/api/repairs/[id]/plan/route';
import { PATCH as patchRoute } from '@/app/api/repairs/[id]/route';
import { Company, Packer, Repair, ResinSystem } from '@/models';
import { makeInstallWorld, makeWorld, type InstallWorld, type World } from './helpers/world';
import { signInAs, signOut } from './helpers/session';
import { call, jsonBody } from './helpers/call';

const plan = (id: string, query = '') => call(planRoute, `/api/repairs/${id}/plan${query}`, { id });

// Check values worked by hand from the published formulas, not through lib/sizing or lib/design.
const MM_PER_IN = 25.4; // NIST SP 811 App. B, exact
const MM_PER_FT = 304.8; // NIST SP 811 App. B, exact
const PSI_PER_FT = 0.433; // ASTM F1216 X1: 62.4 lb/ft³ ÷ 144 in²/ft²
const K = 7; // ASTM F1216 X1: enhancement factor
const N = 2; // ASTM F1216 X1: factor of safety
const NU = 0.3; // ASTM F1216 X1: Poisson's ratio
const E_L = 125_000; // psi: half of ASTM F1216 Table 1's 250 000 psi minimum modulus (common practice, from memory)

/** ASTM F1216 X1.1: P = 2·K·E_L·C/((1 − ν²)·(SDR − 1)³)/N solved for t = D/SDR; C = [(1 − q)/(1 + q)²]³. Returns mm. */
function f1216PartialMm(diameterMm: number, headMm: number, ovalityPct: number, modulusPsi = E_L) {
  const q = ovalityPct / 100;
  const c = Math.pow((1 - q) / Math.pow(1 + q, 2), 3);
  const p = PSI_PER_FT * (headMm / MM_PER_FT);
  const sdr = 1 + Math.cbrt((2 * K * modulusPsi * c) / ((1 - NU * NU) * p * N));
  return (diameterMm / MM_PER_IN / sdr) * MM_PER_IN;
}

describe('repair planning panel: GET /api/repairs/:id/plan', () => {
  let w: InstallWorld;
  let b: World;
  let long: Repair;
  beforeAll(async () => {
    w = await makeInstallWorld('Plan');
    b = await makeWorld('Other');
    // A packer for bigger pipe: listed, never fitting this 200 mm segment.
    await Packer.create({
      companyId: w.company.id,
      name: `Packer 300 ${w.company.id.slice(0, 4)}`,
      minDiameterMm: 280,
      maxDiameterMm: 320,
      bladderLengthMm: 1500,
      endMarginMm: 120,
      minPressureKpa: 50,
      maxPressureKpa: 120,
    });
    long = await Repair.create({
      companyId: w.company.id,
      jobId: w.job.id,
      segmentId: w.segment.id,
      position: 2,
      distanceMm: 20000,
      defectType: 'lengthwise_crack',
      conditionGrade: 3,
      defectLengthMm: 1000,
    });
  });
  beforeEach(() => signOut());

  it('answers 401 without a session, 404 for another company or crew, 400 for a bad query', async () => {
    expect((await plan(w.repair.id)).status).toBe(401);
    await signInAs(b.office);
    expect((await plan(w.repair.id)).status).toBe(404);
    await signInAs(w.otherTechnician);
    expect((await plan(w.repair.id)).status).toBe(404);
    await signInAs(w.office);
    const bad = await plan(w.repair.id, '?thicknessMm=-1&ovalityPct=abc&groundwaterHeadMm=1e9');
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['groundwaterHeadMm', 'ovalityPct', 'thicknessMm']);
  });

  it('proposes the patch, the fitting packer with its end margins, pressure range and end thrust', async () => {
    await signInAs(w.office);
    const { status, body } = await plan(w.repair.id);
    expect(status).toBe(200);
    // 300 mm defect + the company's 305 mm overlap at each end.
    expect(body.proposedPatchLengthMm).toBe(300 + 2 * 305);
    expect(body.patchLengthMm).toBe(910);
    const fits = body.packers.filter((p: { fits: boolean }) => p.fits);
    expect(fits.map((p: { id: string }) => p.id)).toEqual([w.packer.id]);
    // (1 200 mm bladder − 910 mm patch) / 2 = 145 mm bare at each end; the packer asks for 100.
    expect(fits[0]).toMatchObject({
      endMarginEachMm: 145,
      requiredEndMarginMm: 100,
      minPressureKpa: 70,
      maxPressureKpa: 150,
    });
    // End thrust F = P·π·D²/4 at the highest rated pressure: 150 kPa on a 0.200 m bore = 4 712.4 N.
    expect(fits[0].endThrustAtMax.newtons).toBeCloseTo((150_000 * Math.PI * 0.2 * 0.2) / 4, 6);
    expect(fits[0].endThrustAtMax.newtons).toBeCloseTo(4712.39, 1);
    const other = body.packers.find((p: { fits: boolean }) => !p.fits);
    // The world's company is imperial: 200 mm = 7.9 in, 280 mm = 11.0 in (NIST SP 811, exact).
    expect(other.reasons[0]).toBe("Pipe 7.9 in is smaller than the packer's minimum of 11.0 in.");
    expect(body.resin).toBeNull();
    expect(body.design).toBeNull();
    expect(body.notes.length).toBe(2);
    expect(body.caution).toMatch(/qualified engineer/);
  });

  it('estimates resin and runs the ASTM F1216 X1 partially deteriorated check against the head typed in', async () => {
    await signInAs(w.office);
    const { body } = await plan(w.repair.id, '?groundwaterHeadMm=3048&thicknessMm=6&ovalityPct=2');
    // Laminate ring π·(D − t)·t·L = π × 194 × 6 × 910 mm³ = 3.3277 L; the world's resin system keeps the
    // common-practice defaults (resin to fabric 1 by volume = half resin, 10 % extra).
    const laminateL = (Math.PI * 194 * 6 * 910) / 1e6;
    expect(body.resin.laminateL).toBeCloseTo(laminateL, 9);
    expect(body.resin.resinL).toBeCloseTo(laminateL * 0.5 * 1.1, 9);
    expect(body.resin.resinL).toBeCloseTo(1.8302, 3);
    expect(body.resin.resinSystem.id).toBe(w.resinSystem.id);
    // 10 ft of water (4.33 psi) on a 7.874 in patch, q = 2 %: SDR ≈ 58.04, t ≈ 0.1357 in ≈ 3.446 mm.
    const required = f1216PartialMm(200, 3048, 2);
    expect(required).toBeCloseTo(3.446, 3);
    expect(body.design.requiredThicknessMm).toBeCloseTo(required, 9);
    expect(body.design.governing).toBe('buckling');
    expect(body.design.groundwaterPsi).toBeCloseTo(4.33, 9);
    expect(body.design.ovalityC).toBeCloseTo(Math.pow(0.98 / 1.0404, 3), 12);
    expect(body.design.thick).toBe(true);
    expect(body.warnings).toEqual([]);
    expect(body.assumptions).toEqual({
      ovalityPct: 2,
      longTermModulusPsi: E_L,
      shortTermModulusPsi: 250_000,
      safetyFactor: N,
      enhancementK: K,
      poisson: NU,
    });
    // X1.4 at 250 000 psi on 7.874 in: 0.1296 in = 3.293 mm, below the 3.446 mm of buckling.
    expect(body.design.checks.minimumStiffness * MM_PER_IN).toBeCloseTo(3.293, 3);
    expect(body.design.summary).toBe('X1.1 buckling at 10.0 ft of water, X1.4 stiffness');
  });

  it("takes the company's liner modulus for X1.4 when it has one, and a modulus asked about over both", async () => {
    await signInAs(w.office);
    // 400 000 psi = 2 757.9 MPa (1 psi = 6.894 757 kPa, NIST SP 811 App. B).
    await Company.update({ linerShortTermModulusMpa: 2757.9 }, { where: { id: w.company.id } });
    try {
      const { body } = await plan(w.repair.id, '?groundwaterHeadMm=3048&thicknessMm=6&ovalityPct=2');
      expect(body.assumptions.shortTermModulusPsi).toBeCloseTo(400_000, -1);
      // X1.4 (E·t³/12 / D³ ≥ 0.093 psi): t = D·(12 × 0.093 / E)^(1/3) = 7.874 in × (1.116 / 400 000)^(1/3) = 2.816 mm.
      expect(body.design.checks.minimumStiffness * MM_PER_IN).toBeCloseTo(2.8156, 3);
      const asked = await plan(
        w.repair.id,
        '?groundwaterHeadMm=3048&thicknessMm=6&ovalityPct=2&shortTermModulusMpa=1723.7',
      );
      expect(asked.body.assumptions.shortTermModulusPsi).toBeCloseTo(250_000, -1);
    } finally {
      await Company.update({ linerShortTermModulusMpa: null }, { where: { id: w.company.id } });
    }
  });

  it('takes the resin-to-fabric ratio and excess of the resin system asked for; another company’s is refused', async () => {
    await signInAs(w.office);
    const slow = await ResinSystem.create({
      companyId: w.company.id,
      name: `Thick mix ${w.company.id.slice(0, 4)}`,
      refTempC: 20,
      potLifeMin: 40,
      holdMin: 120,
      fullCureMin: 300,
      minTempC: 5,
      maxTempC: 35,
      doublingC: 10,
      resinToFabricRatio: 1.5,
      resinExcessPct: 15,
    });
    const { status, body } = await plan(w.repair.id, `?thicknessMm=6&resinSystemId=${slow.id}`);
    expect(status).toBe(200);
    // By hand: 3.3277 L of laminate × 1.5/(1 + 1.5) × 1.15.
    expect(body.resin.resinL).toBeCloseTo(((Math.PI * 194 * 6 * 910) / 1e6) * 0.6 * 1.15, 9);
    expect(body.resin.basis).toContain('resin to fabric 1.5 by volume, 15 % extra');
    expect(body.resinSystems.map((r: { id: string }) => r.id)).toContain(slow.id);
    const foreign = await ResinSystem.create({
      companyId: b.company.id,
      name: 'Foreign mix',
      refTempC: 20,
      potLifeMin: 40,
      holdMin: 120,
      fullCureMin: 300,
      minTempC: 5,
      maxTempC: 35,
      doublingC: 10,
    });
    const refused = await plan(w.repair.id, `?thicknessMm=6&resinSystemId=${foreign.id}`);
    expect(refused.status).toBe(422);
  });

  it('with no groundwater (head 0) the floors still give a thickness: X1.4 stiffness, DR ≤ 100', async () => {
    await signInAs(w.office);
    const { body } = await plan(w.repair.id, '?groundwaterHeadMm=0&thicknessMm=6');
    expect(body.design.governing).toBe('minimumStiffness');
    expect(body.design.checks.dimensionRatio * MM_PER_IN).toBeCloseTo(2, 9); // 200 mm / 100
    expect(body.design.summary).toBe('X1.4 stiffness, DR ≤ 100');
  });

  it('warns when the patch is too thin, and takes another modulus and ovality', async () => {
    await signInAs(w.office);
    const thin = await plan(w.repair.id, '?groundwaterHeadMm=6096&thicknessMm=3&ovalityPct=5');
    const required = f1216PartialMm(200, 6096, 5);
    expect(required).toBeGreaterThan(3);
    expect(thin.body.design.requiredThicknessMm).toBeCloseTo(required, 9);
    expect(thin.body.design.thick).toBe(false);
    expect(thin.body.warnings.join(' ')).toMatch(/too thin/);
    // 3 447.4 MPa = 500 000 psi (1 psi = 6.894 757 kPa, NIST SP 811). Buckling then asks for 3.0 mm, so the
    // X1.4 stiffness floor at the F1216 minimum modulus (3.293 mm) governs.
    const stiff = await plan(
      w.repair.id,
      '?groundwaterHeadMm=6096&thicknessMm=3.5&ovalityPct=5&longTermModulusMpa=3447.3785',
    );
    expect(stiff.body.design.checks.buckling * MM_PER_IN).toBeCloseTo(f1216PartialMm(200, 6096, 5, 500_000), 4);
    expect(stiff.body.design.governing).toBe('minimumStiffness');
    expect(stiff.body.design.requiredThicknessMm).toBeCloseTo(3.293, 3);
    expect(stiff.body.design.thick).toBe(true);
  });

  it('warns when no packer fits, and when a thickness would close the pipe', async () => {
    await signInAs(w.office);
    const { body } = await plan(long.id, '?thicknessMm=100');
    expect(body.proposedPatchLengthMm).toBe(1000 + 610);
    expect(body.packers.every((p: { fits: boolean }) => !p.fits)).toBe(true);
    expect(body.warnings.join(' ')).toMatch(/No packer/);
    // Imperial company: 100 mm = 3.9 in, 200 mm = 7.9 in.
    expect(body.warnings.join(' ')).toMatch(/A 3\.9 in laminate would close a 7\.9 in pipe/);
    expect(body.resin).toBeNull();
  });

  it('falls back to the saved plan and shows the field users of the crew the same figures', async () => {
    await signInAs(w.office);
    const saved = await call(
      patchRoute,
      '/x',
      { id: w.repair.id },
      jsonBody('PATCH', {
        plannedPatchLengthMm: 1000,
        plannedPackerId: w.packer.id,
        plannedThicknessMm: 6,
        plannedGroundwaterHeadMm: 3048,
        plannedOvalityPct: 2,
      }),
    );
    expect(saved.status).toBe(200);
    await signInAs(w.foreman);
    const { status, body } = await plan(w.repair.id);
    expect(status).toBe(200);
    expect(body.inputs).toMatchObject({ patchLengthMm: 1000, thicknessMm: 6, groundwaterHeadMm: 3048, ovalityPct: 2 });
    expect(body.proposedPatchLengthMm).toBe(910);
    expect(body.patchLengthMm).toBe(1000);
    expect(body.packers.find((p: { id: string }) => p.id === w.packer.id).endMarginEachMm).toBe(100);
    expect(body.design.requiredThicknessMm).toBeCloseTo(f1216PartialMm(200, 3048, 2), 9);
    expect(body.saved.plannedPackerId).toBe(w.packer.id);
    // A what-if value in the query wins over the saved one.
    expect((await plan(w.repair.id, '?thicknessMm=2')).body.design.thick).toBe(false);
    expect(body.unitSystem).toBe('imperial');
  });
});
