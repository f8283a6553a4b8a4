import 'server-only';
import PgBoss from 'pg-boss';
import type { Transaction } from 'sequelize';
import { env } from '@/lib/env';

// One pg-boss instance per process, on the app's own PostgreSQL (schema "pgboss"). pg-boss 10
// wants every queue created before anything is sent to it or worked from it.

export const REPORT_QUEUE = 'report-send';
/** Re-queues report sends left without a live queue job (a crash between commit and queue, a dead worker). */
export const REPORT_SWEEP_QUEUE = 'report-sweep';
/** Removes uploads that were requested but never completed. */
export const UPLOAD_SWEEP_QUEUE = 'upload-sweep';
const QUEUES = [REPORT_QUEUE, REPORT_SWEEP_QUEUE, UPLOAD_SWEEP_QUEUE] as const;
export type ReportJob = { sendId: string };

const globalForBoss = globalThis as unknown as { setlineBoss?: Promise<PgBoss> };

/** The process's pg-boss, started on first use; `connectionString` (tests) replaces DATABASE_URL for a new one. */
export function getBoss(options: { connectionString?: string } = {}): Promise<PgBoss> {
  globalForBoss.setlineBoss ??= startBoss(options.connectionString ?? env().DATABASE_URL).catch((error) => {
    globalForBoss.setlineBoss = undefined;
    throw error;
  });
  return globalForBoss.setlineBoss;
}

/**
 * Puts a report send on the queue with the retry policy of the moment (see retryPolicy). Given the
 * transaction that wrote the send row, the job is inserted on that transaction's connection, so the
 * row and its job are committed (or rolled back) together.
 */
export async function enqueueReportSend(sendId: string, transaction?: Transaction): Promise<string> {
  const boss = await getBoss();
  const id = await boss.send(REPORT_QUEUE, { sendId } satisfies ReportJob, {
    ...retryPolicy(),
    ...(transaction ? { db: transactionDb(transaction) } : {}),
  });
  if (!id) throw new Error('The report queue did not accept the job.');
  return id;
}

/** Retries with exponential backoff; REPORT_RETRY_* override the defaults (tests use short ones). */
function retryPolicy() {
  const e = env();
  return {
    retryLimit: e.REPORT_RETRY_LIMIT,
    retryDelay: e.REPORT_RETRY_DELAY_SECONDS,
    retryBackoff: e.REPORT_RETRY_BACKOFF !== 'false',
    expireInSeconds: 300,
  };
}

/** Stops the process's instance (tests and shutdown); the next getBoss starts a new one. */
export async function stopBoss() {
  const running = globalForBoss.setlineBoss;
  globalForBoss.setlineBoss = undefined;
  if (running) await (await running.catch(() => null))?.stop({ graceful: true, timeout: 5000, wait: true });
}

/** pg-boss's SQL runs on the Sequelize transaction's own connection (inside its BEGIN … COMMIT). */
function transactionDb(transaction: Transaction): PgBoss.Db {
  const client = (
    transaction as unknown as { connection?: { query(text: string, values: unknown[]): Promise<{ rows: unknown[] }> } }
  ).connection;
  if (!client) throw new Error('The transaction has no connection to queue on.');
  return { executeSql: (text, values) => client.query(text, values) as Promise<{ rows: never[] }> };
}

async function startBoss(connectionString: string) {
  const boss = new PgBoss({ connectionString, max: 4 });
  boss.on('error', (error) => console.error('[jobs]', error));
  try {
    await boss.start();
    for (const name of QUEUES) await boss.createQueue(name);
  } catch (error) {
    // Leave no pool behind when the database did not answer: the next try makes a new instance.
    await boss.stop({ graceful: false, wait: false }).catch(() => undefined);
    throw error;
  }
  return boss;
}
