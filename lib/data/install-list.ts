import 'server-only';
// The office's and crews' list of installs (GET /api/installs, the review queue): one page of installs with
// their flags, sorted in SQL over the derived columns when sorted by severity.
import { Op, QueryTypes, type InferAttributes, type Model, type WhereOptions } from 'sequelize';
import { AccessPoint, Crew, Customer, Install, Job, Repair, Segment, Site, sequelize } from '@/models';
import { CLOCK_MATERIALS_INCLUDE, type ClockMaterials } from './install-materials';
import type { SessionUser } from '@/lib/auth/session';
import { resinClockSpec } from '@/lib/cure';
import { isDeskRole } from '@/lib/auth/roles';
import { installClock } from '@/lib/install/plan-and-flags';
import { deriveInstallState, type InstallEventInput } from '@/lib/install/state';
import { localisedFlags, worstSeverity } from '@/lib/review/flags';
import type { InstallListQuery } from '@/lib/validation/reviews';
import { getCompany } from './company';
import { cachedForCompany } from './company-cache';
import { ensureDerived, settingsOf } from './install-derive';
import { severityPage } from './install-severity';
import { allOf, pageOf, searchWhere, windowOf } from './list';

type Plain<M extends Model> = InferAttributes<M>;
type Company = Awaited<ReturnType<typeof getCompany>>;

export type InstallListResponse = Awaited<ReturnType<typeof listInstalls>>;

/** How long a page of the list by severity may be served again while the company's installs have not changed. */
export const SEVERITY_CACHE_MS = 5_000;

/**
 * A page of the company's installs with their quality flags (field users: only their crews').
 * `sort=severity` picks the page's ids and the count in lean SQL over the rows' derived columns
 * (`lib/data/install-severity.ts`), then loads only those rows; the flags of the page are worked out from their logs.
 */
export async function listInstalls(user: SessionUser, query: InstallListQuery, exportAll = false) {
  const company = await getCompany(user);
  const where = allOf(
    { companyId: user.companyId },
    query.status ? { status: query.status } : undefined,
    searchWhere(query.q, ['$job.number$', '$job.customer.name$']),
    crewScope(user),
  );
  const now = new Date();
  if (query.sort === 'severity') {
    await ensureDerived(user, settingsOf(company));
    const bySeverity = async () => {
      const { ids, count } = await severityPage(user, query, exportAll);
      const rows = ids.length
        ? await Install.findAll({ where: { id: ids, companyId: user.companyId }, include: LIST_INCLUDE })
        : [];
      const at = new Map(ids.map((id, index) => [id, index]));
      rows.sort((a, b) => at.get(a.id)! - at.get(b.id)!);
      return pageOf(await itemsOf(user, rows, company, now), count, query);
    };
    // The review queue is opened again and again over unchanged data: a page is served again while the company's
    // installs are the same, for SEVERITY_CACHE_MS at most (lib/data/company-cache.ts). Exports always read afresh.
    if (exportAll) return bySeverity();
    const scope = isDeskRole(user.role) ? 'desk' : [...user.crewIds].sort().join(',');
    return cachedForCompany(
      user.companyId,
      `severity|${scope}|${JSON.stringify(query)}`,
      SEVERITY_CACHE_MS,
      bySeverity,
    );
  }
  const { rows, count } = await Install.findAndCountAll({
    where,
    include: LIST_INCLUDE,
    order: [
      [query.sort, `${query.dir.toUpperCase()} NULLS LAST`],
      ['id', 'ASC'],
    ],
    ...windowOf(query, exportAll),
  });
  return pageOf(await itemsOf(user, rows, company, now), count, query);
}

export type InstallListItem = Awaited<ReturnType<typeof itemsOf>>[number];

/** Field users see the installs of their crews (by the install's crew or its job's). */
function crewScope(user: SessionUser): WhereOptions | undefined {
  if (isDeskRole(user.role)) return undefined;
  if (user.crewIds.length === 0) return { id: null };
  return { [Op.or]: [{ crewId: { [Op.in]: user.crewIds } }, { '$job.crew_id$': { [Op.in]: user.crewIds } }] };
}

