import 'server-only';
import { Op } from 'sequelize';
import {
  AccessPoint,
  Attachment,
  Company,
  Customer,
  Install,
  InstallEvent,
  Job,
  Repair,
  Segment,
  Site,
} from '@/models';
import { CLOCK_MATERIALS_INCLUDE, type ClockMaterials } from './install-materials';
import type { SessionUser } from '@/lib/auth/session';
import { resinClockSpec } from '@/lib/cure';
import { labelIn } from '@/i18n/labels';
import { DEFAULT_LOCALE, isLocale, type Locale } from '@/i18n/locales';
import { translatorFor } from '@/i18n/translator';
import { formatInZone } from '@/lib/time/dates';
import { formatDateTimeIn } from '@/lib/time/dates-locale';
import { installClock } from '@/lib/install/plan-and-flags';
import { deriveInstallState, type InstallState } from '@/lib/install/state';
import { SAFETY_REMINDERS } from '@/lib/install/safety';
import { formatDuration, formatLength, formatPressure, formatTemperature, type UnitSystem } from '@/lib/units';
import { loadReportImages, type ReportImage } from '@/lib/report/images';
import type { TimelineBand, TimelineMark } from '@/lib/report/timeline';

// Everything the customer's repair report shows, built once for the PDF, the e-mail and the /r page.
// What it leaves out on purpose: job and repair notes (gate codes, office remarks), crew and user
// names, review comments, internal flags. Quantities are formatted in the company's units; words, numbers and
// dates in the customer's language (customers.language).

/** Jobs whose report may be shown: every install approved (and the states after it). */
export const REPORTABLE_JOB_STATUSES = ['approved', 'reported', 'closed'] as const;

/** Cautions of the report: the install screen's reminders that concern the work the customer had done. */
const REPORT_CAUTION_IDS = ['atmosphere', 'pressure', 'resin', 'exotherm', 'plugs', 'backup', 'hygiene'] as const;

/** The report of a job of the caller's company; null when there is no such job. */
export async function getReportData(user: SessionUser, jobId: string, options: { images?: boolean } = {}) {
  return buildReportData(user.companyId, jobId, options);
}

/** The report behind a verified customer link: only that job, only once every install is approved. */
export async function getReportDataForLink(
  claims: { jobId: string; companyId: string },
  options: { images?: boolean } = {},
) {
  const data = await buildReportData(claims.companyId, claims.jobId, options);
  if (!data || !(REPORTABLE_JOB_STATUSES as readonly string[]).includes(data.job.status)) return null;
  return data;
}

/** The company's name, for the page that turns away an expired (but genuine) link. */
export async function companyNameOf(companyId: string): Promise<string | null> {
  return (await Company.findByPk(companyId, { attributes: ['name'] }))?.name ?? null;
}

export type ReportData = NonNullable<Awaited<ReturnType<typeof buildReportData>>>;
export type ReportRepair = ReportData['repairs'][number];

