// What evidence may be uploaded, and how large: the one place these limits are stated.
// Shared by the zod schema (request time), the server's check of the stored bytes and the browser.
import { refusal } from '@/lib/i18n/refusals';

const MB = 1024 * 1024;

export type MediaKind = 'image' | 'video';
type AllowedType = { mime: string; ext: string; kind: MediaKind; name: string };

export const MAX_BYTES: Record<MediaKind, number> = { image: 15 * MB, video: 200 * MB };

export const ALLOWED_TYPES: readonly AllowedType[] = [
  { mime: 'image/jpeg', ext: 'jpg', kind: 'image', name: 'JPEG' },
  { mime: 'image/png', ext: 'png', kind: 'image', name: 'PNG' },
  { mime: 'image/webp', ext: 'webp', kind: 'image', name: 'WebP' },
  { mime: 'video/mp4', ext: 'mp4', kind: 'video', name: 'MP4' },
  { mime: 'video/webm', ext: 'webm', kind: 'video', name: 'WebM' },
  { mime: 'video/quicktime', ext: 'mov', kind: 'video', name: 'QuickTime' },
];

/** How long a presigned upload or a signed download link stays valid. */
export const UPLOAD_URL_SECONDS = 5 * 60;
export const DOWNLOAD_URL_SECONDS = 5 * 60;
/** Uploads never completed within this time are swept away (the presigned PUT lasts 5 minutes). */
export const PENDING_UPLOAD_MAX_AGE_MS = 60 * 60 * 1000;
/** Bytes read from the start of a stored file to tell its real type. */
export const SNIFF_BYTES = 4100;
export const THUMBNAIL_WIDTH = 320;

/** The sentence shown wherever a type is refused. */
export const ALLOWED_SUMMARY = `JPEG, PNG or WebP images up to ${MAX_BYTES.image / MB} MB, MP4, WebM or QuickTime videos up to ${MAX_BYTES.video / MB} MB`;

/** ALLOWED_SUMMARY as a refusal's nested sentence (lib/i18n/refusals.ts), for a refusal in the reader's language. */
export const allowedTypes = () =>
  refusal('allowed', { image: String(MAX_BYTES.image / MB), video: String(MAX_BYTES.video / MB) });

export const allowedType = (mime: string): AllowedType | undefined =>
  ALLOWED_TYPES.find((t) => t.mime === mime.toLowerCase());

/** The type to declare for a file the browser could not type: by its extension (the server checks the bytes anyway). */
export function typeOfFile(file: { name: string; type: string }): string {
  if (file.type) return file.type.toLowerCase();
  const ext = file.name.toLowerCase().match(/\.(\w+)$/)?.[1];
  return ALLOWED_TYPES.find((t) => t.ext === ext || (ext === 'jpeg' && t.ext === 'jpg'))?.mime ?? '';
}

export const formatBytes = (bytes: number) =>
  bytes >= MB
    ? `${(bytes / MB).toFixed(1).replace(/\.0$/, '')} MB`
    : bytes >= 1024
      ? `${Math.round(bytes / 1024)} KB`
      : `${bytes} bytes`;

export type UploadRefusal = { kind: 'type'; contentType: string } | { kind: 'size'; type: MediaKind; size: number };

/** Why a declared file may not be uploaded, as facts a screen words in its reader's language; null when it may. */
export function refusalOf(contentType: string, byteSize: number): UploadRefusal | null {
  const type = allowedType(contentType);
  if (!type) return { kind: 'type', contentType };
  if (byteSize > MAX_BYTES[type.kind]) return { kind: 'size', type: type.kind, size: byteSize };
  return null;
}

/** Why a declared file may not be uploaded (type or size), or null when it may. */
export function uploadRefusal(contentType: string, byteSize: number): string | null {
  const refusal = refusalOf(contentType, byteSize);
  if (!refusal) return null;
  if (refusal.kind === 'type')
    return `Files of type ${contentType || 'unknown'} cannot be uploaded: send ${ALLOWED_SUMMARY}.`;
  const { type, size } = refusal;
  return `This ${type} is ${formatBytes(size)}; ${type === 'image' ? 'images' : 'videos'} may be at most ${formatBytes(MAX_BYTES[type])}.`;
}

/**
 * The storage key of an upload, made by the server only: `<companyId>/<jobId>/<uuid>.<ext>`.
 * Nothing of the user's file name goes into it.
 */
export function objectKey(companyId: string, jobId: string, id: string, mime: string): string {
  const type = allowedType(mime);
  if (!type) throw new Error(`no storage key for type ${mime}`);
  return `${companyId}/${jobId}/${id}.${type.ext}`;
}

/** The key of an upload's thumbnail, beside it. */
export const thumbnailKey = (companyId: string, jobId: string, id: string) => `${companyId}/${jobId}/thumbs/${id}.webp`;
