import { z } from 'zod';
import { ATTACHMENT_KINDS } from '@/lib/domain/vocabulary';
import { ALLOWED_SUMMARY, allowedType, uploadRefusal } from '@/lib/storage/limits';
import { optionalText, uuidSchema } from './common';

/** What the browser declares before it uploads a file: the server checks it again against the stored bytes. */
export const uploadRequestSchema = z
  .strictObject({
    repairId: uuidSchema.optional(),
    installId: uuidSchema.optional(),
    kind: z.enum(ATTACHMENT_KINDS, { error: `kind is one of ${ATTACHMENT_KINDS.join(', ')}` }),
    fileName: z.string().trim().min(1, 'Name the file').max(255, 'At most 255 characters'),
    contentType: z
      .string()
      .trim()
      .toLowerCase()
      .refine((type) => !!allowedType(type), { error: `Send ${ALLOWED_SUMMARY}.` }),
    byteSize: z.number({ error: 'byteSize is the file size in bytes' }).int().positive('The file is empty'),
    caption: optionalText(300),
  })
  .superRefine((input, ctx) => {
    if (!!input.repairId === !!input.installId) {
      ctx.addIssue({ code: 'custom', path: ['repairId'], message: 'Name either a repair or an install' });
    }
    const refusal = allowedType(input.contentType) ? uploadRefusal(input.contentType, input.byteSize) : null;
    if (refusal) ctx.addIssue({ code: 'custom', path: ['byteSize'], message: refusal });
  });
export type UploadRequest = z.infer<typeof uploadRequestSchema>;

/** Whose evidence to list: exactly one of a repair, an install or a job. */
export const attachmentListQuerySchema = z
  .strictObject({
    repairId: uuidSchema.optional(),
    installId: uuidSchema.optional(),
    jobId: uuidSchema.optional(),
  })
  .refine((q) => [q.repairId, q.installId, q.jobId].filter(Boolean).length === 1, {
    error: 'Name one of repairId, installId or jobId',
    path: ['repairId'],
  });
export type AttachmentListQuery = z.infer<typeof attachmentListQuerySchema>;

/** `DELETE /api/attachments/:id?reason=`: why, for the audit trail. */
export const attachmentDeleteQuerySchema = z.strictObject({ reason: optionalText(500) });
