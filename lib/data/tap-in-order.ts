import 'server-only';
import { randomUUID } from 'node:crypto';
import type { QueryResult } from 'pg';
import { Install } from '@/models';
import { USER_WITH_INSTALL, accessOf, type UserWithInstallRow } from '@/lib/auth/session';
import type { SessionClaims } from '@/lib/auth/claims';
import type { InstallEventType, InstallStatus } from '@/lib/domain/vocabulary';
import { mayWorkOn } from '@/lib/install/access';
import { foldEvent, foldsInOrder, stateOfFold, type StoredFold } from '@/lib/install/derived';
import { deviceTimeRefusal, isClosedInstall } from '@/lib/install/record-rules';
import { orderRefusal } from '@/lib/install/state';
import { isUuid } from '@/lib/validation/common';
import { parseEventBody } from '@/lib/validation/install-events';
import { companySettingsSql, settingsOf, type CompanySettings } from './install-derive';
import { insertEventSql, nextOfFold, summaryOf } from './install-events';
import type { InstallEventRow } from './installs';
import { insertAndNotifySql } from './live';
import { definePrepared, executeSql, prepareSql, withPooledClient } from './prepared';

// The tap's quick path. Most taps at the manhole (a pressure reading, inflated, deflated, a note) come in log order,
// on an install already started, and touch nothing but the install's row and its log. Such a tap is recorded here
// in two round trips on one pooled connection, each a few prepared statements sent as one:
//   1. BEGIN; who is asking (user, crews, the install's crews); the install's row, locked; is the tap's id stored?
//   2. the row's new derived state; the event inserted with its live NOTIFY; COMMIT.
// Anything else — a replay, a refusal, a correction, conditions, a decision, a sign-off, the first tap, a tap out of
// log order, any database error — rolls back and returns null, and `recordEvent` (lib/data/install-events.ts) does
// the whole work and gives the answer. The two write the same rows: tests/integration/tap-in-order.test.ts.

/** Taps that change only the install's row and log (no kit, packer, job, repair or audit read or written). */
const QUICK_TYPES: ReadonlySet<InstallEventType> = new Set<InstallEventType>([
  'safety_acknowledged',
  'checks_done',
  'dry_run_started',
  'dry_run_finished',
  'resin_mixed',
  'patch_loaded',
  'packer_in_position',
  'bladder_inflated',
  'pressure_reading',
  'bladder_deflated',
  'inspection_recorded',
  'note',
]);

type LockedInstall = {
  status: InstallStatus;
  eventCount: number;
  derived: boolean;
  fold: string | null;
  resinKitId: string | null;
  resinSystemId: string | null;
  signedOffById: string | null;
  company: string;
};

/** Records a tap in log order and answers as `recordEvent` would (201 and the event), or null to hand it over. */
export async function recordTapInOrder(
  claims: SessionClaims,
  installId: string,
  input: unknown,
): Promise<{ event: InstallEventRow; created: true } | null> {
  const receivedAt = new Date();
  const parsed = parseEventBody(input);
  if (!isUuid(installId) || !parsed.success || !QUICK_TYPES.has(parsed.data.type)) return null;
  const body = parsed.data;
  if (deviceTimeRefusal(body.deviceTime, receivedAt)) return null;

  try {
    return await withPooledClient(async (client) => {
      const run = (name: string, args: unknown[]) => executeSql(client, name, args);
      const read = (await client.query(
        `${prepareSql(client, [USER_WITH_INSTALL, LOCKED, REPLAY])}
         BEGIN;
         ${run(USER_WITH_INSTALL, [claims.sub, claims.companyId, installId])};
         ${run(LOCKED, [installId, claims.companyId])};
         ${run(REPLAY, [claims.companyId, body.clientEventId])}`,
      )) as unknown as QueryResult[];
      const [who, row, replay] = read.slice(-3);
      const planned = plan(
        claims,
        who.rows[0] as UserWithInstallRow | undefined,
        row.rows[0] as LockedInstall | undefined,
        replay.rowCount === 0,
        { installId, body, receivedAt },
      );
      if (!planned) {
        await client.query('ROLLBACK');
        return null;
      }
      const { event, columns, step } = planned;
      const update = updateStatement(Object.keys(columns));
      await client.query(
        `${prepareSql(client, [update, INSERT])}
         ${run(update, [installId, claims.companyId, ...Object.values(columns)])};
         ${run(INSERT, [...INSERT_KEYS.map((key) => event[key]), step])};
         COMMIT`,
      );
      return { event, created: true as const };
    });
  } catch (error) {
    // A database refusal (the same id stored meanwhile under another install, a constraint) or a lost connection
    // (closed, not pooled, by withPooledClient: nothing is left open): nothing was committed, or — a commit whose
    // answer was lost — the full path finds the tap and replays it.
    if (!(error instanceof Error) || !('severity' in error || 'code' in error)) throw error;
    return null;
  }
}

