import 'server-only';
import PgBoss from 'pg-boss';
import { env } from '@/lib/env';

// One pg-boss instance per process, on the app's own PostgreSQL (schema "pgboss"). pg-boss 10
// wants every queue created before anything is sent to it or worked from it.

export const REPORT_QUEUE = 'report-send';
export type ReportJob = { sendId: string };

const globalForBoss = globalThis as unknown as { setlineBoss?: Promise<PgBoss> };

export function getBoss(): Promise<PgBoss> {
  globalForBoss.setlineBoss ??= startBoss().catch((error) => {
    globalForBoss.setlineBoss = undefined;
    throw error;
  });
  return globalForBoss.setlineBoss;
}

/** Puts a report send on the queue with the retry policy of the moment (see retryPolicy). */
export async function enqueueReportSend(sendId: string) {
  const boss = await getBoss();
  const id = await boss.send(REPORT_QUEUE, { sendId } satisfies ReportJob, retryPolicy());
  if (!id) throw new Error('The report queue did not accept the job.');
  return id;
}

/** Retries with exponential backoff; REPORT_RETRY_* override the defaults (tests use short ones). */
export function retryPolicy() {
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
  if (running) await (await running).stop({ graceful: true, timeout: 5000, wait: true });
}

async function startBoss() {
  const boss = new PgBoss({ connectionString: env().DATABASE_URL, max: 4 });
  boss.on('error', (error) => console.error('[jobs]', error));
  await boss.start();
  await boss.createQueue(REPORT_QUEUE);
  return boss;
}
