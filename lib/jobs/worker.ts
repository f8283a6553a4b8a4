import 'server-only';
import { deliverReportSend } from '@/lib/report/deliver';
import { REPORT_QUEUE, getBoss, type ReportJob } from './queue';

// The background worker: takes report sends off the queue and delivers them. Started in-process by
// the Next server (instrumentation.ts) and directly by the tests.

export async function startReportWorker(options: { pollingIntervalSeconds?: number } = {}) {
  const boss = await getBoss();
  const id = await boss.work<ReportJob>(
    REPORT_QUEUE,
    { includeMetadata: true, batchSize: 1, pollingIntervalSeconds: options.pollingIntervalSeconds ?? 2 },
    async (jobs) => {
      // pg-boss 10 hands the handler an array, even of one.
      for (const job of jobs) {
        await deliverReportSend(job.data.sendId, { retryCount: job.retryCount, retryLimit: job.retryLimit });
      }
    },
  );
  return { stop: () => boss.offWork({ id }) };
}
