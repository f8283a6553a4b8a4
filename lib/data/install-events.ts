import 'server-only';
import { randomUUID } from 'node:crypto';
import { Op, UniqueConstraintError, literal, type Transaction } from 'sequelize';
import type { z } from 'zod';
import { AuditEntry, Install, InstallEvent, Job, Packer, Repair, ResinKit, ResinSystem, sequelize } from '@/models';
import type { InstallAccess, SessionUser } from '@/lib/auth/session';
import { AppError, notFound, refused } from '@/lib/server/errors';
import { mayDecide, mayWorkOn } from '@/lib/install/access';
import {
  deriveRow,
  foldEvent,
  foldsInOrder,
  stateOfFold,
  type DeriveSettings,
  type StoredFold,
} from '@/lib/install/derived';
import { correctsDecision, deviceTimeRefusal, isClosedInstall } from '@/lib/install/record-rules';
import { refusal } from '@/lib/i18n/refusals';
import { isSameEvent } from '@/lib/install/same-event';
import { correctionTarget, orderRefusal, type InstallState } from '@/lib/install/state';
import { eventPayloadSchemas, parseEventBody } from '@/lib/validation/install-events';
import { companySettingsSql, loadMaterials, rederive, rowOf, settingsOf, type CompanySettings } from './install-derive';
import { insertAndNotifyTap, notifyTap } from './live';
import { findInstallFor, type InstallEventRow } from './installs';
import { dayInZone } from '@/lib/time/dates';
import type { InstallStatus } from '@/lib/domain/vocabulary';

type ParsedEvent = Extract<ReturnType<typeof parseEventBody>, { success: true }>['data'];

/** What the route already read in its first query (`requireUserWithInstall`); absent, it is read here. */
export type TapContext = { install: InstallAccess | null };

/**
 * Records one tap of the crew. A replay of the same tap (same clientEventId and body) answers with
 * the stored event and writes nothing; the same id with another body is a 409; so is any new tap on
 * an approved or abandoned install; an event that cannot have happened now, or stamped outside the
 * device-time bounds, is a 422. Taps on one install are serialised by a lock on its row.
 *
 * An ordinary tap reads no more than its install's row and the one event its id may name: the row keeps the
 * step machine's state (lib/install/derived.ts), and the tap folds its one event in. A correction or a tap out
 * of log order re-derives from the whole log (lib/data/install-derive.ts).
 */
export async function recordEvent(
  user: SessionUser,
  installId: string,
  input: unknown,
  context?: TapContext,
): Promise<{ event: InstallEventRow; created: boolean }> {
  const receivedAt = new Date();
  if (context) checkAccess(user, context.install);
  else await findInstallFor(user, installId);
  const body = parseBodyOrThrow(input);
  // A queued tap carries who tapped it: it must never be stored under someone else's name.
  if (body.userId !== undefined && body.userId !== user.id) {
    throw refused(403, refusal('otherUser'));
  }
  if (body.type === 'signed_off' && !mayDecide(user)) throw refused(403, refusal('foremanSignsOff'));
  if (body.type === 'go_decision' && body.payload.overrideReason !== undefined && !mayDecide(user)) {
    throw refused(403, refusal('foremanOverrides'));
  }
  const run = () => sequelize.transaction((t) => recordInTransaction(user, installId, body, receivedAt, t));
  try {
    return await run();
  } catch (error) {
    // The same id sent to two installs at once is not serialised by either lock: the unique index
    // refuses the second insert, and a second pass finds the first one and answers as for a replay.
    if (!(error instanceof UniqueConstraintError)) throw error;
    return run();
  }
}

