import 'server-only';
import { QueryTypes, type Transaction } from 'sequelize';
import { sequelize } from '@/lib/data/db';
import type { SessionUser } from '@/lib/auth/session';
import { isDeskRole } from '@/lib/auth/roles';
import { mayWorkOn } from '@/lib/install/access';
import { deriveInstallState, type InstallStep } from '@/lib/install/state';
import type { InstallEventType, InstallStatus } from '@/lib/domain/vocabulary';

// The live stream's data side: the NOTIFY a tap sends in its own transaction, who may receive it, and the
// replay from the event log for a client that reconnects with Last-Event-ID. The listening and the SSE
// framing are in lib/live/.

/** The PostgreSQL channel every app server listens on. */
export const LIVE_CHANNEL = 'setline_live';

/** One stored tap as the stream sends it (the SSE id is `seq`). */
export type LiveEvent = {
  /** Commit order within the company (install_events.seq), a decimal string: bigint does not fit a JS number. */
  seq: string;
  /** The install's id (also as `installId`). */
  id: string;
  installId: string;
  eventId: string;
  type: InstallEventType;
  /** The install's step after this tap. */
  step: InstallStep;
  status: InstallStatus;
  jobId: string;
  deviceTime: string;
  receivedAt: string;
};

/** What the listener gets: the event plus whose it is (never sent on to a browser). */
export type LiveNotice = LiveEvent & { companyId: string; crewIds: string[] };

/**
 * Sends the stored tap to every app server's live streams: `pg_notify` inside the tap's transaction, so
 * PostgreSQL delivers it only when (and if) the tap commits, in commit order. `step` is the install's step
 * after the tap, as the tap path derived it.
 */
export async function notifyTap(t: Transaction, tap: { eventId: string; step: InstallStep }): Promise<void> {
  await sequelize.query(`SELECT ${noticeSql()} FROM install_events e ${NOTICE_JOINS} WHERE e.id = :eventId`, {
    replacements: { step: tap.step, eventId: tap.eventId },
    transaction: t,
    type: QueryTypes.SELECT,
  });
}

/**
 * The same NOTIFY for a tap inserted by `insertSql` (an `INSERT INTO install_events … RETURNING *`) in the same
 * statement: one round trip while the company's numbering lock is held (migration 20261203014000).
 */
export async function insertAndNotifyTap(
  t: Transaction,
  insertSql: string,
  replacements: Record<string, unknown>,
  step: InstallStep,
): Promise<void> {
  await sequelize.query(insertAndNotifySql(insertSql), {
    replacements: { ...replacements, step },
    transaction: t,
    type: QueryTypes.SELECT,
  });
}

/**
 * The statement of `insertAndNotifyTap`; `step` a SQL text expression (a placeholder, or a literal where the
 * statement is sent whole, as the quick tap path does).
 */
export const insertAndNotifySql = (insertSql: string, step = ':step') =>
  `WITH e AS (${insertSql}) SELECT ${noticeSql(step)} FROM e ${NOTICE_JOINS}`;

// Over a stored tap `e`, its install `i` and job `j`.
const noticeSql = (step = ':step') => `pg_notify('${LIVE_CHANNEL}', json_build_object(
    'seq', e.seq::text, 'id', e.install_id, 'installId', e.install_id, 'eventId', e.id, 'type', e.type,
    'step', CAST(${step} AS text), 'status', i.status, 'jobId', i.job_id,
    'deviceTime', e.device_time, 'receivedAt', e.received_at,
    'companyId', e.company_id, 'crewIds', json_build_array(i.crew_id, j.crew_id))::text)`;
const NOTICE_JOINS = 'JOIN installs i ON i.id = e.install_id JOIN jobs j ON j.id = i.job_id';

/** Whether this user's stream may carry the notice: their company, and for field users their crews' installs. */
export function mayReceive(user: Pick<SessionUser, 'companyId' | 'role' | 'crewIds'>, notice: LiveNotice): boolean {
  return notice.companyId === user.companyId && mayWorkOn(user, notice.crewIds);
}

/** The notice as the browser gets it: without the routing fields. */
export function liveEventOf(notice: LiveNotice): LiveEvent {
  return {
    seq: notice.seq,
    id: notice.id,
    installId: notice.installId,
    eventId: notice.eventId,
    type: notice.type,
    step: notice.step,
    status: notice.status,
    jobId: notice.jobId,
    deviceTime: notice.deviceTime,
    receivedAt: notice.receivedAt,
  };
}

