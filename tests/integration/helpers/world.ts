import { randomUUID } from 'node:crypto';
import {
  AccessPoint,
  ChecklistTemplate,
  Company,
  Crew,
  CrewMember,
  Customer,
  Job,
  Packer,
  Repair,
  ResinKit,
  ResinSystem,
  Segment,
  Site,
  User,
} from '@/models';
import type { Role } from '@/lib/domain/vocabulary';

// A bcrypt hash made once: the tests sign in with cookies, not passwords.
const HASH = '$2b$12$KmJz3YskaqY8OKmQx6oTFeAcu9JZGSd7OaZFf2WtWTl6JKW3RK0sG';

/**
 * A fresh company with one user of each role, a crew, a customer, a site, a segment and one job with a repair,
 * and a second crew with a technician of its own. Each test gets its own.
 */
export async function makeWorld(name = 'Test') {
  const tag = randomUUID().slice(0, 8);
  const company = await Company.create({ name: `${name} ${tag}`, timeZone: 'America/Denver' });
  const mkUser = (role: Role) =>
    User.create({
      companyId: company.id,
      email: `${role}-${tag}@${name.toLowerCase()}.test`,
      name: `${role} ${tag}`,
      passwordHash: HASH,
      role,
    });
  const [admin, office, foreman, technician] = await Promise.all(
    (['admin', 'office', 'foreman', 'technician'] as const).map(mkUser),
  );
  const crew = await Crew.create({ companyId: company.id, name: `Crew ${tag}` });
  await CrewMember.bulkCreate(
    [foreman, technician].map((u) => ({ companyId: company.id, crewId: crew.id, userId: u.id })),
  );
  const customer = await Customer.create({ companyId: company.id, name: `Customer ${tag}` });
  const site = await Site.create({
    companyId: company.id,
    customerId: customer.id,
    name: 'Site',
    addressLine: '1 Test Street',
    city: 'Testville',
  });
  const [a, b] = await AccessPoint.bulkCreate([
    { companyId: company.id, siteId: site.id, label: 'MH-1', kind: 'manhole' },
    { companyId: company.id, siteId: site.id, label: 'MH-2', kind: 'manhole' },
  ]);
  const segment = await Segment.create({
    companyId: company.id,
    siteId: site.id,
    fromAccessPointId: a.id,
    toAccessPointId: b.id,
    label: 'MH-1 → MH-2',
    material: 'vitrified_clay',
    nominalSizeMm: 203,
    insideDiameterMm: 200,
    lengthMm: 50000,
  });
  const job = await Job.create({
    companyId: company.id,
    number: `2026-${tag}`.slice(0, 20),
    customerId: customer.id,
    siteId: site.id,
    crewId: crew.id,
    status: 'scheduled',
    scheduledDate: '2026-12-01',
  });
  const repair = await Repair.create({
    companyId: company.id,
    jobId: job.id,
    segmentId: segment.id,
    distanceMm: 12000,
    defectType: 'open_fracture',
    conditionGrade: 4,
    defectLengthMm: 300,
  });
  const otherCrew = await Crew.create({ companyId: company.id, name: `Other crew ${tag}` });
  const otherTechnician = await mkUserNamed(company.id, `technician2-${tag}@${name.toLowerCase()}.test`, 'technician');
  await CrewMember.create({ companyId: company.id, crewId: otherCrew.id, userId: otherTechnician.id });
  return {
    company,
    admin,
    office,
    foreman,
    technician,
    crew,
    customer,
    site,
    segment,
    accessPoints: [a, b],
    job,
    repair,
    otherCrew,
    otherTechnician,
  };
}

export type World = Awaited<ReturnType<typeof makeWorld>>;

/**
 * makeWorld plus what an install needs: a resin system, a good kit and an expired one, a packer that
 * fits the 200 mm segment and a check-list. Separate, because tests that read "the company's resin
 * system" expect to find only the one they made.
 */
export async function makeInstallWorld(name = 'Test') {
  const world = await makeWorld(name);
  return { ...world, ...(await makeMaterials(world.company.id, randomUUID().slice(0, 8))) };
}

export type InstallWorld = Awaited<ReturnType<typeof makeInstallWorld>>;

const mkUserNamed = (companyId: string, email: string, role: Role) =>
  User.create({ companyId, email, name: email.split('@')[0], passwordHash: HASH, role });

async function makeMaterials(companyId: string, tag: string) {
  // The example epoxy of tests/unit/cure/fixtures.ts (example inputs, not any product's data).
  const resinSystem = await ResinSystem.create({
    companyId,
    name: `Epoxy ${tag}`,
    refTempC: 20,
    potLifeMin: 30,
    holdMin: 90,
    fullCureMin: 240,
    minTempC: 5,
    maxTempC: 40,
    doublingC: 10,
  });
  const [resinKit, expiredKit] = await ResinKit.bulkCreate([
    { companyId, resinSystemId: resinSystem.id, lot: `LOT-${tag}`, expiresOn: '2099-12-31', quantityL: 5 },
    { companyId, resinSystemId: resinSystem.id, lot: `OLD-${tag}`, expiresOn: '2020-01-31', quantityL: 5 },
  ]);
  // Fits 150–250 mm pipe; the 910 mm patch of the repair (300 mm defect + 2 × 305 mm) leaves 145 mm of bladder each end.
  const packer = await Packer.create({
    companyId,
    name: `Packer 200 ${tag}`,
    minDiameterMm: 150,
    maxDiameterMm: 250,
    bladderLengthMm: 1200,
    endMarginMm: 100,
    minPressureKpa: 70,
    maxPressureKpa: 150,
  });
  const checklist = await ChecklistTemplate.create({
    companyId,
    name: 'Before the pull',
    items: [
      { id: 'flow', label: 'Flow stopped upstream', required: true },
      { id: 'clean', label: 'Pipe cleaned', required: true },
    ],
  });
  return { resinSystem, resinKit, expiredKit, packer, checklist };
}
