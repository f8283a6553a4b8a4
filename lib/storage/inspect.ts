import 'server-only';
import { fileTypeFromBuffer } from 'file-type';
import sharp from 'sharp';
import { THUMBNAIL_WIDTH } from './limits';

/** The real type of a file from its first bytes (never from its name or the type the browser claimed). */
export async function sniffType(firstBytes: Buffer): Promise<{ mime: string; ext: string } | null> {
  const found = await fileTypeFromBuffer(firstBytes);
  if (!found) return null;
  // Some MP4 files carry the older brand of the same container.
  if (found.mime === 'video/x-m4v') return { mime: 'video/mp4', ext: 'mp4' };
  return { mime: found.mime, ext: found.ext };
}

/**
 * A small WebP preview of an image: turned upright by its EXIF orientation, metadata (place, device)
 * left out, never wider than the original. Also the image's upright size.
 */
export async function makeThumbnail(bytes: Buffer): Promise<{ thumbnail: Buffer; width: number; height: number }> {
  const image = sharp(bytes, { failOn: 'error' });
  const meta = await image.metadata();
  if (!meta.width || !meta.height) throw new Error('image has no size');
  const turned = (meta.orientation ?? 1) >= 5;
  const thumbnail = await image
    .rotate()
    .resize({ width: THUMBNAIL_WIDTH, withoutEnlargement: true })
    .webp({ quality: 75 })
    .toBuffer();
  return { thumbnail, width: turned ? meta.height : meta.width, height: turned ? meta.width : meta.height };
}
