import { createSecretKey, hkdfSync, type KeyObject } from 'node:crypto';
import { jwtDecrypt, type JWTPayload } from 'jose';

// next-auth's session cookie (next-auth/jwt `encode`) is a JWE ("dir", A256GCM) under a key derived from the secret
// with HKDF-SHA256, empty salt, info "NextAuth.js Generated Encryption Key". next-auth's `decode` derives that key
// again on every call; a tap reads the cookie on every request, so the key is derived once per secret here.
const INFO = 'NextAuth.js Generated Encryption Key';
const keys = new Map<string, KeyObject>();

function keyOf(secret: string): KeyObject {
  let key = keys.get(secret);
  if (!key) {
    key = createSecretKey(Buffer.from(hkdfSync('sha256', secret, '', INFO, 32)));
    keys.set(secret, key);
  }
  return key;
}

/** The payload of a next-auth session token, as `decode` of next-auth/jwt gives it; throws when it is not valid. */
export async function decodeSessionToken(token: string, secret: string): Promise<JWTPayload> {
  // next-auth's own tolerance for clock skew (15 s).
  const { payload } = await jwtDecrypt(token, keyOf(secret), { clockTolerance: 15 });
  return payload;
}