/** The newest seq of the caller's company ('0' before any tap): where a fresh stream starts. */
export async function currentLiveSeq(user: SessionUser): Promise<string> {
  const [row] = await sequelize.query<{ seq: string | null }>(
    'SELECT max(seq)::text AS seq FROM install_events WHERE company_id = :companyId',
    { replacements: { companyId: user.companyId }, type: QueryTypes.SELECT },
  );
  return row?.seq ?? '0';
}

/** At most this many events per replay; a client further behind is told to reload its data instead. */
export const REPLAY_LIMIT = 500;

/**
 * The caller's events after `afterSeq`, in seq order, as the stream sent them (the step after each tap, from the
 * log up to it). `complete` is false when more than REPLAY_LIMIT were waiting (the client then refetches).
 */
export async function replayLive(
  user: SessionUser,
  afterSeq: string,
): Promise<{ events: LiveEvent[]; complete: boolean }> {
  const field = !isDeskRole(user.role);
  if (field && user.crewIds.length === 0) return { events: [], complete: true };
  const rows = await sequelize.query<ReplayRow>(
    `SELECT e.seq::text AS seq, e.id AS "eventId", e.install_id AS "installId", e.type, e.device_time AS "deviceTime",
            e.received_at AS "receivedAt", i.status, i.job_id AS "jobId"
       FROM install_events e JOIN installs i ON i.id = e.install_id JOIN jobs j ON j.id = i.job_id
      WHERE e.company_id = :companyId AND e.seq > CAST(:after AS bigint)
        ${field ? 'AND (i.crew_id IN (:crewIds) OR j.crew_id IN (:crewIds))' : ''}
      ORDER BY e.seq LIMIT ${REPLAY_LIMIT + 1}`,
    { replacements: { companyId: user.companyId, after: afterSeq, crewIds: user.crewIds }, type: QueryTypes.SELECT },
  );
  const complete = rows.length <= REPLAY_LIMIT;
  const replayed = rows.slice(0, REPLAY_LIMIT);
  const steps = await stepsAt(user, replayed);
  return {
    complete,
    events: replayed.map((row) => ({
      seq: row.seq,
      id: row.installId,
      installId: row.installId,
      eventId: row.eventId,
      type: row.type,
      step: steps.get(row.eventId) ?? 'safety',
      status: row.status,
      jobId: row.jobId,
      deviceTime: new Date(row.deviceTime).toISOString(),
      receivedAt: new Date(row.receivedAt).toISOString(),
    })),
  };
}

type ReplayRow = {
  seq: string;
  eventId: string;
  installId: string;
  type: InstallEventType;
  deviceTime: Date;
  receivedAt: Date;
  status: InstallStatus;
  jobId: string;
};

/** The install's step right after each replayed event: the log of its install up to that event, folded. */
async function stepsAt(user: SessionUser, rows: ReplayRow[]): Promise<Map<string, InstallStep>> {
  const steps = new Map<string, InstallStep>();
  if (rows.length === 0) return steps;
  const installIds = [...new Set(rows.map((r) => r.installId))];
  const log = await sequelize.query<LogRow>(
    `SELECT id, install_id AS "installId", client_event_id AS "clientEventId", type, device_time AS "deviceTime",
            received_at AS "receivedAt", payload, corrects_event_id AS "correctsEventId", seq::text AS seq
       FROM install_events
      WHERE company_id = :companyId AND install_id IN (:installIds) AND seq <= CAST(:upTo AS bigint)
      ORDER BY seq`,
    {
      replacements: { companyId: user.companyId, installIds, upTo: rows[rows.length - 1].seq },
      type: QueryTypes.SELECT,
    },
  );
  const wanted = new Set(rows.map((r) => r.eventId));
  const sofar = new Map<string, LogRow[]>();
  for (const event of log) {
    const list = sofar.get(event.installId) ?? [];
    list.push(event);
    sofar.set(event.installId, list);
    if (wanted.has(event.id)) steps.set(event.id, deriveInstallState(list).step);
  }
  return steps;
}

type LogRow = {
  id: string;
  installId: string;
  clientEventId: string;
  type: InstallEventType;
  deviceTime: Date;
  receivedAt: Date;
  payload: Record<string, unknown>;
  correctsEventId: string | null;
  seq: string;
};
