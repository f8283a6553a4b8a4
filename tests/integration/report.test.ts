import { createServer } from 'node:net';
import { randomUUID } from 'node:crypto';
import { simpleParser } from 'mailparser';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GET as previewRoute, POST as sendRoute } from '@/app/api/jobs/[id]/report/route';
import { GET as sendsRoute } from '@/app/api/jobs/[id]/report-sends/route';
import { AuditEntry, Job, Repair, ReportSend } from '@/models';
import { stopBoss } from '@/lib/queue/boss';
import { startReportWorker } from '@/lib/queue/worker';
import { verifyReportLink } from '@/lib/report/link';
import { call, jsonBody } from './helpers/call';
import { signInAs } from './helpers/session';
import { makeWorld } from './helpers/world';
import { eventually, makeApprovedJob, pdfText } from './report-fixtures';

const MAIL = process.env.MAIL_WEB_URL;
const send = (jobId: string, body: unknown) =>
  call(sendRoute, `/api/jobs/${jobId}/report`, { id: jobId }, jsonBody('POST', body));
const sends = (jobId: string) => call(sendsRoute, `/api/jobs/${jobId}/report-sends`, { id: jobId });
const statusOf = async (id: string, wanted: string) => {
  const row = await ReportSend.findByPk(id);
  return row?.status === wanted ? row : undefined;
};

let worker: { stop: () => Promise<void> };
beforeAll(async () => {
  if (!MAIL || !process.env.SMTP_PORT)
    throw new Error('Start the service fakes first (scripts/test.sh does; see scripts/fakes.sh)');
  // Short retries so a failing send gives up within seconds.
  process.env.REPORT_RETRY_LIMIT = '2';
  process.env.REPORT_RETRY_DELAY_SECONDS = '1';
  worker = await startReportWorker({ pollingIntervalSeconds: 0.5 });
});
afterAll(async () => {
  await worker?.stop();
  await stopBoss();
});