async function recordInTransaction(
  user: SessionUser,
  installId: string,
  body: ParsedEvent,
  receivedAt: Date,
  t: Transaction,
) {
  // The install's row, locked (taps on one install are serialised), with the company's settings the clock reads.
  const install = await Install.findOne({
    where: { id: installId, companyId: user.companyId },
    attributes: { include: [[literal(companySettingsSql('"Install"')), 'tapCompany']] },
    lock: t.LOCK.UPDATE,
    transaction: t,
  });
  if (!install) throw new AppError(404, 'Install was not found.');
  const company = install.getDataValue('tapCompany' as never) as CompanySettings & { timeZone: string };
  const settings = settingsOf(company);
  const today = dayInZone(new Date(), company.timeZone);

  // Indexed reads only, after the lock (so they see a tap that held it): the tap's own id (a replay?) and, for a
  // correction, the event it names.
  const [existing, named] = await Promise.all([
    InstallEvent.findOne({ where: { companyId: user.companyId, clientEventId: body.clientEventId }, transaction: t }),
    body.type === 'correction' && body.correctsEventId ? namedEvent(user, installId, body.correctsEventId, t) : null,
  ]);
  // A correction may name its event by the id the device gave it; the row keeps the server id.
  const namedOriginal = named && named.type !== 'correction' ? named : null;
  const correctsEventId = namedOriginal?.id ?? body.correctsEventId ?? null;
  if (existing) {
    const same = isSameEvent(existing, { ...body, installId, correctsEventId });
    if (!same) throw refused(409, refusal('eventIdReused'));
    return { event: existing.get({ plain: true }), created: false };
  }
  // Only a replay (above) passes a closed record, so tablets can still drain their outboxes.
  if (isClosedInstall(install.status)) {
    throw refused(409, refusal('closed', { status: install.status }));
  }
  checkDeviceTimes(body, receivedAt);
  if (
    body.type === 'correction' &&
    !mayDecide(user) &&
    correctsDecision(namedOriginal?.type, correctionChanges(body.payload))
  ) {
    throw refused(403, refusal('foremanCorrectsDecision'));
  }

  // The state before this tap: the whole log for a correction (it may change anything), else the row's fold
  // (derived from the log first when the row never was).
  let stored =
    body.type === 'correction' || !install.derivedFold || install.derivedAt === null
      ? await rederive(user.companyId, installId, settings, t)
      : null;
  const fold = stored?.fold ?? install.derivedFold!;
  const state = stored?.state ?? stateOfFold(fold);
  const target = body.type === 'correction' ? correctionTarget(state, body.correctsEventId) : undefined;

  const problem = orderRefusal(state, { ...body, correctsEventId }, { reopened: install.status === 'sent_back' });
  if (problem) throw refused(422, problem);
  if (target) checkCorrectedPayload(target.type, { ...target.payload, ...correctionChanges(body.payload) });
  if (body.type === 'conditions_recorded') await checkConditions(user, body.payload, today, t);
  if (body.type === 'go_decision') await checkMakerHold(user, state, body.payload, t);
  if (target?.type === 'conditions_recorded') {
    const changes = correctionChanges(body.payload);
    // Correcting a temperature after the kit expired overnight is fine; choosing an expired kit is not.
    const kitChanged = changes.resinKitId !== undefined && changes.resinKitId !== target.payload.resinKitId;
    await checkConditions(user, { ...target.payload, ...changes }, kitChanged ? today : null, t);
  }

  const plainEvent: InstallEventRow = {
    id: randomUUID(),
    companyId: user.companyId,
    installId,
    clientEventId: body.clientEventId,
    type: body.type,
    deviceTime: new Date(body.deviceTime),
    receivedAt,
    userId: user.id,
    payload: body.payload ?? {},
    correctsEventId: target?.id ?? null,
    createdAt: new Date(),
  };
  const values = { ...plainEvent, payload: JSON.stringify(plainEvent.payload) };
  // Inserting the event takes the company's numbering lock until commit (migration 20261203014000). A tap in log
  // order therefore writes its install row first and inserts last, the NOTIFY in the same statement: taps of one
  // company wait on each other for one round trip and the commit, not for the whole tap.
  if (body.type !== 'correction' && !stored && foldsInOrder(fold, plainEvent)) {
    const next = await foldIn(user, install, fold, plainEvent, settings, t);
    await updateSummary(user, install, next, body, t);
    await writeAudit(user, install, body, target, t);
    await insertAndNotifyTap(t, INSERT_EVENT_SQL, values, next.state.step);
    return { event: plainEvent, created: true };
  }
  // Out of log order (two tablets, a late outbox) or a correction: the whole log again, this tap included.
  await sequelize.query(INSERT_EVENT_SQL, { replacements: values, transaction: t });
  stored = await rederive(user.companyId, installId, settings, t);
  const next: Next = { state: stored.state, kit: stored.kit, derived: rowOf(stored) };
  await updateSummary(user, install, next, body, t);
  await writeAudit(user, install, body, target, t);
  await notifyTap(t, { eventId: plainEvent.id, step: next.state.step });
  return { event: plainEvent, created: true };
}

