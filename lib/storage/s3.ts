import 'server-only';
import {
  DeleteObjectCommand,
  GetObjectCommand,
  HeadObjectCommand,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3';
import { getSignedUrl } from '@aws-sdk/s3-request-presigner';
import { storageEnv, type StorageEnv } from '@/lib/env';
import { DOWNLOAD_URL_SECONDS, UPLOAD_URL_SECONDS } from './limits';

// One client per process (kept across dev hot reloads), built from the environment on first use.
const globalForStorage = globalThis as unknown as { setlineStorage?: { client: S3Client; config: StorageEnv } };

function storage() {
  if (!globalForStorage.setlineStorage) {
    const config = storageEnv();
    const client = new S3Client({
      region: config.region,
      endpoint: config.endpoint,
      forcePathStyle: config.forcePathStyle,
      credentials: { accessKeyId: config.accessKeyId, secretAccessKey: config.secretAccessKey },
      // Otherwise presigned PUTs carry a checksum of an empty body and every browser upload is refused.
      requestChecksumCalculation: 'WHEN_REQUIRED',
      responseChecksumValidation: 'WHEN_REQUIRED',
    });
    globalForStorage.setlineStorage = { client, config };
  }
  return globalForStorage.setlineStorage;
}

/**
 * A URL the browser PUTs one file to. Content-Type and Content-Length are signed, so the storage
 * refuses any other type or size; the browser must send the returned headers. (The presigner signs
 * Content-Length on its own but Content-Type only when named in signableHeaders.)
 */
export async function presignUpload(key: string, contentType: string, byteSize: number) {
  const { client, config } = storage();
  const url = await getSignedUrl(
    client,
    new PutObjectCommand({ Bucket: config.bucket, Key: key, ContentType: contentType, ContentLength: byteSize }),
    { expiresIn: UPLOAD_URL_SECONDS, signableHeaders: new Set(['content-type', 'content-length']) },
  );
  return { url, method: 'PUT' as const, headers: { 'Content-Type': contentType } };
}

/** A short-lived link to read one object, served with the given type. */
export async function signedDownloadUrl(key: string, contentType?: string) {
  const { client, config } = storage();
  return getSignedUrl(
    client,
    new GetObjectCommand({ Bucket: config.bucket, Key: key, ResponseContentType: contentType }),
    { expiresIn: DOWNLOAD_URL_SECONDS },
  );
}

/** Size and type of a stored object, or null when there is none. */
export async function headObject(key: string): Promise<{ byteSize: number; contentType: string | undefined } | null> {
  const { client, config } = storage();
  try {
    const head = await client.send(new HeadObjectCommand({ Bucket: config.bucket, Key: key }));
    return { byteSize: head.ContentLength ?? 0, contentType: head.ContentType };
  } catch (error) {
    if (isMissing(error)) return null;
    throw error;
  }
}

/** The object's bytes; with `firstBytes`, only that many from the start (enough to tell the type). */
export async function readObject(key: string, firstBytes?: number): Promise<Buffer> {
  const { client, config } = storage();
  const answer = await client.send(
    new GetObjectCommand({
      Bucket: config.bucket,
      Key: key,
      Range: firstBytes ? `bytes=0-${firstBytes - 1}` : undefined,
    }),
  );
  if (!answer.Body) return Buffer.alloc(0);
  return Buffer.from(await answer.Body.transformToByteArray());
}

export async function putObject(key: string, body: Buffer, contentType: string) {
  const { client, config } = storage();
  await client.send(new PutObjectCommand({ Bucket: config.bucket, Key: key, Body: body, ContentType: contentType }));
}

/** Deletes the objects; keys that are already gone are fine. */
export async function deleteObjects(keys: (string | null | undefined)[]) {
  const present = keys.filter((key): key is string => !!key);
  if (!present.length) return;
  const { client, config } = storage();
  // One by one: the multi-object delete needs a body checksum that S3-compatible services handle unevenly.
  await Promise.all(present.map((Key) => client.send(new DeleteObjectCommand({ Bucket: config.bucket, Key }))));
}

const isMissing = (error: unknown) =>
  error instanceof S3ServiceException &&
  (error.name === 'NotFound' || error.name === 'NoSuchKey' || error.$metadata.httpStatusCode === 404);
