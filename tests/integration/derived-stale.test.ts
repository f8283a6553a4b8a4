import { beforeAll, describe, expect, it } from 'vitest';
import { resinClockSpec } from '@/lib/cure';
import { updateCompany } from '@/lib/data/company';
import { ensureDerived, settingsOf } from '@/lib/data/install-derive';
import { updatePacker } from '@/lib/data/packers';
import { updateResinKit } from '@/lib/data/resin-kits';
import { updateResinSystem } from '@/lib/data/resin-systems';
import { installClock } from '@/lib/install/plan-and-flags';
import { deriveInstallState } from '@/lib/install/state';
import { Company, Install, InstallEvent, Packer, Repair, ResinKit, ResinSystem, type User } from '@/models';
import { body, cleanInstall, postAll, postEvent, startInstall } from './helpers/installs';
import { signInAs } from './helpers/session';
import { makeInstallWorld, type InstallWorld } from './helpers/world';

// The install row keeps flags and deadlines derived with the materials and margins of the moment. When the office
// corrects a data sheet, a kit's expiry, a packer's rating or the company's margins, the open installs that read it
// must not keep the old answer in the lists while their screen computes the new one: they are derived again.

let w: InstallWorld;
let open: string;
let closed: string;
const asSessionUser = (u: User) => ({
  id: u.id,
  companyId: u.companyId,
  role: u.role,
  name: u.name,
  email: u.email,
  crewIds: [],
});
const admin = () => asSessionUser(w.admin);

beforeAll(async () => {
  w = await makeInstallWorld('Stale');
  await signInAs(w.foreman);
  // Open: inflated at 100 kPa, a reading of 98 kPa, holding (the packer is rated 70–150 kPa).
  open = await startInstall(w);
  await postAll(open, cleanInstall(w).slice(0, 11));
  // Closed: a whole clean install, approved.
  const repair = await Repair.create({
    companyId: w.company.id,
    jobId: w.job.id,
    segmentId: w.segment.id,
    distanceMm: 12000,
    defectType: 'ring_crack',
    conditionGrade: 3,
    defectLengthMm: 300,
  });
  closed = await startInstall({ ...w, repair });
  await postAll(closed, cleanInstall(w));
  await Install.update({ status: 'approved' }, { where: { id: closed } });
});

const row = async (id: string) => (await Install.findByPk(id))!;

/** The stored row once the next reader has derived what was marked stale. */
async function derivedAgain(id: string) {
  const company = (await Company.findByPk(w.company.id))!;
  await ensureDerived(admin(), settingsOf(company));
  return row(id);
}

/** What the install's screen computes now from its log and today's materials and margins. */
async function computedNow(id: string) {
  const install = await row(id);
  const events = await InstallEvent.findAll({ where: { installId: id } });
  const [resin, packer, kit, company] = await Promise.all([
    ResinSystem.findByPk(install.resinSystemId!),
    Packer.findByPk(install.packerId!),
    ResinKit.findByPk(install.resinKitId!),
    Company.findByPk(install.companyId),
  ]);
  return installClock({
    state: deriveInstallState(events.map((e) => e.get({ plain: true }))),
    resin: resinClockSpec(resin!),
    packer: { minPressureKpa: packer!.minPressureKpa, maxPressureKpa: packer!.maxPressureKpa },
    resinKitExpiresOn: kit!.expiresOn,
    safetyMargin: company!.workingWindowSafetyMargin,
    holdReserve: company!.holdReserve,
    unitSystem: company!.unitSystem,
    now: null,
  });
}

describe('an edit of what the clock reads derives the open installs again', () => {
  it('a packer renamed leaves them be; its rating lowered flags the readings now above it', async () => {
    await updatePacker(admin(), w.packer.id, { name: 'Packer 200 (renamed)' });
    expect((await row(open)).derivedAt).not.toBeNull();
    expect((await row(open)).flagKinds).not.toContain('pressure-out-of-range');

    await updatePacker(admin(), w.packer.id, { maxPressureKpa: 95 });
    expect((await row(open)).derivedAt).toBeNull();
    // An approved install keeps the state it was closed with.
    expect((await row(closed)).derivedAt).not.toBeNull();
    expect((await row(closed)).flagKinds).not.toContain('pressure-out-of-range');

    const again = await derivedAgain(open);
    expect(again.derivedAt).not.toBeNull();
    expect(again.flagKinds).toContain('pressure-out-of-range');
    expect([...again.flagKinds].sort()).toEqual((await computedNow(open)).flags.map((f) => f.kind).sort());
    expect((await row(closed)).flagKinds).not.toContain('pressure-out-of-range');
  });

  it("a data sheet corrected moves the inflate-by and deflate-after to the new sheet's", async () => {
    await updateResinSystem(admin(), w.resinSystem.id, { name: 'Epoxy (renamed)' });
    expect((await row(open)).derivedAt).not.toBeNull();
    const before = await row(open);
    await updateResinSystem(admin(), w.resinSystem.id, { potLifeMin: 40, holdMin: 100 });
    expect((await row(open)).derivedAt).toBeNull();
    const again = await derivedAgain(open);
    const { plan } = await computedNow(open);
    expect(again.inflateBy?.getTime()).toBe(plan!.inflateBy.getTime());
    expect(again.inflateBy!.getTime()).toBeGreaterThan(before.inflateBy!.getTime());
    expect(again.deflateAfter?.getTime()).toBe(plan!.deflateAfter!.getTime());
  });

  it("the company's hold reserve changed moves the deflate-after of every open install", async () => {
    const before = await row(open);
    await updateCompany(admin(), { holdReserve: 0.5 });
    expect((await row(open)).derivedAt).toBeNull();
    const again = await derivedAgain(open);
    expect(again.deflateAfter?.getTime()).toBe((await computedNow(open)).plan!.deflateAfter!.getTime());
    expect(again.deflateAfter!.getTime()).toBeGreaterThan(before.deflateAfter!.getTime());
  });

  it("a kit's expiry changed marks its installs; the next tap derives from the log with the new values", async () => {
    await updateResinKit(admin(), w.resinKit.id, { expiresOn: '2098-12-31' });
    expect((await row(open)).derivedAt).toBeNull();
    await signInAs(w.foreman);
    const { status } = await postEvent(open, body('bladder_deflated', 140));
    expect(status).toBe(201);
    const tapped = await row(open);
    expect(tapped.derivedAt).not.toBeNull();
    expect(tapped.step).toBe('inspect');
    expect([...tapped.flagKinds].sort()).toEqual((await computedNow(open)).flags.map((f) => f.kind).sort());
  });
});