/**
 * The insert of one event, `value(key)` the SQL of each value: a placeholder, or a literal where the statement is
 * sent whole with others (the quick tap path, lib/data/tap-in-order.ts).
 */
export function insertEventSql(value: (key: keyof typeof EVENT_COLUMNS) => string) {
  const keys = Object.keys(EVENT_COLUMNS) as (keyof typeof EVENT_COLUMNS)[];
  return `INSERT INTO install_events (${keys.map((key) => EVENT_COLUMNS[key]).join(', ')})
    VALUES (${keys.map((key) => (key === 'payload' ? `CAST(${value(key)} AS jsonb)` : value(key))).join(', ')})
    RETURNING *`;
}

const EVENT_COLUMNS = {
  id: 'id',
  companyId: 'company_id',
  installId: 'install_id',
  clientEventId: 'client_event_id',
  type: 'type',
  deviceTime: 'device_time',
  receivedAt: 'received_at',
  userId: 'user_id',
  payload: 'payload',
  correctsEventId: 'corrects_event_id',
  createdAt: 'created_at',
} as const satisfies Partial<Record<keyof InstallEventRow, string>>;

const INSERT_EVENT_SQL = insertEventSql((key) => `:${key}`);

export type Next = {
  state: InstallState;
  kit: { id: string; resinSystemId: string } | null;
  derived: Record<string, unknown>;
};

/** The install row's columns after a tap: its derived state and the summary lists and reports read. */
export function summaryOf(
  install: Pick<Install, 'status' | 'signedOffById'>,
  next: Next,
  type: ParsedEvent['type'],
  userId: string,
) {
  const { state, kit } = next;
  const signedOff = type === 'signed_off';
  return {
    ...next.derived,
    status: (signedOff
      ? 'awaiting_review'
      : install.status === 'not_started'
        ? 'in_progress'
        : install.status) as InstallStatus,
    startedAt: state.startedAt,
    mixTempC: state.conditions?.mixTempC ?? null,
    pipeTempC: state.conditions?.pipeTempC ?? null,
    resinKitId: state.conditions ? (kit?.id ?? null) : null,
    resinSystemId: state.conditions ? (kit?.resinSystemId ?? null) : null,
    packerId: state.conditions?.packerId ?? null,
    patchLengthMm: state.conditions?.patchLengthMm ?? null,
    dryRunSeconds: state.dryRunSeconds === null ? null : Math.round(state.dryRunSeconds),
    noGoOverrideReason: state.goDecision?.overrideReason ?? null,
    inspectionResult: state.inspection?.result ?? null,
    inspectionNotes: state.inspection?.notes ?? null,
    signedOffById: signedOff ? userId : install.signedOffById,
    signedOffAt: state.signedOffAt,
    finishedAt: state.signedOffAt,
  };
}

/** The state after one tap in log order: its event folded into the stored fold; materials re-read if it names them. */
async function foldIn(
  user: SessionUser,
  install: Install,
  fold: StoredFold,
  event: InstallEventRow,
  settings: DeriveSettings,
  t: Transaction,
): Promise<Next> {
  const folded = foldEvent(fold, event);
  if (event.type !== 'conditions_recorded') return nextOfFold(install, folded, settings);
  const loaded = await loadMaterials(user.companyId, stateOfFold(folded).conditions, t);
  return nextOfFold(install, { ...folded, materials: loaded.materials }, settings, loaded.kit);
}

/** The row's derived state from a fold that has the tap in it; the kit stays the row's unless conditions changed it. */
export function nextOfFold(
  install: Pick<Install, 'resinKitId' | 'resinSystemId' | 'eventCount'>,
  folded: StoredFold,
  settings: DeriveSettings,
  kit: Next['kit'] = install.resinKitId && install.resinSystemId
    ? { id: install.resinKitId, resinSystemId: install.resinSystemId }
    : null,
): Next {
  const { columns, fold: stored } = deriveRow(folded, settings);
  return {
    state: stateOfFold(stored),
    kit,
    derived: { ...columns, eventCount: install.eventCount + 1, derivedFold: stored, derivedAt: new Date() },
  };
}