describe('POST /api/jobs/:id/report', () => {
  it('queues the report, the worker mails it with the PDF, the send log goes queued → sent and the job → reported', async () => {
    const to = `customer-${randomUUID().slice(0, 8)}@example.test`;
    const w = await makeApprovedJob(to);
    await signInAs(w.office);
    const { status, body } = await send(w.job.id, { message: 'Thank you for your patience during the work.' });
    expect(status).toBe(202);
    expect(body).toMatchObject({ status: 'queued', toAddress: to, attempts: 0, jobId: w.job.id });

    const row = await eventually(() => statusOf(body.id, 'sent'), 20_000, 'the send to go out');
    expect(row.attempts).toBe(1);
    expect(row.messageId).toBeTruthy();
    expect((await Job.findByPk(w.job.id))?.status).toBe('reported');

    const listed = await eventually(
      async () => {
        const messages = (await (await fetch(`${MAIL}/messages`)).json()) as { id: string; to: string }[];
        return messages.find((m) => m.to.includes(to));
      },
      10_000,
      'the message in the mailbox',
    );
    const raw = Buffer.from(await (await fetch(`${MAIL}/messages/${listed.id}.eml`)).arrayBuffer());
    const mail = await simpleParser(raw);
    expect(mail.subject).toContain(w.job.number);
    expect(mail.text).toContain('Thank you for your patience');
    const attachment = mail.attachments.find((a) => a.contentType === 'application/pdf');
    expect(attachment?.filename).toBe(`repair-report-${w.job.number}.pdf`);

    const text = await pdfText(attachment!.content);
    expect(text).toContain(w.job.number);
    expect(text).toContain('1 Test Street, Testville');
    expect(text).toContain('35.8 in'); // the 910 mm patch in the company's imperial units (910 / 25.4 = 35.83)
    expect(text).toContain(w.resinKit.lot);
    expect(text).toContain('Confined space');
    expect(text).toContain('Pressurised packer');
    expect(text).toContain('licensed professional');

    // The link in the e-mail is signed for this job and company.
    const token = /\/r\/([\w-]+\.[\w-]+)/.exec(mail.text ?? '')?.[1];
    const check = verifyReportLink(token ?? '');
    expect(check).toMatchObject({ ok: true, jobId: w.job.id, companyId: w.company.id });
    expect(mail.html).toContain(`/r/${token}`);

    const log = await sends(w.job.id);
    expect(log.status).toBe(200);
    expect(log.body.items).toEqual([
      expect.objectContaining({ id: body.id, status: 'sent', attempts: 1, sentByName: w.office.name }),
    ]);
    const audit = await AuditEntry.findAll({
      where: { entityId: w.job.id, companyId: w.company.id },
      order: [['createdAt', 'ASC']],
    });
    expect(audit.map((a) => a.action)).toEqual(expect.arrayContaining(['report_requested', 'report_sent']));
  });

  it('records each failed try and marks the send failed after the retries when SMTP cannot be reached', async () => {
    const w = await makeApprovedJob(`nobody-${randomUUID().slice(0, 8)}@example.test`);
    await signInAs(w.office);
    const port = await closedPort();
    const saved = process.env.SMTP_PORT;
    process.env.SMTP_PORT = String(port);
    try {
      const { status, body } = await send(w.job.id, {});
      expect(status).toBe(202);
      const row = await eventually(() => statusOf(body.id, 'failed'), 25_000, 'the send to give up');
      expect(row.attempts).toBe(3); // the first try and REPORT_RETRY_LIMIT = 2 retries
      expect(row.lastError).toMatch(/ECONNREFUSED|connect/i);
      expect((await Job.findByPk(w.job.id))?.status).toBe('approved');
    } finally {
      process.env.SMTP_PORT = saved;
    }
  }, 40_000);

  it('answers 409 while the job is not approved, naming the reason', async () => {
    const w = await makeWorld('Report');
    await w.customer.update({ email: 'c@example.test' });
    await signInAs(w.office);
    const { status, body } = await send(w.job.id, {});
    expect(status).toBe(409);
    expect(body.error.message).toMatch(/every install .* approved.*scheduled/);
    expect(await ReportSend.count({ where: { jobId: w.job.id } })).toBe(0);
  });

  it('answers 409 when a repair of an approved job has no approved install', async () => {
    const w = await makeApprovedJob('c@example.test');
    await Repair.create({
      companyId: w.company.id,
      jobId: w.job.id,
      segmentId: w.segment.id,
      position: 2,
      distanceMm: 20000,
      defectType: 'hole',
      conditionGrade: 3,
      defectLengthMm: 100,
    });
    await signInAs(w.office);
    const { status, body } = await send(w.job.id, {});
    expect(status).toBe(409);
    expect(body.error.message).toContain('Repair 2');
  });

  it('answers 422 without a customer e-mail and without `to`, and sends to `to` when given', async () => {
    const w = await makeApprovedJob(null);
    await signInAs(w.office);
    const refused = await send(w.job.id, {});
    expect(refused.status).toBe(422);
    expect(refused.body.error.fields.to).toBeDefined();
    expect(await ReportSend.count({ where: { jobId: w.job.id } })).toBe(0);
    const given = await send(w.job.id, { to: 'Someone@Example.test' });
    expect(given.status).toBe(202);
    expect(given.body.toAddress).toBe('someone@example.test');
  });

  it('answers 400 with field messages for a bad body and changes nothing', async () => {
    const w = await makeApprovedJob('c@example.test');
    await signInAs(w.office);
    const bad = await send(w.job.id, { to: 'not an address', message: 7, extra: true });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(expect.arrayContaining(['to', 'message']));
    expect((await send(w.job.id, 'not json')).status).toBe(400);
    expect(await ReportSend.count({ where: { jobId: w.job.id } })).toBe(0);
  });

  it('is for the office only (403 for field roles) and never for another company’s job (404)', async () => {
    const w = await makeApprovedJob('c@example.test');
    await signInAs(w.foreman);
    expect((await send(w.job.id, {})).status).toBe(403);
    expect((await sends(w.job.id)).status).toBe(403);
    await signInAs(w.technician);
    expect((await send(w.job.id, {})).status).toBe(403);

    const other = await makeWorld('Other');
    await signInAs(other.office);
    expect((await send(w.job.id, {})).status).toBe(404);
    expect((await sends(w.job.id)).status).toBe(404);
    expect((await call(previewRoute, `/api/jobs/${w.job.id}/report`, { id: w.job.id })).status).toBe(404);
    expect((await send('not-a-uuid', {})).status).toBe(404);
    expect(await ReportSend.count({ where: { jobId: w.job.id } })).toBe(0);
  });

  it('lets the office preview the PDF', async () => {
    const w = await makeApprovedJob('c@example.test');
    await signInAs(w.office);
    const response = await previewRoute(new Request(`http://localhost/api/jobs/${w.job.id}/report`), {
      params: Promise.resolve({ id: w.job.id }),
    });
    expect(response.status).toBe(200);
    expect(response.headers.get('content-type')).toBe('application/pdf');
    const text = await pdfText(Buffer.from(await response.arrayBuffer()));
    expect(text).toContain(`Job ${w.job.number}`);
    expect(text).toContain('MH-1 -> MH-2');
  });
});

/** A loopback port with nothing listening on it. */
async function closedPort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as { port: number };
  await new Promise((resolve) => server.close(resolve));
  return port;
}
