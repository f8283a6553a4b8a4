import 'server-only';
import { randomUUID } from 'node:crypto';
import { Op, type InferAttributes } from 'sequelize';
import { Attachment, Install, Job, Repair, User } from '@/models';
import { sequelize } from '@/lib/data/db';
import { recordAudit } from '@/lib/data/audit';
import { isDeskRole } from '@/lib/auth/roles';
import type { SessionUser } from '@/lib/auth/session';
import { AppError, forbidden, notFound, refused } from '@/lib/server/errors';
import { refusal, type Refusal } from '@/lib/i18n/refusals';
import { mayWorkOn } from '@/lib/install/access';
import { isClosedInstall } from '@/lib/install/record-rules';
import { makeThumbnail, sniffType } from '@/lib/storage/inspect';
import {
  MAX_BYTES,
  PENDING_UPLOAD_MAX_AGE_MS,
  SNIFF_BYTES,
  allowedType,
  allowedTypes,
  formatBytes,
  objectKey,
  refusalOf,
  thumbnailKey,
} from '@/lib/storage/limits';
import { deleteObjects, headObject, presignUpload, putObject, readObject, signedDownloadUrl } from '@/lib/storage/s3';
import type { AttachmentListQuery, UploadRequest } from '@/lib/validation/attachments';

const ENTITY = 'attachment';
/** Once signed off (and until sent back) an install's evidence is the office's to change. */
const LOCKED_INSTALL_STATUSES = ['awaiting_review', 'approved'];

type AttachmentRow = InferAttributes<Attachment>;
export type EvidenceItem = Awaited<ReturnType<typeof itemOf>>;

export type UploadRequestResponse = Awaited<ReturnType<typeof requestUpload>>;

/**
 * Step 1 of an upload: checks who may add evidence to the repair or install, keeps a pending row and
 * answers with a presigned PUT that only takes the declared type and size. The key is ours, not the file name.
 */
export async function requestUpload(user: SessionUser, input: UploadRequest) {
  const target = await targetOf(user, input);
  refuseClosedInstall(target.installStatus);
  const id = randomUUID();
  const storageKey = objectKey(user.companyId, target.jobId, id, input.contentType);
  await Attachment.create({
    id,
    companyId: user.companyId,
    jobId: target.jobId,
    repairId: target.repairId,
    installId: target.installId,
    kind: input.kind,
    storageKey,
    contentType: input.contentType,
    byteSize: input.byteSize,
    originalName: input.fileName,
    caption: input.caption ?? null,
    uploadedById: user.id,
    status: 'pending',
  });
  return {
    attachment: { id, status: 'pending' as const },
    upload: await presignUpload(storageKey, input.contentType, input.byteSize),
  };
}

export type CompleteUploadResponse = Awaited<ReturnType<typeof completeUpload>>;

/**
 * Step 2: the server looks at what really arrived. Wrong size or a type we do not take → the object and
 * the row are deleted and the answer is a 422; an image gets its thumbnail; the row becomes ready.
 */
export async function completeUpload(user: SessionUser, id: string) {
  const row = await Attachment.findOne({ where: { id, companyId: user.companyId } });
  if (!row) throw notFound('Attachment');
  if (!isDeskRole(user.role) && row.uploadedById !== user.id)
    throw forbidden('Only whoever uploaded the file can complete it.');
  if (row.status === 'ready') return itemOf(user, row.get({ plain: true }), null);
  // An upload asked for before approval and finished after it would slip into the customer's report.
  if (row.installId)
    refuseClosedInstall(
      (await Install.findOne({ where: { id: row.installId, companyId: user.companyId }, attributes: ['status'] }))
        ?.status,
    );

  const head = await headObject(row.storageKey);
  if (!head) throw refused(409, refusal('uploadMissing'));
  if (head.byteSize !== row.byteSize) {
    await refuse(
      row,
      refusal('uploadSize', { arrived: formatBytes(head.byteSize), declared: formatBytes(row.byteSize) }),
    );
  }
  const sniffed = await sniffType(await readObject(row.storageKey, SNIFF_BYTES));
  const type = sniffed && allowedType(sniffed.mime);
  if (!sniffed || !type) {
    const what = sniffed ? refusal('fileOfType', { ext: sniffed.ext.toUpperCase() }) : refusal('unreadableFile');
    await refuse(
      row,
      refusal('uploadType', { name: row.originalName ?? refusal('thisFile'), what, allowed: allowedTypes() }),
    );
  }
  const tooLarge = refusalOf(type!.mime, head.byteSize);
  if (tooLarge?.kind === 'size') {
    const sizes = { size: formatBytes(tooLarge.size), max: formatBytes(MAX_BYTES[tooLarge.type]) };
    await refuse(row, refusal(tooLarge.type === 'image' ? 'imageTooLarge' : 'videoTooLarge', sizes));
  }

  let picture: { thumbnailKey: string; width: number; height: number } | null = null;
  if (type!.kind === 'image') {
    let made;
    try {
      made = await makeThumbnail(await readObject(row.storageKey));
    } catch {
      await refuse(
        row,
        refusal('imageUnreadable', { name: row.originalName ?? refusal('thisImage'), format: type!.name }),
      );
    }
    const key = thumbnailKey(row.companyId, row.jobId!, row.id);
    await putObject(key, made!.thumbnail, 'image/webp');
    picture = { thumbnailKey: key, width: made!.width, height: made!.height };
  }

  const ready = await sequelize.transaction(async (transaction) => {
    const changes = {
      status: 'ready' as const,
      contentType: type!.mime,
      byteSize: head.byteSize,
      thumbnailKey: picture?.thumbnailKey ?? null,
      width: picture?.width ?? null,
      height: picture?.height ?? null,
    };
    // Only a pending row: a second complete racing this one changes nothing.
    const [count] = await Attachment.update(changes, {
      where: { id: row.id, companyId: user.companyId, status: 'pending' },
      transaction,
    });
    if (count === 1) {
      await recordAudit(
        user,
        {
          action: 'upload',
          entityType: ENTITY,
          entityId: row.id,
          changes: {
            kind: row.kind,
            originalName: row.originalName,
            contentType: type!.mime,
            byteSize: head.byteSize,
            repairId: row.repairId,
            installId: row.installId,
            jobId: row.jobId,
          },
        },
        transaction,
      );
    }
    return Attachment.findOne({ where: { id: row.id, companyId: user.companyId }, transaction });
  });
  if (!ready) throw notFound('Attachment');
  return itemOf(user, ready.get({ plain: true }), null);
}

