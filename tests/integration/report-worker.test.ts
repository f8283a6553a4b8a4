import { randomUUID } from 'node:crypto';
import { createConnection, createServer, type Server } from 'node:net';
import PgBoss from 'pg-boss';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as sendRoute } from '@/app/api/jobs/[id]/report/route';
import { sequelize } from '@/lib/data/db';
import { Attachment, ReportSend } from '@/models';
import {
  REPORT_QUEUE,
  UPLOAD_SWEEP_QUEUE,
  enqueueReportSend,
  getBoss,
  stopBoss,
  type ReportJob,
} from '@/lib/queue/boss';
import { SCHEDULES, startReportWorker, startReportWorkerWhenReady } from '@/lib/queue/worker';
import { createReportLink } from '@/lib/data/report-links';
import { CLAIM_LEASE_SECONDS } from '@/lib/data/report-delivery';
import { deliverReportSend, sweepReportSends } from '@/lib/report/deliver';
import { linkExpiry } from '@/lib/report/link';
import { headObject, putObject } from '@/lib/storage/s3';
import { call, jsonBody } from './helpers/call';
import { signInAs } from './helpers/session';
import { eventually, makeApprovedJob } from './report-fixtures';

// The report worker against the real queue (pg-boss on the test database) and the mail fake over SMTP:
// a send is mailed once however many workers hold it, a row left without a queue job is still sent,
// and a worker whose database was down at start starts once it answers.

const MAIL = process.env.MAIL_WEB_URL;
const ONE_TRY = { retryCount: 0, retryLimit: 2 };

beforeAll(() => {
  if (!MAIL || !process.env.SMTP_PORT)
    throw new Error('Start the service fakes first (scripts/test.sh does; see scripts/fakes.sh)');
  process.env.REPORT_RETRY_LIMIT = '2';
  process.env.REPORT_RETRY_DELAY_SECONDS = '1';
});
afterAll(async () => {
  await stopBoss();
});

/** Messages in the mail fake addressed to `to`. */
async function mailsTo(to: string): Promise<number> {
  const messages = (await (await fetch(`${MAIL}/messages`)).json()) as { to: string }[];
  return messages.filter((m) => m.to.includes(to)).length;
}

/** A queued send of an approved job, made through the route (row, link and queue job in one transaction). */
async function queuedSend() {
  const to = `worker-${randomUUID().slice(0, 8)}@example.test`;
  const w = await makeApprovedJob(to);
  await signInAs(w.office);
  const { status, body } = await call(
    sendRoute,
    `/api/jobs/${w.job.id}/report`,
    { id: w.job.id },
    jsonBody('POST', {}),
  );
  expect(status).toBe(202);
  return { w, to, sendId: body.id as string };
}

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

