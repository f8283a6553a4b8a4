import 'server-only';
import { GetObjectCommand, S3Client } from '@aws-sdk/client-s3';
import { env } from '@/lib/env';

// Before/after/inspection images for the report. The bytes live in object storage (S3_* settings);
// an image that cannot be read is left out rather than failing the whole report.

export type ReportImage = {
  id: string;
  kind: string;
  caption: string | null;
  repairId: string | null;
  installId: string | null;
  format: 'png' | 'jpg';
  data: Buffer;
};

type AttachmentRow = {
  id: string; kind: string; caption: string | null; repairId: string | null; installId: string | null;
  contentType: string; storageKey: string; thumbnailKey: string | null;
};

const FORMATS: Record<string, 'png' | 'jpg'> = { 'image/png': 'png', 'image/jpeg': 'jpg' };
/** Enough for a report; the rest stay in the office record. */
const MAX_IMAGES = 12;
const MAX_BYTES = 8 * 1024 * 1024;

export async function loadReportImages(attachments: readonly AttachmentRow[]): Promise<ReportImage[]> {
  const usable = attachments.filter((a) => FORMATS[a.contentType]).slice(0, MAX_IMAGES);
  if (usable.length === 0) return [];
  const images = await Promise.all(
    usable.map(async (a) => {
      const data = await fetchImageBytes(a.storageKey);
      return data ? { id: a.id, kind: a.kind, caption: a.caption, repairId: a.repairId, installId: a.installId, format: FORMATS[a.contentType], data } : null;
    }),
  );
  return images.filter((image): image is ReportImage => image !== null);
}

/** The stored bytes of one object, or null when storage is not configured or the read fails. */
export async function fetchImageBytes(key: string): Promise<Buffer | null> {
  const bucket = env().S3_BUCKET;
  if (!bucket || !env().S3_ENDPOINT) return null;
  try {
    const answer = await client().send(new GetObjectCommand({ Bucket: bucket, Key: key }));
    const bytes = Buffer.from((await answer.Body?.transformToByteArray()) ?? []);
    return bytes.length > 0 && bytes.length <= MAX_BYTES ? bytes : null;
  } catch (error) {
    console.error('report image not readable', key, error instanceof Error ? error.message : error);
    return null;
  }
}

function client() {
  const e = env();
  return new S3Client({
    endpoint: e.S3_ENDPOINT,
    region: e.S3_REGION ?? 'us-east-1',
    forcePathStyle: true,
    credentials: { accessKeyId: e.S3_ACCESS_KEY_ID ?? '', secretAccessKey: e.S3_SECRET_ACCESS_KEY ?? '' },
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
  });
}
