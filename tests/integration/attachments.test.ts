import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import sharp from 'sharp';
import { GET as listRoute, POST as requestRoute } from '@/app/api/attachments/route';
import { DELETE as deleteRoute } from '@/app/api/attachments/[id]/route';
import { POST as completeRoute } from '@/app/api/attachments/[id]/complete/route';
import { sweepPendingUploads } from '@/lib/data/attachments';
import { headObject, putObject, readObject } from '@/lib/storage/s3';
import { Attachment, AuditEntry, Install } from '@/models';
import { makeInstallWorld, type InstallWorld } from './helpers/world';
import { signInAs, signOut } from './helpers/session';
import { call, jsonBody } from './helpers/call';
import { startInstall } from './helpers/installs';

// Against the real storage fake over sockets (S3_* from scripts/test.sh), which checks signatures.
const requestUpload = (body: unknown) => call(requestRoute, '/api/attachments', {}, jsonBody('POST', body));
const complete = (id: string) => call(completeRoute, `/api/attachments/${id}/complete`, { id }, { method: 'POST' });
const list = (query: string) => call(listRoute, `/api/attachments?${query}`);
const remove = (id: string) => call(deleteRoute, `/api/attachments/${id}`, { id }, { method: 'DELETE' });

type Upload = { url: string; method: 'PUT'; headers: Record<string, string> };
const put = (upload: Upload, bytes: Buffer, headers = upload.headers) =>
  fetch(upload.url, { method: 'PUT', headers, body: new Uint8Array(bytes) });

/** Request, PUT the bytes to the presigned URL, and hand back the id, key and the storage's answer. */
async function send(body: Record<string, unknown>, bytes: Buffer) {
  const requested = await requestUpload({ byteSize: bytes.length, ...body });
  expect(requested.status, JSON.stringify(requested.body)).toBe(201);
  const id: string = requested.body.attachment.id;
  const row = await Attachment.findByPk(id);
  const stored = await put(requested.body.upload, bytes);
  return { id, key: row!.storageKey, stored, upload: requested.body.upload as Upload };
}

/** Nothing of a refused upload may remain: no row, no object, no thumbnail. */
async function expectNothingStored(id: string, key: string) {
  expect(await Attachment.count({ where: { id } })).toBe(0);
  expect(await headObject(key)).toBeNull();
  expect(await headObject(key.replace(/\/([^/]+)\.\w+$/, '/thumbs/$1.webp'))).toBeNull();
}

let png: Buffer;
let jpeg: Buffer;