/** The install row keeps a summary of its log for lists and reports; the job and repair follow it. */
async function updateSummary(user: SessionUser, install: Install, next: Next, body: ParsedEvent, t: Transaction) {
  const firstEvent = install.status === 'not_started';
  const signedOff = body.type === 'signed_off';
  await install.update(summaryOf(install, next, body.type, user.id), { transaction: t });
  if (!firstEvent && !signedOff) return;

  const job = await Job.findOne({
    where: { id: install.jobId, companyId: user.companyId },
    lock: t.LOCK.UPDATE,
    transaction: t,
  });
  if (!job) return;
  if (firstEvent && ['draft', 'scheduled', 'sent_back', 'awaiting_review'].includes(job.status)) {
    await job.update({ status: 'in_progress' }, { transaction: t });
  }
  if (signedOff) {
    await Repair.update(
      { status: 'installed' },
      { where: { id: install.repairId, companyId: user.companyId }, transaction: t },
    );
    // A resubmitted install (sent back, signed off again) puts its job back in the queue the same way.
    if (
      (job.status === 'in_progress' || job.status === 'sent_back') &&
      (await allRepairsAwaitReview(user, job.id, t))
    ) {
      await job.update({ status: 'awaiting_review' }, { transaction: t });
    }
  }
}

/** The event of this install a correction names, by server id or the device's id (two unique-index reads). */
async function namedEvent(user: SessionUser, installId: string, ref: string, t: Transaction) {
  const where = { companyId: user.companyId, installId };
  const byId = isUuid(ref) ? await InstallEvent.findOne({ where: { ...where, id: ref }, transaction: t }) : null;
  return (
    byId ??
    (isUuid(ref) ? await InstallEvent.findOne({ where: { ...where, clientEventId: ref }, transaction: t }) : null)
  );
}

/** 404 for an install the company does not have, 403 for a field user of another crew (as `findInstallFor`). */
function checkAccess(user: SessionUser, install: InstallAccess | null) {
  if (!install) throw notFound('Install');
  if (!mayWorkOn(user, [install.crewId, install.jobCrewId])) throw refused(403, refusal('otherCrew'));
}

const isUuid = (value: string) => /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i.test(value);

/** True when the latest install of every live repair of the job is signed off (or already approved). */
async function allRepairsAwaitReview(user: SessionUser, jobId: string, t: Transaction) {
  const repairs = await Repair.findAll({
    where: { jobId, companyId: user.companyId, status: { [Op.ne]: 'cancelled' } },
    transaction: t,
  });
  const installs = await Install.findAll({
    where: { jobId, companyId: user.companyId },
    order: [['createdAt', 'DESC']],
    transaction: t,
  });
  return repairs.every((repair) => {
    const latest = installs.find((i) => i.repairId === repair.id);
    return latest !== undefined && (latest.status === 'awaiting_review' || latest.status === 'approved');
  });
}

/**
 * The kit and packer of recorded conditions must be the company's (422 otherwise, the same answer
 * as for an id that does not exist), and the screen refuses a kit past its date (`today` in the
 * company's time zone; null skips it). Checked only when conditions are recorded or corrected, so
 * a kit that expires overnight does not stop the crew from finishing the install.
 */
async function checkConditions(
  user: SessionUser,
  conditions: Record<string, unknown>,
  today: string | null,
  t: Transaction,
) {
  const [kit, packer] = await Promise.all([
    ResinKit.findOne({ where: { id: String(conditions.resinKitId), companyId: user.companyId }, transaction: t }),
    Packer.findOne({ where: { id: String(conditions.packerId), companyId: user.companyId }, transaction: t }),
  ]);
  if (!kit)
    throw refused(422, refusal('kitUnknown'), {
      'payload.resinKitId': ['Unknown resin kit'],
    });
  if (!packer)
    throw refused(422, refusal('packerUnknown'), {
      'payload.packerId': ['Unknown packer'],
    });
  if (today !== null && kit.expiresOn < today) {
    throw refused(422, refusal('kitExpired', { lot: kit.lot, day: kit.expiresOn }), {
      'payload.resinKitId': ['Expired kit'],
    });
  }
}

/**
 * Going on with the pipe outside the resin's rated range leaves the clock without a hold of its own: the
 * foreman's override must carry the hold time from the resin maker's sheet, which the countdown then uses.
 */