export type AttachmentListResponse = Awaited<ReturnType<typeof listAttachments>>;

/** The ready evidence of a repair, an install or a job, each with short-lived links to the file and its thumbnail. */
export async function listAttachments(user: SessionUser, query: AttachmentListQuery) {
  await targetOf(user, query);
  const where = query.installId
    ? { installId: query.installId }
    : query.repairId
      ? { repairId: query.repairId }
      : { jobId: query.jobId! };
  const rows = await Attachment.findAll({
    where: { ...where, companyId: user.companyId, status: 'ready' },
    include: [
      { model: User, as: 'uploadedBy', attributes: ['name'] },
      { model: Install, as: 'install', attributes: ['status'] },
    ],
    order: [
      ['createdAt', 'ASC'],
      ['id', 'ASC'],
    ],
  });
  const items = await Promise.all(
    rows.map((row) => {
      const { uploadedBy, install, ...columns } = row.get({ plain: true }) as AttachmentRow & {
        uploadedBy?: { name: string } | null;
        install?: { status: string } | null;
      };
      return itemOf(user, columns, install?.status ?? null, uploadedBy?.name ?? null);
    }),
  );
  return { items, total: items.length };
}

/** Removes the file, its thumbnail and the row (audited). The office may always; the uploader until the install is signed off. */
export async function deleteAttachment(user: SessionUser, id: string, reason?: string | null) {
  const row = await Attachment.findOne({
    where: { id, companyId: user.companyId },
    include: [
      { model: Install, as: 'install', attributes: ['status', 'crewId'] },
      { model: Job, as: 'job', attributes: ['crewId'] },
    ],
  });
  if (!row) throw notFound('Attachment');
  const { install, job } = row as Attachment & {
    install?: Pick<Install, 'status' | 'crewId'> | null;
    job?: Pick<Job, 'crewId'> | null;
  };
  if (!isDeskRole(user.role)) {
    if (!mayWorkOn(user, [install?.crewId, job?.crewId])) throw forbidden('This file belongs to another crew’s job.');
    if (row.uploadedById !== user.id) throw forbidden('Only the office or whoever uploaded the file can remove it.');
    if (install && LOCKED_INSTALL_STATUSES.includes(install.status))
      throw new AppError(409, 'This install is signed off: ask the office to remove the file.');
  }
  await sequelize.transaction(async (transaction) => {
    await Attachment.destroy({ where: { id: row.id, companyId: user.companyId }, transaction });
    await recordAudit(
      user,
      {
        action: 'delete',
        entityType: ENTITY,
        entityId: row.id,
        reason,
        changes: {
          kind: row.kind,
          originalName: row.originalName,
          caption: row.caption,
          repairId: row.repairId,
          installId: row.installId,
          jobId: row.jobId,
        },
      },
      transaction,
    );
    // Last, inside the transaction: if storage fails the row stays and the delete can be tried again.
    await deleteObjects([row.storageKey, row.thumbnailKey]);
  });
  return { id: row.id, deleted: true };
}