// The quick path's statements (lib/data/prepared.ts). The reads run inside the tap's transaction; the install's row
// is locked, so the replay probe sees any tap that held the lock before.
const LOCKED = definePrepared(
  'setline_tap_install',
  `SELECT i.status, i.event_count AS "eventCount", i.derived_at IS NOT NULL AS derived,
      i.derived_fold::text AS fold, i.resin_kit_id AS "resinKitId", i.resin_system_id AS "resinSystemId",
      i.signed_off_by_id AS "signedOffById", ${companySettingsSql('i')}::text AS company
    FROM installs i WHERE i.id = $1 AND i.company_id = $2 FOR UPDATE`,
);
const REPLAY = definePrepared(
  'setline_tap_replay',
  'SELECT 1 FROM install_events WHERE company_id = $1 AND client_event_id = $2',
);
const INSERT_KEYS: (keyof InstallEventRow & string)[] = [];
const INSERT = definePrepared(
  'setline_tap_insert',
  insertAndNotifySql(
    insertEventSql((key) => `$${INSERT_KEYS.push(key)}`),
    `$${INSERT_KEYS.length + 1}`,
  ),
);
const updates = new Map<string, string>();

/** The install row's update for these attributes (always the same set, from `summaryOf`), named once. */
function updateStatement(keys: string[]): string {
  const columns = keys.join(',');
  let name = updates.get(columns);
  if (!name) {
    const attributes = Install.getAttributes();
    const set = keys.map((key, i) => `${attributes[key as keyof typeof attributes].field} = $${i + 3}`).join(', ');
    name = definePrepared(
      `setline_tap_update_${updates.size}`,
      `UPDATE installs SET ${set}, updated_at = now() WHERE id = $1 AND company_id = $2`,
    );
    updates.set(columns, name);
  }
  return name;
}

type Tap = {
  installId: string;
  body: Extract<ReturnType<typeof parseEventBody>, { success: true }>['data'];
  receivedAt: Date;
};

/** The event and the row's new columns, or null when the tap is not one for the quick path. */
function plan(
  claims: SessionClaims,
  who: UserWithInstallRow | undefined,
  install: LockedInstall | undefined,
  isNew: boolean,
  { installId, body, receivedAt }: Tap,
) {
  const access = accessOf(who, claims);
  if (!access?.install || !install || !isNew || !install.derived || install.fold === null) return null;
  const { user } = access;
  if (!mayWorkOn(user, [access.install.crewId, access.install.jobCrewId])) return null;
  if (body.userId !== undefined && body.userId !== user.id) return null;
  if (isClosedInstall(install.status) || install.status === 'not_started') return null;

  const fold = JSON.parse(install.fold) as StoredFold;
  const event: InstallEventRow = {
    id: randomUUID(),
    companyId: user.companyId,
    installId,
    clientEventId: body.clientEventId,
    type: body.type,
    deviceTime: new Date(body.deviceTime),
    receivedAt,
    userId: user.id,
    payload: body.payload ?? {},
    correctsEventId: null,
    createdAt: new Date(),
  };
  if (!foldsInOrder(fold, event)) return null;
  const reopened = install.status === 'sent_back';
  if (orderRefusal(stateOfFold(fold), { ...body, correctsEventId: null }, { reopened })) return null;

  const settings = settingsOf(JSON.parse(install.company) as CompanySettings);
  const next = nextOfFold(install, foldEvent(fold, event), settings);
  return { event, columns: summaryOf(install, next, body.type, user.id), step: next.state.step };
}
