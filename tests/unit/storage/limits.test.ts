import { describe, expect, it } from 'vitest';
import {
  ALLOWED_SUMMARY,
  MAX_BYTES,
  allowedType,
  formatBytes,
  objectKey,
  thumbnailKey,
  uploadRefusal,
} from '@/lib/storage/limits';
import { uploadRequestSchema } from '@/lib/validation/attachments';
import { parseEnv, storageEnv } from '@/lib/env';

const MB = 1024 * 1024;
const company = '11111111-1111-4111-8111-111111111111';
const job = '22222222-2222-4222-8222-222222222222';
const id = '33333333-3333-4333-8333-333333333333';

describe('upload limits', () => {
  it('takes images up to 15 MB and videos up to 200 MB, to the byte', () => {
    expect(MAX_BYTES).toEqual({ image: 15 * MB, video: 200 * MB });
    expect(uploadRefusal('image/jpeg', 15 * MB)).toBeNull();
    expect(uploadRefusal('image/webp', 15 * MB + 1)).toMatch(/images may be at most 15 MB/);
    expect(uploadRefusal('video/quicktime', 200 * MB)).toBeNull();
    expect(uploadRefusal('video/mp4', 200 * MB + 1)).toMatch(/videos may be at most 200 MB/);
  });

  it('refuses any other type, naming what is taken', () => {
    for (const type of [
      'image/gif',
      'image/svg+xml',
      'application/pdf',
      'text/plain',
      'application/x-msdownload',
      '',
    ]) {
      expect(uploadRefusal(type, 10)).toContain(ALLOWED_SUMMARY);
    }
    expect(ALLOWED_SUMMARY).toBe('JPEG, PNG or WebP images up to 15 MB, MP4, WebM or QuickTime videos up to 200 MB');
  });

  it('matches types without regard to case', () => {
    expect(allowedType('IMAGE/PNG')?.ext).toBe('png');
    expect(allowedType('video/QuickTime')?.ext).toBe('mov');
  });

  it('formats sizes for people', () => {
    expect(formatBytes(512)).toBe('512 bytes');
    expect(formatBytes(2048)).toBe('2 KB');
    expect(formatBytes(15 * MB)).toBe('15 MB');
    expect(formatBytes(1.25 * MB)).toBe('1.3 MB');
  });
});

describe('storage keys', () => {
  it('are company/job/id.ext, the extension from the type, never from a file name', () => {
    expect(objectKey(company, job, id, 'image/jpeg')).toBe(`${company}/${job}/${id}.jpg`);
    expect(objectKey(company, job, id, 'video/quicktime')).toBe(`${company}/${job}/${id}.mov`);
    expect(thumbnailKey(company, job, id)).toBe(`${company}/${job}/thumbs/${id}.webp`);
  });

  it('refuse a type that is not allowed', () => {
    expect(() => objectKey(company, job, id, 'text/html')).toThrow(/no storage key/);
  });
});

describe('uploadRequestSchema', () => {
  const good = {
    installId: id,
    kind: 'inspection',
    fileName: '../../etc/passwd.png',
    contentType: 'Image/PNG',
    byteSize: 1000,
  };

  it('accepts a well-formed request (the name is only a label) and lower-cases the type', () => {
    const parsed = uploadRequestSchema.parse(good);
    expect(parsed.contentType).toBe('image/png');
    expect(parsed.caption).toBeUndefined();
  });

  it('wants exactly one of a repair or an install', () => {
    expect(uploadRequestSchema.safeParse({ ...good, installId: undefined }).success).toBe(false);
    expect(uploadRequestSchema.safeParse({ ...good, repairId: job }).success).toBe(false);
  });

  it('puts a size over the limit on byteSize and a wrong type on contentType', () => {
    const big = uploadRequestSchema.safeParse({ ...good, byteSize: 15 * MB + 1 });
    expect(big.success || big.error.issues.map((i) => i.path.join('.'))).toEqual(['byteSize']);
    const gif = uploadRequestSchema.safeParse({ ...good, contentType: 'image/gif' });
    expect(gif.success || gif.error.issues.map((i) => i.path.join('.'))).toEqual(['contentType']);
    expect(uploadRequestSchema.safeParse({ ...good, byteSize: 0 }).success).toBe(false);
    expect(uploadRequestSchema.safeParse({ ...good, kind: 'selfie' }).success).toBe(false);
    expect(uploadRequestSchema.safeParse({ ...good, extra: 1 }).success).toBe(false);
  });
});

describe('storageEnv', () => {
  const PRODUCTION_SECRETS = { NEXTAUTH_SECRET: 'a'.repeat(32), REPORT_LINK_SECRET: 'b'.repeat(32) };
  const db = { DATABASE_URL: 'postgres://a:b@127.0.0.1:54329/setline' };

  it('falls back to the local fake outside production', () => {
    expect(storageEnv(parseEnv(db))).toEqual({
      endpoint: 'http://127.0.0.1:54393',
      region: 'us-east-1',
      bucket: 'setline-evidence',
      accessKeyId: 'S3RVER',
      secretAccessKey: 'S3RVER',
      forcePathStyle: true,
    });
  });

  it('requires the bucket, region and key pair in production, naming each missing one', () => {
    const production = parseEnv({ ...db, NODE_ENV: 'production', ...PRODUCTION_SECRETS, S3_BUCKET: 'evidence' });
    expect(() => storageEnv(production)).toThrow(
      /S3_REGION: required in production[\s\S]*S3_ACCESS_KEY_ID[\s\S]*S3_SECRET_ACCESS_KEY/,
    );
  });

  it('uses AWS itself (no endpoint, virtual-host addressing) when production names no endpoint', () => {
    const production = parseEnv({
      ...db,
      NODE_ENV: 'production',
      ...PRODUCTION_SECRETS,
      S3_BUCKET: 'evidence',
      S3_REGION: 'eu-west-1',
      S3_ACCESS_KEY_ID: 'id',
      S3_SECRET_ACCESS_KEY: 'secret',
    });
    expect(storageEnv(production)).toMatchObject({
      endpoint: undefined,
      region: 'eu-west-1',
      bucket: 'evidence',
      forcePathStyle: false,
    });
  });

  it('refuses a malformed endpoint or path-style flag at start-up', () => {
    expect(() => parseEnv({ ...db, S3_ENDPOINT: 'not a url' })).toThrow(/S3_ENDPOINT must be a URL/);
    expect(() => parseEnv({ ...db, S3_FORCE_PATH_STYLE: 'yes' })).toThrow(/true or false/);
  });
});