const LIST_INCLUDE = [
  {
    model: Job,
    as: 'job',
    required: true,
    attributes: ['id', 'number', 'title', 'status', 'crewId'],
    include: [
      { model: Customer, as: 'customer', attributes: ['id', 'name'] },
      { model: Site, as: 'site', attributes: ['id', 'name', 'addressLine', 'city'] },
      { model: Crew, as: 'crew', attributes: ['id', 'name'] },
    ],
  },
  { model: Crew, as: 'crew', attributes: ['id', 'name'] },
  {
    model: Repair,
    as: 'repair',
    attributes: ['id', 'position', 'distanceMm', 'defectType', 'clockPosition'],
    include: [
      {
        model: Segment,
        as: 'segment',
        attributes: ['id', 'label'],
        include: [{ model: AccessPoint, as: 'fromAccessPoint', attributes: ['label'] }],
      },
      { model: AccessPoint, as: 'fromAccessPoint', attributes: ['label'] },
    ],
  },
  ...CLOCK_MATERIALS_INCLUDE,
];

type ListRow = Plain<Install> &
  ClockMaterials & {
    job: Pick<Plain<Job>, 'id' | 'number' | 'title' | 'status' | 'crewId'> & {
      customer: Pick<Plain<Customer>, 'id' | 'name'>;
      site: Pick<Plain<Site>, 'id' | 'name' | 'addressLine' | 'city'>;
      crew: Pick<Plain<Crew>, 'id' | 'name'> | null;
    };
    crew: Pick<Plain<Crew>, 'id' | 'name'> | null;
    repair: Pick<Plain<Repair>, 'id' | 'position' | 'distanceMm' | 'defectType' | 'clockPosition'> & {
      segment: { id: string; label: string; fromAccessPoint: { label: string } | null } | null;
      fromAccessPoint: { label: string } | null;
    };
  };

/** List rows with their flags, worked out from each install's event log by the field screen's own rule. */
async function itemsOf(user: SessionUser, rows: Install[], company: Company, now: Date) {
  const ids = rows.map((row) => row.id);
  // Plain rows (no model instances): a page of installs can carry thousands of events.
  const events = ids.length
    ? await sequelize.query<InstallEventInput & { installId: string }>(
        `SELECT id, install_id AS "installId", client_event_id AS "clientEventId", type, device_time AS "deviceTime",
                received_at AS "receivedAt", payload, corrects_event_id AS "correctsEventId"
         FROM install_events WHERE company_id = :companyId AND install_id IN (:ids)`,
        { replacements: { companyId: user.companyId, ids }, type: QueryTypes.SELECT },
      )
    : [];
  const byInstall = new Map<string, InstallEventInput[]>();
  for (const event of events) {
    const list = byInstall.get(event.installId) ?? [];
    list.push(event);
    byInstall.set(event.installId, list);
  }
  return rows.map((model) => {
    const row = model.get({ plain: true }) as ListRow;
    const { flags } = installClock({
      state: deriveInstallState(byInstall.get(row.id) ?? []),
      resin: row.resinSystem ? resinClockSpec(row.resinSystem) : null,
      packer: row.packer
        ? { minPressureKpa: row.packer.minPressureKpa, maxPressureKpa: row.packer.maxPressureKpa }
        : null,
      resinKitExpiresOn: row.resinKit?.expiresOn ?? null,
      safetyMargin: company.workingWindowSafetyMargin,
      holdReserve: company.holdReserve,
      timeZone: company.timeZone,
      unitSystem: company.unitSystem,
      now,
    });
    const localised = localisedFlags(flags, company.timeZone);
    return {
      id: row.id,
      status: row.status,
      createdAt: row.createdAt,
      startedAt: row.startedAt,
      finishedAt: row.finishedAt,
      job: { id: row.job.id, number: row.job.number, title: row.job.title, status: row.job.status },
      customer: row.job.customer,
      site: row.job.site,
      crew: row.crew ?? row.job.crew ?? null,
      repair: {
        id: row.repair.id,
        position: row.repair.position,
        distanceMm: row.repair.distanceMm,
        defectType: row.repair.defectType,
        clockPosition: row.repair.clockPosition,
        segmentLabel: row.repair.segment?.label ?? null,
        accessPointLabel: row.repair.fromAccessPoint?.label ?? row.repair.segment?.fromAccessPoint?.label ?? null,
      },
      flags: localised,
      worstSeverity: worstSeverity(localised),
    };
  });
}
