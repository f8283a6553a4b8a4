import { randomUUID } from 'node:crypto';
import { AccessPoint, Company, Crew, CrewMember, Customer, Job, Repair, Segment, Site, User } from '@/models';
import type { Role } from '@/lib/domain';

// A bcrypt hash made once: the tests sign in with cookies, not passwords.
const HASH = '$2b$12$KmJz3YskaqY8OKmQx6oTFeAcu9JZGSd7OaZFf2WtWTl6JKW3RK0sG';

/** A fresh company with one user of each role, a crew, a customer, a site, a segment and one job with a repair. Each test gets its own. */
export async function makeWorld(name = 'Test') {
  const tag = randomUUID().slice(0, 8);
  const company = await Company.create({ name: `${name} ${tag}`, timeZone: 'America/Denver' });
  const mkUser = (role: Role) =>
    User.create({ companyId: company.id, email: `${role}-${tag}@${name.toLowerCase()}.test`, name: `${role} ${tag}`, passwordHash: HASH, role });
  const [admin, office, foreman, technician] = await Promise.all((['admin', 'office', 'foreman', 'technician'] as const).map(mkUser));
  const crew = await Crew.create({ companyId: company.id, name: `Crew ${tag}` });
  await CrewMember.bulkCreate([foreman, technician].map((u) => ({ companyId: company.id, crewId: crew.id, userId: u.id })));
  const customer = await Customer.create({ companyId: company.id, name: `Customer ${tag}` });
  const site = await Site.create({ companyId: company.id, customerId: customer.id, name: 'Site', addressLine: '1 Test Street', city: 'Testville' });
  const [a, b] = await AccessPoint.bulkCreate([
    { companyId: company.id, siteId: site.id, label: 'MH-1', kind: 'manhole' },
    { companyId: company.id, siteId: site.id, label: 'MH-2', kind: 'manhole' },
  ]);
  const segment = await Segment.create({
    companyId: company.id, siteId: site.id, fromAccessPointId: a.id, toAccessPointId: b.id, label: 'MH-1 → MH-2',
    material: 'vitrified_clay', nominalSizeMm: 203, insideDiameterMm: 200, lengthMm: 50000,
  });
  const job = await Job.create({
    companyId: company.id, number: `2026-${tag}`.slice(0, 20), customerId: customer.id, siteId: site.id, crewId: crew.id, status: 'scheduled', scheduledDate: '2026-12-01',
  });
  const repair = await Repair.create({
    companyId: company.id, jobId: job.id, segmentId: segment.id, distanceMm: 12000, defectType: 'fracture', conditionGrade: 4, defectLengthMm: 300,
  });
  return { company, admin, office, foreman, technician, crew, customer, site, segment, accessPoints: [a, b], job, repair };
}

export type World = Awaited<ReturnType<typeof makeWorld>>;