/**
 * Housekeeping (any company): uploads requested but never completed within an hour are removed with
 * whatever bytes reached storage, in batches until none is left. Returns how many went. Meant for a
 * periodic queue job; a storage failure throws, leaving the rows for the next run.
 */
export async function sweepPendingUploads(now = new Date(), maxAgeMs = PENDING_UPLOAD_MAX_AGE_MS) {
  const cutoff = new Date(now.getTime() - maxAgeMs);
  let swept = 0;
  for (;;) {
    const stale = await Attachment.findAll({
      where: { status: 'pending', createdAt: { [Op.lt]: cutoff } },
      order: [['createdAt', 'ASC']],
      limit: SWEEP_BATCH,
    });
    const before = swept;
    for (const row of stale) {
      // Locked and still pending, or skipped: a completion racing the sweep wins, and a second sweeper passes by.
      swept += await sequelize.transaction(async (transaction) => {
        const locked = await Attachment.findOne({
          where: { id: row.id, status: 'pending' },
          lock: transaction.LOCK.UPDATE,
          skipLocked: true,
          transaction,
        });
        if (!locked) return 0;
        await deleteObjects([locked.storageKey, locked.thumbnailKey]);
        return Attachment.destroy({ where: { id: locked.id }, transaction });
      });
    }
    if (stale.length < SWEEP_BATCH || swept === before) return swept;
  }
}

const SWEEP_BATCH = 200;

type Target = { jobId: string; repairId: string | null; installId: string | null; installStatus: string | null };

/** The job a repair, install or job id names, if the caller's company owns it (404) and their crew works it (403). */
async function targetOf(
  user: SessionUser,
  ref: { repairId?: string; installId?: string; jobId?: string },
): Promise<Target> {
  let target: Target;
  let crewIds: (string | null)[];
  if (ref.installId) {
    const install = await Install.findOne({
      where: { id: ref.installId, companyId: user.companyId },
      include: [{ model: Job, as: 'job', attributes: ['crewId'] }],
    });
    if (!install) throw notFound('Install');
    target = { jobId: install.jobId, repairId: install.repairId, installId: install.id, installStatus: install.status };
    crewIds = [install.crewId ?? null, (install as Install & { job?: Pick<Job, 'crewId'> }).job?.crewId ?? null];
  } else if (ref.repairId) {
    const repair = await Repair.findOne({
      where: { id: ref.repairId, companyId: user.companyId },
      include: [{ model: Job, as: 'job', attributes: ['crewId'] }],
    });
    if (!repair) throw notFound('Repair');
    target = { jobId: repair.jobId, repairId: repair.id, installId: null, installStatus: null };
    crewIds = [(repair as Repair & { job?: Pick<Job, 'crewId'> }).job?.crewId ?? null];
  } else {
    const job = await Job.findOne({
      where: { id: ref.jobId!, companyId: user.companyId },
      attributes: ['id', 'crewId'],
    });
    if (!job) throw notFound('Job');
    target = { jobId: job.id, repairId: null, installId: null, installStatus: null };
    crewIds = [job.crewId ?? null];
  }
  if (!mayWorkOn(user, crewIds)) throw forbidden('This job belongs to another crew.');
  return target;
}

/** An approved or abandoned install's evidence is closed: nothing new is added to it (409). */
function refuseClosedInstall(status: string | null | undefined) {
  if (status && isClosedInstall(status)) throw refused(409, refusal('uploadClosed', { status }));
}

/** Deletes what arrived and the row, then answers 422: a refused upload leaves nothing behind. */
async function refuse(row: Attachment, why: Refusal): Promise<never> {
  await deleteObjects([row.storageKey, row.thumbnailKey]);
  await Attachment.destroy({ where: { id: row.id, companyId: row.companyId } });
  throw refused(422, why);
}

async function itemOf(
  user: SessionUser,
  row: AttachmentRow,
  installStatus: string | null,
  uploadedByName: string | null = null,
) {
  const [url, thumbnailUrl] = await Promise.all([
    signedDownloadUrl(row.storageKey, row.contentType),
    row.thumbnailKey ? signedDownloadUrl(row.thumbnailKey, 'image/webp') : null,
  ]);
  const locked = !!installStatus && LOCKED_INSTALL_STATUSES.includes(installStatus);
  return {
    id: row.id,
    status: row.status,
    kind: row.kind,
    caption: row.caption,
    originalName: row.originalName,
    contentType: row.contentType,
    media: allowedType(row.contentType)?.kind ?? 'other',
    byteSize: row.byteSize,
    width: row.width,
    height: row.height,
    jobId: row.jobId,
    repairId: row.repairId,
    installId: row.installId,
    uploadedById: row.uploadedById,
    uploadedByName,
    createdAt: row.createdAt,
    url,
    thumbnailUrl,
    canDelete: isDeskRole(user.role) || (row.uploadedById === user.id && !locked),
  };
}