describe('report sends: claimed before mailing, queued with their row', () => {
  it('writes the queue job in the send row’s transaction: rolled back together, committed together', async () => {
    const { sendId } = await queuedSend();
    const row = await ReportSend.findByPk(sendId);
    const boss = await getBoss();
    expect(row?.queueJobId).toBeTruthy();
    expect((await boss.getJobById<ReportJob>(REPORT_QUEUE, row!.queueJobId!))?.data).toEqual({ sendId });

    let rolledBackJob = '';
    await expect(
      sequelize.transaction(async (transaction) => {
        rolledBackJob = await enqueueReportSend(sendId, transaction);
        throw new Error('crash before commit');
      }),
    ).rejects.toThrow('crash before commit');
    expect(rolledBackJob).toMatch(/^[0-9a-f-]{36}$/);
    expect(await boss.getJobById(REPORT_QUEUE, rolledBackJob)).toBeNull();
  });

  it('two workers handed the same send at once mail it once', async () => {
    const { to, sendId } = await queuedSend();
    const outcomes = await Promise.all([deliverReportSend(sendId, ONE_TRY), deliverReportSend(sendId, ONE_TRY)]);
    expect(outcomes.sort()).toEqual(['sent', 'skipped']);
    const row = await ReportSend.findByPk(sendId);
    expect(row).toMatchObject({ status: 'sent', attempts: 1, claimedAt: null });
    await sleep(500);
    expect(await mailsTo(to)).toBe(1);
    // A third delivery of the job (the queue's retry after an expiry) changes nothing.
    expect(await deliverReportSend(sendId, ONE_TRY)).toBe('skipped');
    expect(await mailsTo(to)).toBe(1);
  });

  it('two pg-boss workers polling one queue that holds the same send three times mail it once', async () => {
    const { to, sendId } = await queuedSend();
    await enqueueReportSend(sendId);
    await enqueueReportSend(sendId);
    const a = await startReportWorker({ pollingIntervalSeconds: 0.5 });
    const second = new PgBoss({ connectionString: process.env.DATABASE_URL!, max: 2 });
    second.on('error', () => undefined);
    await second.start();
    await second.work<ReportJob>(
      REPORT_QUEUE,
      { pollingIntervalSeconds: 0.5, batchSize: 1, includeMetadata: true },
      async (jobs) => {
        for (const job of jobs)
          await deliverReportSend(job.data.sendId, { retryCount: job.retryCount, retryLimit: job.retryLimit });
      },
    );
    try {
      await eventually(
        async () => ((await ReportSend.findByPk(sendId))?.status === 'sent' ? true : undefined),
        20_000,
        'the send',
      );
      await eventually(
        async () => {
          const jobs = await sequelize.query<{ state: string }>(
            `SELECT state FROM pgboss.job WHERE name = :name AND data->>'sendId' = :sendId`,
            { replacements: { name: REPORT_QUEUE, sendId }, type: QueryTypes.SELECT },
          );
          return jobs.length === 3 && jobs.every((j) => j.state === 'completed') ? true : undefined;
        },
        20_000,
        'all three queue jobs to finish',
      );
      expect(await mailsTo(to)).toBe(1);
      expect((await ReportSend.findByPk(sendId))?.attempts).toBe(1);
    } finally {
      await a.stop();
      await second.stop({ graceful: true, wait: true, timeout: 5000 });
    }
  });

  it('a claim held by a live worker is left alone; one past its lease is taken over', async () => {
    const { to, sendId } = await queuedSend();
    await ReportSend.update({ status: 'sending', claimedAt: new Date() }, { where: { id: sendId } });
    expect(await deliverReportSend(sendId, ONE_TRY)).toBe('skipped');
    expect(await mailsTo(to)).toBe(0);
    await ReportSend.update(
      { claimedAt: new Date(Date.now() - (CLAIM_LEASE_SECONDS + 5) * 1000) },
      { where: { id: sendId } },
    );
    expect(await deliverReportSend(sendId, ONE_TRY)).toBe('sent');
    await sleep(300);
    expect(await mailsTo(to)).toBe(1);
  });

  it('a queued row without a queue job (a crash between commit and queue) is swept onto the queue and sent', async () => {
    const to = `orphan-${randomUUID().slice(0, 8)}@example.test`;
    const w = await makeApprovedJob(to);
    const orphan = await sequelize.transaction(async (transaction) => {
      const link = await createReportLink(w.company.id, w.job.id, linkExpiry(), transaction);
      return ReportSend.create(
        {
          companyId: w.company.id,
          jobId: w.job.id,
          toAddress: to,
          linkExpiresAt: link.expiresAt,
          linkId: link.id,
          sentById: w.office.id,
        },
        { transaction },
      );
    });
    // A send whose job is still waiting on the queue is not queued twice.
    const { sendId: waiting } = await queuedSend();
    const waitingJob = (await ReportSend.findByPk(waiting))!.queueJobId;

    expect(await sweepReportSends({ olderThanSeconds: 120 })).toBe(0); // too fresh to be called lost
    expect(await sweepReportSends({ olderThanSeconds: 0 })).toBeGreaterThanOrEqual(1);
    const swept = (await ReportSend.findByPk(orphan.id))!;
    expect(swept.queueJobId).toBeTruthy();
    expect((await ReportSend.findByPk(waiting))!.queueJobId).toBe(waitingJob);

    const worker = await startReportWorker({ pollingIntervalSeconds: 0.5 });
    try {
      await eventually(
        async () => ((await ReportSend.findByPk(orphan.id))?.status === 'sent' ? true : undefined),
        20_000,
        'the swept send',
      );
      expect(await mailsTo(to)).toBe(1);
    } finally {
      await worker.stop();
    }
  });
});

