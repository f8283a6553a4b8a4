import { describe, expect, it } from 'vitest';
import { DELETE as revokeRoute } from '@/app/api/jobs/[id]/report-links/route';
import { GET as pdfRoute } from '@/app/r/[token]/pdf/route';
import { POST as payRoute } from '@/app/r/[token]/pay/route';
import { AuditEntry, Invoice, Job, ReportLink, ReportSend } from '@/models';
import { openReportLink, refusalCompanyName, refusedLinkText } from '@/lib/report/link-access';
import { reportVersion } from '@/lib/report/pdf-cache';
import { headObject, putObject } from '@/lib/storage/s3';
import { call } from './helpers/call';
import { signInAs, signOut } from './helpers/session';
import { makeWorld } from './helpers/world';
import { linkToken, makeApprovedJob, pdfText } from './report-fixtures';

const revoke = (jobId: string) =>
  call(revokeRoute, `/api/jobs/${jobId}/report-links`, { id: jobId }, { method: 'DELETE' });
const pdf = (token: string) =>
  pdfRoute(new Request(`http://localhost/r/${token}/pdf`), { params: Promise.resolve({ token }) });
const pay = (token: string) =>
  payRoute(new Request(`http://localhost/r/${token}/pay`, { method: 'POST' }), { params: Promise.resolve({ token }) });
const REFUSED = { ok: false, status: 404, companyName: null };

describe('DELETE /api/jobs/:id/report-links', () => {
  it('revokes every earlier link: page, PDF and Pay now answer like a forged link; a link made afterwards works', async () => {
    const w = await makeApprovedJob('c@example.test');
    await Invoice.create({
      companyId: w.company.id,
      jobId: w.job.id,
      number: `INV-R-${w.job.number}`,
      status: 'issued',
      dueOn: '2026-12-31',
      subtotalCents: 5000,
      totalCents: 5000,
    });
    const first = await linkToken(w.job.id, w.company.id);
    const second = await linkToken(w.job.id, w.company.id);
    const expired = await linkToken(w.job.id, w.company.id, new Date(Date.now() - 1000));
    expect((await openReportLink(first)).ok).toBe(true);
    expect(await refusalCompanyName(expired)).toBe(w.company.name); // genuine, expired, not revoked: may name the company
    const queued = await ReportSend.create({
      companyId: w.company.id,
      jobId: w.job.id,
      toAddress: 'c@example.test',
      linkExpiresAt: new Date(Date.now() + 86_400_000),
    });

    await signInAs(w.office);
    const before = Date.now();
    const { status, body } = await revoke(w.job.id);
    expect(status).toBe(200);
    expect(Object.keys(body)).toEqual(['revokedAt']);
    expect(new Date(body.revokedAt).getTime()).toBeGreaterThanOrEqual(before - 1000);

    for (const token of [first, second]) {
      expect(await openReportLink(token)).toEqual(REFUSED);
      expect(await refusalCompanyName(token)).toBeNull();
      const file = await pdf(token);
      expect(file.status).toBe(404);
      expect(await file.text()).toBe(refusedLinkText(null));
      expect((await pay(token)).status).toBe(404);
    }
    // A revoked link that has also expired reads like any bad link too (no company named, 404 not 410).
    expect(await openReportLink(expired)).toEqual(REFUSED);
    expect(await refusalCompanyName(expired)).toBeNull();
    // A send still waiting would carry a dead link: it is stopped with a reason.
    expect(await queued.reload()).toMatchObject({ status: 'failed', lastError: expect.stringContaining('revoked') });
    const audit = await AuditEntry.findOne({
      where: { entityType: 'job', entityId: w.job.id, action: 'report_links_revoked' },
    });
    expect(audit?.userId).toBe(w.office.id);
    expect(audit?.changes).toMatchObject({ links: 3, queuedSendsStopped: 1 });

    const fresh = await linkToken(w.job.id, w.company.id);
    expect((await openReportLink(fresh)).ok).toBe(true);
    expect((await pdf(fresh)).status).toBe(200);
  });

  it('is the office’s: 401 signed out, 403 for field roles, 404 for another company’s or a malformed job id; nothing changes', async () => {
    const w = await makeApprovedJob('c@example.test');
    const token = await linkToken(w.job.id, w.company.id);
    signOut();
    expect((await revoke(w.job.id)).status).toBe(401);
    for (const user of [w.foreman, w.technician]) {
      await signInAs(user);
      expect((await revoke(w.job.id)).status).toBe(403);
    }
    const other = await makeWorld('Other');
    await signInAs(other.office);
    expect((await revoke(w.job.id)).status).toBe(404);
    expect((await revoke('not-a-uuid')).status).toBe(404);
    await signInAs(other.admin);
    expect((await revoke(w.job.id)).status).toBe(404);
    expect((await ReportLink.findAll({ where: { jobId: w.job.id } })).every((link) => link.revokedAt === null)).toBe(
      true,
    );
    expect((await openReportLink(token)).ok).toBe(true);
    await signInAs(w.admin);
    expect((await revoke(w.job.id)).status).toBe(200);
    expect(await openReportLink(token)).toEqual(REFUSED);
  });
});

describe('the customer PDF is cached per report version', () => {
  it('renders once and serves the stored file; changed report data or a new sent report makes a new version', async () => {
    const w = await makeApprovedJob('c@example.test');
    const token = await linkToken(w.job.id, w.company.id);
    const version = (await reportVersion(w.company.id, w.job.id))!;
    const key = `report-pdf/${w.company.id}/${w.job.id}/${version}.pdf`;
    expect(await headObject(key)).toBeNull();

    const first = await pdf(token);
    expect(first.status).toBe(200);
    const rendered = Buffer.from(await first.arrayBuffer());
    expect(await pdfText(rendered)).toContain(w.job.number);
    expect((await headObject(key))?.byteSize).toBe(rendered.length);
    expect(await reportVersion(w.company.id, w.job.id)).toBe(version); // stable between hits

    // Proof the second hit does not render: it answers whatever the cache holds for this version.
    const marker = Buffer.from('%PDF-1.4\n% stored copy\n');
    await putObject(key, marker, 'application/pdf');
    expect(Buffer.from(await (await pdf(token)).arrayBuffer()).equals(marker)).toBe(true);

    // The data the report shows changes: a new version, rendered afresh.
    await Job.update({ title: 'Rear lateral repair, second visit' }, { where: { id: w.job.id } });
    const changed = (await reportVersion(w.company.id, w.job.id))!;
    expect(changed).not.toBe(version);
    const again = Buffer.from(await (await pdf(token)).arrayBuffer());
    expect(again.equals(marker)).toBe(false);
    expect(await pdfText(again)).toContain(w.job.number);
    expect(await headObject(`report-pdf/${w.company.id}/${w.job.id}/${changed}.pdf`)).not.toBeNull();

    // A new report goes out: another version.
    await ReportSend.create({
      companyId: w.company.id,
      jobId: w.job.id,
      toAddress: 'c@example.test',
      linkExpiresAt: new Date(Date.now() + 86_400_000),
      status: 'sent',
      sentAt: new Date(),
    });
    expect(await reportVersion(w.company.id, w.job.id)).not.toBe(changed);
  });
});
