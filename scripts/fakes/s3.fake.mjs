// S3-compatible storage on loopback for development and tests: @20minutes/s3rver checks request
// signatures (plain s3rver does not), so a tampered presigned URL is refused here as on the real service.
import S3rver from '@20minutes/s3rver';
import { mkdirSync } from 'node:fs';
import path from 'node:path';

// Browsers upload straight to the bucket (presigned PUT) and read through signed GETs from the app's origin.
const CORS = `<CORSConfiguration><CORSRule><AllowedOrigin>*</AllowedOrigin><AllowedMethod>PUT</AllowedMethod><AllowedMethod>GET</AllowedMethod><AllowedMethod>HEAD</AllowedMethod><AllowedHeader>*</AllowedHeader><ExposeHeader>ETag</ExposeHeader><MaxAgeSeconds>3000</MaxAgeSeconds></CORSRule></CORSConfiguration>`;

export async function start({ dataDir, port }) {
  const directory = path.join(dataDir, 's3');
  mkdirSync(directory, { recursive: true });
  const bucket = process.env.S3_BUCKET || 'setline-evidence';
  const server = new S3rver({
    address: '127.0.0.1',
    port,
    directory,
    silent: true,
    configureBuckets: [{ name: bucket, configs: [CORS] }],
  });
  await server.run();
  return {
    name: 's3',
    // The fake's one built-in key pair.
    env: {
      S3_ENDPOINT: `http://127.0.0.1:${port}`,
      S3_REGION: 'us-east-1',
      S3_BUCKET: bucket,
      S3_ACCESS_KEY_ID: 'S3RVER',
      S3_SECRET_ACCESS_KEY: 'S3RVER',
    },
    stop: () => server.close(),
  };
}