describe('the worker’s start and its schedules', () => {
  it('starts once the database answers when it was down at boot, and then sends', async () => {
    await stopBoss();
    const port = await freePort();
    const db = new URL(process.env.DATABASE_URL!);
    const viaProxy = Object.assign(new URL(db.href), { port: String(port) }).href;
    const starting = startReportWorkerWhenReady({
      connectionString: viaProxy,
      minDelayMs: 200,
      maxDelayMs: 800,
      pollingIntervalSeconds: 0.5,
    });
    let proxy: Server | undefined;
    try {
      await eventually(async () => (starting.tries() >= 3 ? true : undefined), 10_000, 'three refused starts');
      let started = false;
      void starting.started.then(() => (started = true));
      expect(started).toBe(false);
      // The database "comes up": a loopback proxy to the real one opens on the port the worker tries.
      proxy = await tcpProxy(port, Number(db.port));
      const worker = await Promise.race([starting.started, sleep(15_000).then(() => null)]);
      expect(worker, 'the worker started after the database came up').not.toBeNull();

      const { to, sendId } = await queuedSend();
      await eventually(
        async () => ((await ReportSend.findByPk(sendId))?.status === 'sent' ? true : undefined),
        20_000,
        'the send',
      );
      expect(await mailsTo(to)).toBe(1);
    } finally {
      await starting.stop();
      await stopBoss();
      proxy?.close();
    }
  }, 60_000);

  it('schedules the upload sweep every 15 minutes and the report sweep every minute; the scheduled upload job deletes stale pending uploads', async () => {
    const w = await makeApprovedJob(null);
    const worker = await startReportWorker({ pollingIntervalSeconds: 0.5 });
    try {
      const boss = await getBoss();
      const schedules = await boss.getSchedules();
      expect(schedules.map(({ name, cron }) => ({ name, cron }))).toEqual(
        expect.arrayContaining([
          { name: UPLOAD_SWEEP_QUEUE, cron: '*/15 * * * *' },
          { name: 'report-sweep', cron: '* * * * *' },
        ]),
      );
      expect(SCHEDULES[UPLOAD_SWEEP_QUEUE]).toBe('*/15 * * * *');

      const key = `test/${w.company.id}/${randomUUID()}.png`;
      await putObject(key, Buffer.from('not checked yet'), 'image/png');
      const stale = await Attachment.create({
        companyId: w.company.id,
        jobId: w.job.id,
        kind: 'after',
        storageKey: key,
        contentType: 'image/png',
        byteSize: 15,
        status: 'pending',
      });
      await sequelize.query('UPDATE attachments SET created_at = :at WHERE id = :id', {
        replacements: { at: new Date(Date.now() - 2 * 86_400_000), id: stale.id },
      });
      // What the cron does when it fires: put a job on the sweep queue.
      await boss.send(UPLOAD_SWEEP_QUEUE, {});
      await eventually(
        async () => ((await Attachment.count({ where: { id: stale.id } })) === 0 ? true : undefined),
        15_000,
        'the sweep',
      );
      expect(await headObject(key)).toBeNull();
    } finally {
      await worker.stop();
    }
  });
});

/** A loopback port with nothing listening on it (yet). */
async function freePort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as { port: number };
  await new Promise((resolve) => server.close(resolve));
  return port;
}

/** Forwards every connection on `port` to PostgreSQL on `target` (both loopback). */
async function tcpProxy(port: number, target: number): Promise<Server> {
  const server = createServer((socket) => {
    const upstream = createConnection({ host: '127.0.0.1', port: target });
    socket.pipe(upstream).pipe(socket);
    const close = () => {
      socket.destroy();
      upstream.destroy();
    };
    socket.on('error', close);
    upstream.on('error', close);
  });
  await new Promise<void>((resolve) => server.listen(port, '127.0.0.1', resolve));
  return server;
}