export async function buildReportData(companyId: string, jobId: string, { images = true }: { images?: boolean } = {}) {
  const job = await Job.findOne({
    where: { id: jobId, companyId },
    include: [
      { model: Customer, as: 'customer', attributes: ['name', 'contactName', 'email', 'language'] },
      { model: Site, as: 'site', attributes: ['name', 'addressLine', 'city', 'region', 'postalCode'] },
      {
        model: Repair,
        as: 'repairs',
        where: { status: { [Op.ne]: 'cancelled' } },
        required: false,
        include: [
          {
            model: Segment,
            as: 'segment',
            include: [{ model: AccessPoint, as: 'fromAccessPoint', attributes: ['label', 'kind'] }],
          },
          { model: AccessPoint, as: 'fromAccessPoint', attributes: ['label', 'kind'] },
        ],
      },
    ],
    order: [[{ model: Repair, as: 'repairs' }, 'position', 'ASC']],
  });
  if (!job) return null;
  const company = await Company.findByPk(companyId);
  if (!company) return null;
  const plain = job.get({ plain: true }) as unknown as JobRow;
  const system = company.unitSystem;
  const zone = company.timeZone;
  const locale: Locale = isLocale(plain.customer.language) ? plain.customer.language : DEFAULT_LOCALE;
  const t = translatorFor(locale, 'report');
  const tl = translatorFor(locale, 'labels');
  const ts = translatorFor(locale, 'safety');
  const label = (code: string) => labelIn(tl, code);
  const when = (at: Date | null | undefined) => (at ? formatDateTimeIn(at, zone, locale) : null);
  const units = { locale };

  const installs = await Install.findAll({
    where: { companyId, jobId, status: 'approved' },
    include: [...CLOCK_MATERIALS_INCLUDE, { model: InstallEvent, as: 'events' }],
    order: [['finishedAt', 'DESC']],
  });
  // Every attempt of the job, for the redo chain: a patch that was redone names the attempts before it.
  const attempts = await Install.findAll({
    where: { companyId, jobId },
    attributes: ['id', 'status', 'inspectionResult', 'startedAt', 'createdAt', 'replacesInstallId'],
  });
  const attemptById = new Map(attempts.map((a) => [a.id, a]));
  const earlierAttempts = (install: Install | null) => {
    const chain: { started: string | null; outcome: string }[] = [];
    for (let id = install?.replacesInstallId ?? null, guard = 0; id && guard < 50; guard += 1) {
      const before = attemptById.get(id);
      if (!before) break;
      chain.push({
        started: when(before.startedAt ?? before.createdAt),
        outcome:
          before.inspectionResult === 'fail'
            ? t('outcomeFailed')
            : before.status === 'sent_back'
              ? t('outcomeSentBack')
              : t('outcomeOther'),
      });
      id = before.replacesInstallId;
    }
    return chain;
  };
  const attachments = await Attachment.findAll({
    // Only evidence whose bytes were checked on completion (size, sniffed type) reaches a customer.
    where: { companyId, jobId, status: 'ready', kind: { [Op.in]: ['before', 'after', 'inspection'] } },
    order: [['createdAt', 'ASC']],
  });
  const loaded = images ? await loadReportImages(attachments.map((a) => a.get({ plain: true }))) : [];

  const repairs = plain.repairs.map((repair) => {
    // The newest approved install of the repair is the one that stands.
    const install = installs.find((i) => i.repairId === repair.id) ?? null;
    const accessPoint = repair.fromAccessPoint ?? repair.segment.fromAccessPoint;
    const patchLengthMm = install?.patchLengthMm ?? repair.plannedPatchLengthMm ?? null;
    const repairImages = loaded.filter(
      (image) => image.repairId === repair.id || (image.installId && image.installId === install?.id),
    );
    return {
      id: repair.id,
      position: repair.position,
      segment: {
        label: repair.segment.label,
        material: label(repair.segment.material),
        insideDiameter: formatLength(repair.segment.insideDiameterMm, system, 'short', units),
      },
      accessPoint: accessPoint
        ? `${accessPoint.label} (${label(accessPoint.kind).toLowerCase()})`
        : t('upstreamAccessPoint'),
      distance: formatLength(repair.distanceMm, system, 'long', units),
      clockPosition: repair.clockPosition ? t('clock', { position: repair.clockPosition }) : null,
      defect: repair.ownerDefectCode
        ? t('ownerCode', { defect: label(repair.defectType), code: repair.ownerDefectCode })
        : label(repair.defectType),
      defectLength: formatLength(repair.defectLengthMm, system, 'short', units),
      conditionGrade: repair.conditionGrade,
      patchLengthMm,
      patchLength: patchLengthMm === null ? null : formatLength(patchLengthMm, system, 'short', units),
      install: install ? installSummary(install, system, when, locale, zone) : null,
      /** Earlier attempts at this patch that were redone, newest first ("redo chain"). */
      earlierAttempts: earlierAttempts(install),
      images: repairImages,
    };
  });
  const placed = new Set(repairs.flatMap((r) => r.images));
  const site = plain.site;

  return {
    /** The customer's language: the page, PDF and e-mail of this report speak it. */
    locale,
    company: { name: company.name, unitSystem: system, timeZone: zone },
    job: {
      id: plain.id,
      number: plain.number,
      title: plain.title,
      status: plain.status,
      scheduledDate: plain.scheduledDate,
    },
    customer: { name: plain.customer.name, contactName: plain.customer.contactName, email: plain.customer.email },
    site: {
      name: site.name,
      address: [site.addressLine, site.city, [site.region, site.postalCode].filter(Boolean).join(' ')]
        .filter(Boolean)
        .join(', '),
    },
    repairs,
    /** Images of the job not tied to one repair. */
    jobImages: loaded.filter((image) => !placed.has(image)),
    allApproved: repairs.length > 0 && repairs.every((r) => r.install !== null),
    cautions: SAFETY_REMINDERS.filter((r) => (REPORT_CAUTION_IDS as readonly string[]).includes(r.id)).map(
      ({ id }) => ({
        title: ts(`${id}.title`),
        text: ts(`${id}.text`),
      }),
    ),
    deferral: `${t('deferral')} ${ts('deferral')}`,
    preparedAt: formatDateTimeIn(new Date(), zone, locale),
  };
}

