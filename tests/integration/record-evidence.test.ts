import { randomUUID } from 'node:crypto';
import sharp from 'sharp';
import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { POST as requestRoute } from '@/app/api/attachments/route';
import { POST as completeRoute } from '@/app/api/attachments/[id]/complete/route';
import { GET as pdfRoute } from '@/app/r/[token]/pdf/route';
import { openReportLink } from '@/lib/report/link-access';
import { putObject } from '@/lib/storage/s3';
import { Attachment, Install } from '@/models';
import { call, jsonBody } from './helpers/call';
import { startInstall } from './helpers/installs';
import { signInAs, signOut } from './helpers/session';
import { makeInstallWorld } from './helpers/world';
import { linkToken, makeApprovedJob, pdfText } from './report-fixtures';

// Only checked evidence reaches a customer, and a closed install takes no new evidence.
// Against the real storage fake (S3_* from scripts/test.sh).

const requestUpload = (body: unknown) => call(requestRoute, '/api/attachments', {}, jsonBody('POST', body));
const complete = (id: string) => call(completeRoute, `/api/attachments/${id}/complete`, { id }, { method: 'POST' });
const pdf = (token: string) =>
  pdfRoute(new Request(`http://localhost/r/${token}/pdf`), { params: Promise.resolve({ token }) });

let png: Buffer;
beforeAll(async () => {
  png = await sharp({ create: { width: 64, height: 48, channels: 3, background: '#2a7f7a' } })
    .png()
    .toBuffer();
});
beforeEach(() => signOut());

describe('uploads to a closed install', () => {
  it('answers 409 for an approved or abandoned install and keeps no row', async () => {
    const w = await makeApprovedJob('c@example.test');
    for (const user of [w.foreman, w.office]) {
      await signInAs(user);
      const before = await Attachment.count({ where: { installId: w.installId } });
      const refused = await requestUpload({
        installId: w.installId,
        kind: 'after',
        fileName: 'late.png',
        contentType: 'image/png',
        byteSize: png.length,
      });
      expect(refused.status).toBe(409);
      expect(refused.body).toEqual({
        error: { message: 'This install is closed (approved): no more files can be added to it.' },
      });
      expect(await Attachment.count({ where: { installId: w.installId } })).toBe(before);
    }
    await Install.update({ status: 'abandoned' }, { where: { id: w.installId } });
    await signInAs(w.foreman);
    expect(
      (
        await requestUpload({
          installId: w.installId,
          kind: 'after',
          fileName: 'late.png',
          contentType: 'image/png',
          byteSize: png.length,
        })
      ).status,
    ).toBe(409);
  });

  it('refuses to complete, after approval, an upload asked for before it', async () => {
    const w = await makeInstallWorld('Late');
    await signInAs(w.foreman);
    const installId = await startInstall(w);
    const asked = await requestUpload({
      installId,
      kind: 'after',
      fileName: 'slow.png',
      contentType: 'image/png',
      byteSize: png.length,
    });
    expect(asked.status).toBe(201);
    const put = await fetch(asked.body.upload.url, {
      method: 'PUT',
      headers: asked.body.upload.headers,
      body: new Uint8Array(png),
    });
    expect(put.ok).toBe(true);
    await Install.update({ status: 'approved' }, { where: { id: installId } });
    const refused = await complete(asked.body.attachment.id);
    expect(refused.status).toBe(409);
    expect((await Attachment.findByPk(asked.body.attachment.id))!.status).toBe('pending');
  });
});

describe('the customer report', () => {
  it('shows only ready images: the report data behind the page and e-mail, and the PDF', async () => {
    const w = await makeApprovedJob('c@example.test');
    const stored = async (status: 'ready' | 'pending', caption: string) => {
      const id = randomUUID();
      const storageKey = `${w.company.id}/${w.job.id}/${id}.png`;
      await putObject(storageKey, png, 'image/png');
      await Attachment.create({
        id,
        companyId: w.company.id,
        jobId: w.job.id,
        repairId: w.repair.id,
        installId: w.installId,
        kind: 'after',
        storageKey,
        contentType: 'image/png',
        byteSize: png.length,
        originalName: `${caption}.png`,
        caption,
        uploadedById: w.foreman.id,
        status,
      });
      return id;
    };
    const ready = await stored('ready', 'Checked far end');
    const pending = await stored('pending', 'Unchecked upload');

    const token = await linkToken(w.job.id, w.company.id);
    const access = await openReportLink(token);
    if (!access.ok) throw new Error(`refused: ${access.status}`);
    const shown = [...access.data.repairs.flatMap((r) => r.images), ...access.data.jobImages].map((image) => image.id);
    expect(shown).toEqual([ready]);
    expect(shown).not.toContain(pending);

    const response = await pdf(token);
    expect(response.status).toBe(200);
    const text = await pdfText(Buffer.from(await response.arrayBuffer()));
    expect(text).toContain('Checked far end');
    expect(text).not.toContain('Unchecked upload');
  });
});
