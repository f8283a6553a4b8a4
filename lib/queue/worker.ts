import 'server-only';
import { sweepPendingUploads } from '@/lib/data/attachments';
import { deliverReportSend, sweepReportSends } from '@/lib/report/deliver';
import { REPORT_QUEUE, REPORT_SWEEP_QUEUE, UPLOAD_SWEEP_QUEUE, getBoss, type ReportJob } from '@/lib/queue/boss';

// The background worker: takes report sends off the queue and delivers them, and runs the scheduled
// housekeeping. Started in-process by the Next server (instrumentation.ts, through
// startReportWorkerWhenReady) and directly by the tests.

/** When the housekeeping runs (cron, UTC): report sends left without a queue job, abandoned uploads. */
export const SCHEDULES = {
  [REPORT_SWEEP_QUEUE]: '* * * * *',
  [UPLOAD_SWEEP_QUEUE]: '*/15 * * * *',
} as const;

export type WorkerOptions = { pollingIntervalSeconds?: number; connectionString?: string };
export type RunningWorker = { stop: () => Promise<void> };

export async function startReportWorker(options: WorkerOptions = {}): Promise<RunningWorker> {
  const boss = await getBoss({ connectionString: options.connectionString });
  const polling = { pollingIntervalSeconds: options.pollingIntervalSeconds ?? 2 };
  const ids = [
    await boss.work<ReportJob>(REPORT_QUEUE, { includeMetadata: true, batchSize: 1, ...polling }, async (jobs) => {
      // pg-boss 10 hands the handler an array, even of one.
      for (const job of jobs) {
        await deliverReportSend(job.data.sendId, { retryCount: job.retryCount, retryLimit: job.retryLimit });
      }
    }),
    await boss.work(REPORT_SWEEP_QUEUE, polling, async () => {
      await sweepReportSends();
    }),
    await boss.work(UPLOAD_SWEEP_QUEUE, polling, async () => {
      await sweepPendingUploads();
    }),
  ];
  for (const [name, cron] of Object.entries(SCHEDULES)) await boss.schedule(name, cron, {}, { tz: 'UTC' });
  return {
    stop: async () => {
      for (const id of ids) await boss.offWork({ id });
    },
  };
}

/**
 * Starts the worker as soon as the database answers: a failed start (database down at boot) is tried
 * again with exponential backoff (minDelayMs doubling up to maxDelayMs) until it succeeds or is stopped.
 * `started` resolves with the running worker.
 */
export function startReportWorkerWhenReady(options: WorkerOptions & { minDelayMs?: number; maxDelayMs?: number } = {}) {
  const { minDelayMs = 1000, maxDelayMs = 60_000, ...workerOptions } = options;
  let stopped = false;
  let timer: ReturnType<typeof setTimeout> | undefined;
  let running: RunningWorker | undefined;
  let tries = 0;
  const started = new Promise<RunningWorker>((resolve) => {
    const attempt = async () => {
      if (stopped) return;
      tries += 1;
      try {
        running = await startReportWorker(workerOptions);
        if (stopped) return void (await running.stop());
        if (tries > 1) console.info(`[jobs] the report worker started on try ${tries}`);
        resolve(running);
      } catch (error) {
        const delay = Math.min(maxDelayMs, minDelayMs * 2 ** (tries - 1));
        console.error(
          `[jobs] the report worker could not start (try ${tries}); trying again in ${Math.round(delay / 100) / 10} s:`,
          error instanceof Error ? error.message : error,
        );
        timer = setTimeout(attempt, delay);
      }
    };
    void attempt();
  });
  return {
    started,
    tries: () => tries,
    stop: async () => {
      stopped = true;
      clearTimeout(timer);
      await running?.stop();
    },
  };
}
