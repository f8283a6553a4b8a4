import 'server-only';
import { headObject, readObject } from '@/lib/storage/s3';

// Before/after/inspection images for the report. The bytes live in object storage, read through the one
// storage client of lib/storage (its settings: endpoint, region, path style); an image that cannot be read
// is left out rather than failing the whole report.

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
  id: string;
  kind: string;
  caption: string | null;
  repairId: string | null;
  installId: string | null;
  contentType: string;
  storageKey: string;
  thumbnailKey: string | null;
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
      return data
        ? {
            id: a.id,
            kind: a.kind,
            caption: a.caption,
            repairId: a.repairId,
            installId: a.installId,
            format: FORMATS[a.contentType],
            data,
          }
        : null;
    }),
  );
  return images.filter((image): image is ReportImage => image !== null);
}

/** The stored bytes of one object, or null when it is missing, too large for a report or not readable. */
async function fetchImageBytes(key: string): Promise<Buffer | null> {
  try {
    const head = await headObject(key);
    if (!head || head.byteSize === 0 || head.byteSize > MAX_BYTES) return null;
    return await readObject(key);
  } catch (error) {
    console.error('report image not readable', key, error instanceof Error ? error.message : error);
    return null;
  }
}
