import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { makeInstallWorld, type InstallWorld } from './helpers/world';
import { signInAs, signOut } from './helpers/session';
import { at, cleanInstall, getInstall, postAll, startInstall } from './helpers/installs';

const kinds = (flags: { kind: string }[]) => flags.map((f) => f.kind);

describe('GET /api/installs/:id', () => {
  let w: InstallWorld;
  beforeAll(async () => {
    w = await makeInstallWorld('Kappa');
  });
  beforeEach(() => signOut());

  it('gives a fresh install with its repair, job, options and company, and no plan yet', async () => {
    await signInAs(w.technician);
    const id = await startInstall(w);
    const { status, body } = await getInstall(id);
    expect(status).toBe(200);
    expect(body.install).toMatchObject({ id, status: 'not_started' });
    expect(body.events).toEqual([]);
    expect(body.state.step).toBe('safety');
    expect(body.plan).toBeNull();
    expect(body.flags).toEqual([]);
    expect(body.repair).toMatchObject({
      id: w.repair.id,
      segment: { id: w.segment.id, insideDiameterMm: 200 },
      accessPoint: { id: w.accessPoints[0].id },
    });
    expect(body.job).toEqual({
      id: w.job.id,
      number: w.job.number,
      title: null,
      site: { addressLine: '1 Test Street', city: 'Testville' },
    });
    expect(body.resinSystem).toBeNull();
    expect(body.options.checklist).toEqual({ id: w.checklist.id, name: 'Before the pull', items: w.checklist.items });
    const kits = Object.fromEntries(body.options.resinKits.map((k: { id: string; expired: boolean }) => [k.id, k]));
    expect(kits[w.resinKit.id]).toMatchObject({ expired: false, resinSystem: { id: w.resinSystem.id } });
    expect(kits[w.expiredKit.id]).toMatchObject({ expired: true });
    // 300 mm defect + 2 × 305 mm (the company's default overlap) = 910 mm.
    expect(body.options.patchLengthMm).toBe(910);
    expect(body.options.packers).toEqual([
      expect.objectContaining({ id: w.packer.id, fits: true, endMarginEachMm: 145 }),
    ]);
    expect(body.company).toEqual({
      unitSystem: 'imperial',
      timeZone: 'America/Denver',
      workingWindowSafetyMargin: 0.2,
      holdReserve: 0.1,
      minOverlapPerEndMm: 305,
    });
    expect(Date.parse(body.serverTime)).toBeGreaterThan(Date.now() - 60_000);
  });

  it('previews GO/NO-GO from now once the conditions are in, before the resin is mixed', async () => {
    await signInAs(w.foreman);
    const id = await startInstall(w);
    await postAll(id, cleanInstall(w).slice(0, 5));
    const { body } = await getInstall(id);
    expect(body.state.step).toBe('mix');
    expect(body.plan).toMatchObject({ go: true, preview: true, reasons: [] });
    const inflateBy = Date.parse(body.plan.inflateBy);
    // The example epoxy's 30 min pot life at 20 °C, counted from the server's now.
    expect(inflateBy - Date.parse(body.serverTime)).toBe(30 * 60_000);
    expect(body.flags).toEqual([]);
    expect(body.resinKit.id).toBe(w.resinKit.id);
    expect(body.packer.id).toBe(w.packer.id);
  });

  it('a clean install raises no flags, and the events carry who tapped them', async () => {
    await signInAs(w.foreman);
    const id = await startInstall(w);
    const taps = cleanInstall(w);
    await postAll(id, taps);
    const { status, body } = await getInstall(id);
    expect(status).toBe(200);
    expect(body.state.step).toBe('done');
    // Deflate after the 90 min hold plus the company's default 10 % hold reserve: 99 min after the inflate.
    expect(body.plan).toMatchObject({
      go: true,
      preview: false,
      inflateBy: at(16 + 30),
      holdMin: 90,
      deflateAfter: at(32 + 99),
    });
    expect(body.flags).toEqual([]);
    expect(body.events).toHaveLength(taps.length);
    expect(body.events[0]).toMatchObject({ type: 'safety_acknowledged', userName: w.foreman.name });
  });

  it("flags an inflate after inflate-by ('late-inflate') and a deflate before the hold is up ('early-deflate')", async () => {
    await signInAs(w.foreman);
    const late = await startInstall(w);
    await postAll(
      late,
      cleanInstall(w, {
        bladder_inflated: 16 + 45,
        pressure_reading: 70,
        bladder_deflated: 200,
        inspection_recorded: 210,
        signed_off: 215,
      }),
    );
    expect(kinds((await getInstall(late)).body.flags)).toEqual(['late-inflate']);
    const early = await startInstall(w);
    await postAll(early, cleanInstall(w, { bladder_deflated: 32 + 45, inspection_recorded: 90, signed_off: 95 }));
    expect(kinds((await getInstall(early)).body.flags)).toEqual(['early-deflate']);
  });

  it('sets no-store on the answer', async () => {
    await signInAs(w.office);
    const id = await startInstall(w);
    const { GET } = await import('@/app/api/installs/[id]/route');
    const response = await GET(new Request(`http://localhost/api/installs/${id}`), { params: Promise.resolve({ id }) });
    expect(response.headers.get('cache-control')).toBe('no-store');
  });
});