describe('attachments: presigned upload, server-side check, signed links', () => {
  let a: InstallWorld;
  let b: InstallWorld;
  let installId: string;
  beforeAll(async () => {
    [a, b] = await Promise.all([makeInstallWorld('Alpha'), makeInstallWorld('Beta')]);
    await signInAs(a.foreman);
    installId = await startInstall(a);
    png = await sharp({ create: { width: 800, height: 600, channels: 3, background: '#2a7f7a' } })
      .png()
      .toBuffer();
    // Stored landscape with EXIF "rotate 90° clockwise to view", as a tablet held upright writes it.
    jpeg = await sharp({ create: { width: 1200, height: 900, channels: 3, background: '#c05020' } })
      .jpeg({ quality: 80 })
      .withMetadata({ orientation: 6 })
      .toBuffer();
  });
  beforeEach(() => signOut());

  it('answers 401 without a session', async () => {
    expect((await requestUpload({})).status).toBe(401);
    expect((await list(`repairId=${a.repair.id}`)).status).toBe(401);
  });

  it('uploads a PNG to an install: pending, then ready with a 320 px WebP thumbnail in the bucket', async () => {
    await signInAs(a.technician);
    const { id, key, stored } = await send(
      { installId, kind: 'inspection', fileName: 'Patch end.png', contentType: 'image/png', caption: 'Downstream end' },
      png,
    );
    expect(stored.status).toBe(200);
    expect(key).toMatch(new RegExp(`^${a.company.id}/${a.job.id}/${id}\\.png$`));
    expect((await Attachment.findByPk(id))!.status).toBe('pending');

    const done = await complete(id);
    expect(done.status, JSON.stringify(done.body)).toBe(200);
    expect(done.body).toMatchObject({
      id,
      status: 'ready',
      contentType: 'image/png',
      byteSize: png.length,
      width: 800,
      height: 600,
      kind: 'inspection',
      caption: 'Downstream end',
    });
    const row = (await Attachment.findByPk(id))!;
    expect(row).toMatchObject({
      status: 'ready',
      installId,
      repairId: a.repair.id,
      jobId: a.job.id,
      uploadedById: a.technician.id,
    });
    expect(row.thumbnailKey).toBe(`${a.company.id}/${a.job.id}/thumbs/${id}.webp`);
    const thumb = await readObject(row.thumbnailKey!);
    const meta = await sharp(thumb).metadata();
    expect(meta).toMatchObject({ format: 'webp', width: 320, height: 240 });
    expect(await AuditEntry.count({ where: { entityId: id, action: 'upload' } })).toBe(1);

    // Completing again (a retry after a lost answer) changes nothing.
    expect((await complete(id)).body).toMatchObject({ id, status: 'ready' });
    expect(await AuditEntry.count({ where: { entityId: id, action: 'upload' } })).toBe(1);
  });

  it('uploads a JPEG to a repair: the thumbnail is turned upright and carries no metadata', async () => {
    await signInAs(a.office);
    const { id } = await send(
      { repairId: a.repair.id, kind: 'before', fileName: 'crack.jpeg', contentType: 'image/jpeg' },
      jpeg,
    );
    const done = await complete(id);
    expect(done.status, JSON.stringify(done.body)).toBe(200);
    expect(done.body).toMatchObject({
      contentType: 'image/jpeg',
      width: 900,
      height: 1200,
      installId: null,
      repairId: a.repair.id,
    });
    const meta = await sharp(await readObject((await Attachment.findByPk(id))!.thumbnailKey!)).metadata();
    expect(meta).toMatchObject({ width: 320, height: Math.round((320 * 1200) / 900) });
    expect(meta.exif).toBeUndefined();
    expect(meta.orientation).toBeUndefined();
  });

  it('keeps a PNG named .jpg (the real type is recorded) — the bytes decide, not the name', async () => {
    await signInAs(a.foreman);
    const { id } = await send({ installId, kind: 'after', fileName: 'renamed.jpg', contentType: 'image/jpeg' }, png);
    const done = await complete(id);
    expect(done.status).toBe(200);
    expect(done.body.contentType).toBe('image/png');
  });

  it('refuses text claiming to be image/jpeg with 422 and keeps nothing', async () => {
    await signInAs(a.foreman);
    const text = Buffer.from('These are not the pixels you are looking for.\n'.repeat(20));
    const { id, key, stored } = await send(
      { installId, kind: 'inspection', fileName: 'notes.jpg', contentType: 'image/jpeg' },
      text,
    );
    expect(stored.status).toBe(200); // the storage takes any bytes of the signed size and type…
    const done = await complete(id); // …the server's look at them is what refuses
    expect(done.status).toBe(422);
    expect(done.body.error.message).toMatch(/not an image or video we can read.*JPEG, PNG or WebP/);
    await expectNothingStored(id, key);
  });

  it('words the refusal in the uploader’s language: Spanish for a Spanish technician, the same English otherwise', async () => {
    const text = Buffer.from('Not a picture.\n'.repeat(20));
    const upload = { installId, kind: 'inspection', fileName: 'notes.jpg', contentType: 'image/jpeg' };
    await a.technician.update({ locale: 'es' });
    await signInAs(a.technician);
    const spanish = await complete((await send(upload, text)).id);
    await a.technician.update({ locale: null });
    expect(spanish).toEqual({
      status: 422,
      body: {
        error: {
          message:
            'notes.jpg es algo que no es una imagen ni un vídeo legible, diga lo que diga su nombre. Envíe imágenes JPEG, ' +
            'PNG o WebP de hasta 15 MB; vídeos MP4, WebM o QuickTime de hasta 200 MB. No se guardó nada.',
        },
      },
    });
    await signInAs(a.foreman);
    expect((await complete((await send(upload, text)).id)).body.error.message).toBe(
      'notes.jpg is not an image or video we can read, whatever its name says. Send JPEG, PNG or WebP images up to ' +
        '15 MB, MP4, WebM or QuickTime videos up to 200 MB. Nothing was kept.',
    );
  });

  it('refuses a Windows program claiming to be image/jpeg with 422 naming what it really is', async () => {
    await signInAs(a.foreman);
    const exe = Buffer.alloc(2048);
    exe.write('MZ', 0, 'latin1'); // DOS header magic, then the PE header where e_lfanew (0x3c) points
    exe.writeUInt32LE(0x80, 0x3c);
    exe.write('PE\0\0', 0x80, 'latin1');
    const { id, key } = await send(
      { installId, kind: 'inspection', fileName: 'photo.jpg', contentType: 'image/jpeg' },
      exe,
    );
    const done = await complete(id);
    expect(done.status).toBe(422);
    expect(done.body.error.message).toMatch(/is a EXE file/);
    await expectNothingStored(id, key);
  });

  it('refuses a declared size over the limit, or a type we do not take, at request time with 400 and no row', async () => {
    await signInAs(a.foreman);
    const before = await Attachment.count({ where: { companyId: a.company.id } });
    const big = await requestUpload({
      installId,
      kind: 'inspection',
      fileName: 'huge.jpg',
      contentType: 'image/jpeg',
      byteSize: 15 * 1024 * 1024 + 1,
    });
    expect(big.status).toBe(400);
    expect(big.body.error.fields.byteSize[0]).toMatch(/at most 15 MB/);
    const longVideo = await requestUpload({
      installId,
      kind: 'inspection',
      fileName: 'run.mp4',
      contentType: 'video/mp4',
      byteSize: 200 * 1024 * 1024 + 1,
    });
    expect(longVideo.status).toBe(400);
    expect(longVideo.body.error.fields.byteSize[0]).toMatch(/at most 200 MB/);
    const pdf = await requestUpload({
      installId,
      kind: 'document',
      fileName: 'x.pdf',
      contentType: 'application/pdf',
      byteSize: 10,
    });
    expect(pdf.status).toBe(400);
    expect(pdf.body.error.fields.contentType).toBeDefined();
    const both = await requestUpload({
      installId,
      repairId: a.repair.id,
      kind: 'after',
      fileName: 'a.png',
      contentType: 'image/png',
      byteSize: 10,
    });
    expect(both.status).toBe(400);
    expect(await Attachment.count({ where: { companyId: a.company.id } })).toBe(before);
  });

  it('lets the storage refuse a PUT of another size or type than was signed', async () => {
    await signInAs(a.foreman);
    const requested = await requestUpload({
      installId,
      kind: 'after',
      fileName: 'a.png',
      contentType: 'image/png',
      byteSize: png.length,
    });
    const upload: Upload = requested.body.upload;
    expect((await put(upload, Buffer.concat([png, Buffer.alloc(10)]))).status).toBe(403);
    expect((await put(upload, png, { 'Content-Type': 'image/jpeg' })).status).toBe(403);
    expect(await headObject((await Attachment.findByPk(requested.body.attachment.id))!.storageKey)).toBeNull();
  });

  it('refuses at completion when the stored bytes differ from the declared size, and keeps nothing', async () => {
    await signInAs(a.foreman);
    const requested = await requestUpload({
      installId,
      kind: 'after',
      fileName: 'a.png',
      contentType: 'image/png',
      byteSize: png.length,
    });
    const id = requested.body.attachment.id;
    const key = (await Attachment.findByPk(id))!.storageKey;
    // Bytes of another size reach the key some other way than the signed PUT.
    await putObject(key, Buffer.concat([png, Buffer.alloc(64)]), 'image/png');
    const done = await complete(id);
    expect(done.status).toBe(422);
    expect(done.body.error.message).toMatch(/not the .* declared/);
    await expectNothingStored(id, key);
  });

  it('answers 409 "upload not found" when nothing was PUT, and keeps the row for a retry', async () => {
    await signInAs(a.foreman);
    const requested = await requestUpload({
      installId,
      kind: 'after',
      fileName: 'a.png',
      contentType: 'image/png',
      byteSize: png.length,
    });
    const id = requested.body.attachment.id;
    const early = await complete(id);
    expect(early.status).toBe(409);
    expect(early.body.error.message).toMatch(/upload was not found/);
    expect((await put(requested.body.upload, png)).status).toBe(200);
    expect((await complete(id)).status).toBe(200);
  });

  it("answers 404 for another company's repair or install and stores nothing", async () => {
    await signInAs(b.office);
    const before = await Attachment.count();
    expect(
      (
        await requestUpload({
          repairId: a.repair.id,
          kind: 'before',
          fileName: 'a.png',
          contentType: 'image/png',
          byteSize: 100,
        })
      ).status,
    ).toBe(404);
    expect(
      (await requestUpload({ installId, kind: 'before', fileName: 'a.png', contentType: 'image/png', byteSize: 100 }))
        .status,
    ).toBe(404);
    expect((await list(`repairId=${a.repair.id}`)).status).toBe(404);
    expect(await Attachment.count()).toBe(before);
  });

  it('answers 403 to a field user of another crew, for uploading, listing and deleting, and stores nothing', async () => {
    await signInAs(a.otherTechnician);
    const before = await Attachment.count({ where: { companyId: a.company.id } });
    expect(
      (
        await requestUpload({
          installId,
          kind: 'inspection',
          fileName: 'a.png',
          contentType: 'image/png',
          byteSize: 100,
        })
      ).status,
    ).toBe(403);
    expect(
      (
        await requestUpload({
          repairId: a.repair.id,
          kind: 'inspection',
          fileName: 'a.png',
          contentType: 'image/png',
          byteSize: 100,
        })
      ).status,
    ).toBe(403);
    expect((await list(`installId=${installId}`)).status).toBe(403);
    expect((await list(`jobId=${a.job.id}`)).status).toBe(403);
    const some = await Attachment.findOne({ where: { companyId: a.company.id, status: 'ready' } });
    expect((await remove(some!.id)).status).toBe(403);
    expect(await Attachment.count({ where: { companyId: a.company.id } })).toBe(before);
  });

  it('lists ready evidence with signed links that work, and the storage refuses a tampered link', async () => {
    await signInAs(a.technician);
    const { id } = await send({ installId, kind: 'inspection', fileName: 'listed.png', contentType: 'image/png' }, png);
    await complete(id);
    const pending = await send(
      { installId, kind: 'inspection', fileName: 'pending.png', contentType: 'image/png' },
      png,
    );

    const { status, body } = await list(`installId=${installId}`);
    expect(status).toBe(200);
    const ids = body.items.map((item: { id: string }) => item.id);
    expect(ids).toContain(id);
    expect(ids).not.toContain(pending.id);
    expect(body.total).toBe(body.items.length);
    const item = body.items.find((i: { id: string }) => i.id === id);
    expect(item).toMatchObject({
      media: 'image',
      originalName: 'listed.png',
      uploadedByName: a.technician.name,
      canDelete: true,
    });

    const file = await fetch(item.url);
    expect(file.status).toBe(200);
    expect(Buffer.from(await file.arrayBuffer()).equals(png)).toBe(true);
    const thumb = await fetch(item.thumbnailUrl);
    expect(thumb.status).toBe(200);
    expect(thumb.headers.get('content-type')).toBe('image/webp');

    const url = new URL(item.url);
    const signature = url.searchParams.get('X-Amz-Signature')!;
    url.searchParams.set('X-Amz-Signature', `${signature.slice(0, -1)}${signature.endsWith('0') ? '1' : '0'}`);
    expect((await fetch(url)).status).toBe(403);
    const otherKey = new URL(item.url.replace(`${id}.png`, `${pending.id}.png`));
    expect((await fetch(otherKey)).status).toBe(403);

    // The office sees the same evidence by repair and by job.
    await signInAs(a.office);
    expect((await list(`repairId=${a.repair.id}`)).body.items.map((i: { id: string }) => i.id)).toContain(id);
    expect((await list(`jobId=${a.job.id}`)).body.items.map((i: { id: string }) => i.id)).toContain(id);
    expect((await list('')).status).toBe(400);
    expect((await list(`repairId=${a.repair.id}&jobId=${a.job.id}`)).status).toBe(400);
  });

  it('deletes: the uploader until sign-off, never someone else in the field, the office always — object, thumbnail and row, audited', async () => {
    await signInAs(a.technician);
    const first = await send({ installId, kind: 'inspection', fileName: 'one.png', contentType: 'image/png' }, png);
    await complete(first.id);
    const second = await send({ installId, kind: 'inspection', fileName: 'two.png', contentType: 'image/png' }, png);
    await complete(second.id);
    const thumbKey = (await Attachment.findByPk(first.id))!.thumbnailKey!;

    await signInAs(a.foreman);
    expect((await remove(first.id)).status).toBe(403);

    await signInAs(a.technician);
    const gone = await remove(first.id);
    expect(gone.status).toBe(200);
    expect(gone.body).toEqual({ id: first.id, deleted: true });
    expect(await Attachment.count({ where: { id: first.id } })).toBe(0);
    expect(await headObject(first.key)).toBeNull();
    expect(await headObject(thumbKey)).toBeNull();
    expect(await AuditEntry.count({ where: { entityId: first.id, action: 'delete', userId: a.technician.id } })).toBe(
      1,
    );

    await Install.update({ status: 'awaiting_review', signedOffAt: new Date() }, { where: { id: installId } });
    const locked = await remove(second.id);
    expect(locked.status).toBe(409);
    expect(
      (await list(`installId=${installId}`)).body.items.find((i: { id: string }) => i.id === second.id).canDelete,
    ).toBe(false);

    await signInAs(a.office);
    const byOffice = await call(
      deleteRoute,
      `/api/attachments/${second.id}?reason=Duplicate%20photo`,
      { id: second.id },
      { method: 'DELETE' },
    );
    expect(byOffice.status).toBe(200);
    expect(await headObject(second.key)).toBeNull();
    expect((await AuditEntry.findOne({ where: { entityId: second.id, action: 'delete' } }))!.reason).toBe(
      'Duplicate photo',
    );
    expect((await remove(second.id)).status).toBe(404);
    expect((await remove('not-a-uuid')).status).toBe(404);
    await Install.update({ status: 'in_progress', signedOffAt: null }, { where: { id: installId } });
  });

  it('sweeps uploads left pending for over an hour, with their bytes, and leaves fresh and ready ones', async () => {
    await signInAs(a.foreman);
    const stale = await send({ installId, kind: 'after', fileName: 'stale.png', contentType: 'image/png' }, png);
    const recent = await send({ installId, kind: 'after', fileName: 'recent.png', contentType: 'image/png' }, png);
    const done = await send({ installId, kind: 'after', fileName: 'done.png', contentType: 'image/png' }, png);
    expect((await complete(done.id)).status).toBe(200);
    const now = new Date();
    const age = async (id: string, minutes: number) =>
      Attachment.sequelize!.query('UPDATE attachments SET created_at = :at WHERE id = :id', {
        replacements: { at: new Date(now.getTime() - minutes * 60_000), id },
      });
    await age(stale.id, 61);
    await age(recent.id, 59);
    await age(done.id, 24 * 60);
    expect(await sweepPendingUploads(now)).toBeGreaterThanOrEqual(1);
    expect(await Attachment.count({ where: { id: stale.id } })).toBe(0);
    expect(await headObject(stale.key)).toBeNull();
    for (const kept of [recent, done]) {
      expect(await Attachment.count({ where: { id: kept.id } })).toBe(1);
      expect(await headObject(kept.key)).not.toBeNull();
    }
  });
});