/** What was installed and when, from the install row and its evidence log. */
function installSummary(
  install: Install,
  system: UnitSystem,
  when: (at: Date | null) => string | null,
  locale: Locale,
  zone: string,
) {
  const units = { locale };
  const row = install as Install & ClockMaterials & { events: InstallEvent[] };
  const state = deriveInstallState(row.events.map((e) => e.get({ plain: true })));
  const { plan } = installClock({
    state,
    resin: row.resinSystem ? resinClockSpec(row.resinSystem) : null,
    packer: row.packer
      ? { minPressureKpa: row.packer.minPressureKpa, maxPressureKpa: row.packer.maxPressureKpa }
      : null,
    resinKitExpiresOn: row.resinKit?.expiresOn ?? null,
    safetyMargin: 0,
    unitSystem: system,
    now: row.finishedAt ?? new Date(),
  });
  const mixTempC = state.conditions?.mixTempC ?? row.mixTempC;
  const makerHold = plan?.holdSource === 'maker' && plan.makerHoldMin ? formatDuration(plan.makerHoldMin * 60) : null;
  const pipeTempC = state.conditions?.pipeTempC ?? row.pipeTempC;
  const timeline = timelineOf(state, plan && !plan.preview ? plan : null, locale);
  return {
    resinSystem: row.resinSystem?.name ?? null,
    kitLot: row.resinKit?.lot ?? null,
    mixTemperature: mixTempC == null ? null : formatTemperature(mixTempC, system, units),
    pipeTemperature: pipeTempC == null ? null : formatTemperature(pipeTempC, system, units),
    inflatePressure: state.inflatePressureKpa == null ? null : formatPressure(state.inflatePressureKpa, system, units),
    inspection:
      state.inspection ??
      (row.inspectionResult ? { result: row.inspectionResult, notes: row.inspectionNotes, at: null } : null),
    steps: timeline.marks.map((mark) => ({
      label: mark.label,
      at: when(mark.at),
      time: formatInZone(mark.at, zone, 'HH:mm zzz'),
    })),
    returnToService: when(plan?.returnToService ?? null),
    /** Set when the pipe was outside the resin's rated range and the hold followed the resin maker's sheet. */
    makerHold,
    signedOffAt: when(state.signedOffAt ?? row.signedOffAt),
    timeline,
  };
}

const STEP_KEYS = [
  'mixedAt',
  'patchLoadedAt',
  'inPositionAt',
  'inflatedAt',
  'deflatedAt',
] as const satisfies readonly (keyof InstallState)[];

function timelineOf(
  state: InstallState,
  plan: { inflateBy: Date; deflateAfter?: Date; returnToService?: Date } | null,
  locale: Locale,
) {
  const t = translatorFor(locale, 'report');
  const marks: TimelineMark[] = [];
  for (const key of STEP_KEYS) {
    const at = state[key];
    if (at instanceof Date) marks.push({ id: key, label: t(`steps.${key}`), at });
  }
  if (state.inspection) marks.push({ id: 'inspection', label: t('steps.inspection'), at: state.inspection.at });
  const bands: TimelineBand[] = [];
  if (state.mixedAt && plan)
    bands.push({ id: 'window', label: t('bands.window'), from: state.mixedAt, to: plan.inflateBy });
  if (state.inflatedAt) {
    bands.push({
      id: 'held',
      label: t('bands.held'),
      from: state.inflatedAt,
      to: state.deflatedAt ?? state.inflatedAt,
    });
    if (plan?.returnToService)
      bands.push({ id: 'cure', label: t('bands.cure'), from: state.inflatedAt, to: plan.returnToService });
  }
  return { marks, bands };
}

type JobRow = {
  id: string;
  number: string;
  title: string | null;
  status: string;
  scheduledDate: string | null;
  customer: { name: string; contactName: string | null; email: string | null; language?: string };
  site: { name: string; addressLine: string; city: string; region: string | null; postalCode: string | null };
  repairs: {
    id: string;
    position: number;
    distanceMm: number;
    defectType: string;
    conditionGrade: number;
    defectLengthMm: number;
    clockPosition: string | null;
    plannedPatchLengthMm: number | null;
    ownerDefectCode?: string | null;
    fromAccessPoint: { label: string; kind: string } | null;
    segment: {
      label: string;
      material: string;
      insideDiameterMm: number;
      fromAccessPoint: { label: string; kind: string } | null;
    };
  }[];
};

export type { ReportImage };