async function checkMakerHold(
  user: SessionUser,
  state: InstallState,
  payload: Record<string, unknown>,
  t: Transaction,
) {
  const pipeTempC = state.conditions?.pipeTempC;
  const goesOn = payload.go === true || typeof payload.overrideReason === 'string';
  if (!goesOn || typeof payload.makerHoldMin === 'number' || typeof pipeTempC !== 'number') return;
  const kit = await ResinKit.findOne({
    where: { id: String(state.conditions?.resinKitId), companyId: user.companyId },
    include: [{ model: ResinSystem, as: 'resinSystem', attributes: ['minTempC', 'maxTempC'] }],
    transaction: t,
  });
  const resin = (kit as (ResinKit & { resinSystem?: ResinSystem }) | null)?.resinSystem;
  if (!resin || (pipeTempC >= resin.minTempC && pipeTempC <= resin.maxTempC)) return;
  throw refused(422, refusal('makerHoldNeeded'), {
    'payload.makerHoldMin': ["Enter the hold time from the resin maker's sheet"],
  });
}

async function writeAudit(
  user: SessionUser,
  install: Install,
  body: ParsedEvent,
  target: InstallState['log'][number] | undefined,
  t: Transaction,
) {
  const base = { companyId: user.companyId, userId: user.id };
  if (body.type === 'correction' && target) {
    const changes = correctionChanges(body.payload);
    await AuditEntry.create(
      {
        ...base,
        action: 'install_event.corrected',
        entityType: 'install_event',
        entityId: target.id,
        changes: {
          installId: install.id,
          type: target.type,
          ...(typeof body.payload.deviceTime === 'string'
            ? { deviceTime: { from: target.deviceTime.toISOString(), to: body.payload.deviceTime } }
            : {}),
          ...(Object.keys(changes).length
            ? { payload: { from: pick(target.payload, Object.keys(changes)), to: changes } }
            : {}),
        },
        reason: String(body.payload.reason),
      },
      { transaction: t },
    );
  }
  if (body.type === 'signed_off') {
    await AuditEntry.create(
      {
        ...base,
        action: 'install.signed_off',
        entityType: 'install',
        entityId: install.id,
        changes: { status: { to: 'awaiting_review' }, name: body.payload.name },
      },
      { transaction: t },
    );
  }
  if (body.type === 'go_decision' && typeof body.payload.overrideReason === 'string') {
    await AuditEntry.create(
      {
        ...base,
        action: 'install.no_go_overridden',
        entityType: 'install',
        entityId: install.id,
        changes: { go: body.payload.go },
        reason: body.payload.overrideReason,
      },
      { transaction: t },
    );
  }
}

/** The tap's time, and a correction's corrected time, must be near the server's receive time (422). */
function checkDeviceTimes(body: ParsedEvent, receivedAt: Date) {
  const own = deviceTimeRefusal(body.deviceTime, receivedAt);
  if (own) throw refused(422, own, { deviceTime: [own.text] });
  if (body.type === 'correction' && typeof body.payload.deviceTime === 'string') {
    const corrected = deviceTimeRefusal(body.payload.deviceTime, receivedAt, 'The corrected time');
    if (corrected) throw refused(422, corrected, { 'payload.deviceTime': [corrected.text] });
  }
}

/** The body or a 400 naming each bad field by its path in the body (`payload.pressureKpa`). */
function parseBodyOrThrow(input: unknown): ParsedEvent {
  const result = parseEventBody(input);
  if (result.success) return result.data;
  throw badRequest(result.error, 'path' in result ? result.path : undefined);
}

/** A correction's merged payload must still be a valid payload of the event it corrects. */
function checkCorrectedPayload(type: keyof typeof eventPayloadSchemas, merged: Record<string, unknown>) {
  const result = eventPayloadSchemas[type].safeParse(merged);
  if (!result.success) throw badRequest(result.error, 'payload.payload');
}

function badRequest(error: z.ZodError, prefix?: string) {
  const fields: Record<string, string[]> = {};
  for (const issue of error.issues) {
    const key = [prefix, ...issue.path.map(String)].filter(Boolean).join('.') || '_';
    (fields[key] ??= []).push(issue.message);
  }
  const first = Object.entries(fields)[0];
  return new AppError(400, `Invalid input — ${first[0] === '_' ? '' : `${first[0]}: `}${first[1][0]}`, fields);
}

const correctionChanges = (payload: Record<string, unknown>) =>
  typeof payload.payload === 'object' && payload.payload !== null ? (payload.payload as Record<string, unknown>) : {};

const pick = (from: Record<string, unknown>, keys: string[]) =>
  Object.fromEntries(keys.map((k) => [k, from[k] ?? null]));
