import { describe, expect, it } from 'vitest';
import { safeCallbackPath, safeRedirect } from '@/lib/auth/callback-url';
import { parseEnv } from '@/lib/env';
import { contentSecurityPolicy, crossSiteRefusal, securityHeaders, storageOrigins } from '@/lib/security/headers';
import { clientIp } from '@/lib/security/throttle';

const e = parseEnv({
  DATABASE_URL: 'postgres://a:b@127.0.0.1:1/x',
  NODE_ENV: 'test',
  S3_ENDPOINT: 'http://127.0.0.1:54393',
  STRIPE_API_URL: 'http://127.0.0.1:54395',
});
const APP = 'http://127.0.0.1:3000';

describe('callbackUrl', () => {
  it('keeps a path of this site with its query and fragment', () => {
    expect(safeCallbackPath('/jobs?status=scheduled#top')).toBe('/jobs?status=scheduled#top');
    expect(safeCallbackPath('/installs/1/../2')).toBe('/installs/2');
  });

  it('sends anything that could leave the site to the default', () => {
    for (const bad of [
      '/\\evil.example',
      '//evil.example',
      'https://evil.example/jobs',
      '\\\\evil.example',
      'javascript:alert(1)',
      '/\t/evil.example',
      ' /jobs',
      '',
      null,
      undefined,
      `/${'a'.repeat(2001)}`,
    ]) {
      expect(safeCallbackPath(bad as string)).toBe('/');
    }
    expect(safeCallbackPath('//evil.example', '/today')).toBe('/today');
  });

  it("next-auth's redirect stays on the site", () => {
    expect(safeRedirect('/jobs', APP)).toBe(`${APP}/jobs`);
    expect(safeRedirect(`${APP}/today?x=1`, APP)).toBe(`${APP}/today?x=1`);
    expect(safeRedirect('/\\evil.example', APP)).toBe(`${APP}/`);
    expect(safeRedirect('//evil.example', APP)).toBe(`${APP}/`);
    expect(safeRedirect('https://evil.example/jobs', APP)).toBe(APP);
    expect(safeRedirect('http://127.0.0.1:3001/jobs', APP)).toBe(APP);
  });
});

describe('Content-Security-Policy', () => {
  const policy = contentSecurityPolicy('bm9uY2U=', { e });
  const directive = (name: string) => policy.split('; ').find((d) => d.startsWith(`${name} `));

  it('runs scripts only with the nonce, and never in a frame, a plugin or a foreign form', () => {
    expect(directive('script-src')).toBe("script-src 'self' 'nonce-bm9uY2U=' 'strict-dynamic'");
    expect(policy).not.toMatch(/unsafe-eval/);
    expect(directive('object-src')).toBe("object-src 'none'");
    expect(directive('frame-ancestors')).toBe("frame-ancestors 'none'");
    expect(directive('base-uri')).toBe("base-uri 'self'");
    expect(directive('form-action')).toBe("form-action 'self' http://127.0.0.1:54395");
  });

  it('lets images, media and fetches reach only the app and the storage origin', () => {
    expect(directive('img-src')).toBe("img-src 'self' blob: data: http://127.0.0.1:54393");
    expect(directive('connect-src')).toBe("connect-src 'self' http://127.0.0.1:54393");
    expect(directive('media-src')).toBe("media-src 'self' blob: http://127.0.0.1:54393");
  });

  it('names the AWS bucket hosts when no endpoint is configured', () => {
    const aws = parseEnv({
      DATABASE_URL: 'postgres://a:b@127.0.0.1:1/x',
      NODE_ENV: 'production',
      NEXTAUTH_SECRET: 'a'.repeat(32),
      REPORT_LINK_SECRET: 'b'.repeat(32),
      S3_BUCKET: 'evidence',
      S3_REGION: 'eu-west-1',
      S3_ACCESS_KEY_ID: 'i',
      S3_SECRET_ACCESS_KEY: 's',
    });
    expect(storageOrigins(aws)).toEqual([
      'https://evidence.s3.eu-west-1.amazonaws.com',
      'https://s3.eu-west-1.amazonaws.com',
    ]);
  });

  it('upgrades insecure requests only over https', () => {
    expect(contentSecurityPolicy('n', { e, https: true })).toMatch(/upgrade-insecure-requests$/);
    expect(policy).not.toMatch(/upgrade-insecure-requests/);
  });
});

describe('security headers', () => {
  it('sends no referrer from a report link, and HSTS only over https', () => {
    expect(securityHeaders('/jobs', false)).toMatchObject({
      'X-Content-Type-Options': 'nosniff',
      'Referrer-Policy': 'strict-origin-when-cross-origin',
    });
    expect(securityHeaders('/r/abc.def', false)['Referrer-Policy']).toBe('no-referrer');
    expect(securityHeaders('/jobs', false)['Strict-Transport-Security']).toBeUndefined();
    expect(securityHeaders('/jobs', true)['Strict-Transport-Security']).toMatch(/^max-age=\d+/);
    expect(securityHeaders('/jobs', false)['Permissions-Policy']).toMatch(/^camera=\(self\), microphone=\(\)/);
  });
});

describe('cross-site writes to the API', () => {
  const request = (method: string, path: string, headers: Record<string, string> = {}) => ({
    method,
    url: `${APP}${path}`,
    headers: new Headers(headers),
  });
  const refused = (r: ReturnType<typeof request>) => crossSiteRefusal(r, [APP]) !== null;

  it('refuses a foreign Origin, a foreign Referer without Origin, and Sec-Fetch-Site cross-site', () => {
    expect(refused(request('POST', '/api/customers', { origin: 'https://evil.example' }))).toBe(true);
    expect(refused(request('DELETE', '/api/customers/1', { referer: 'https://evil.example/page' }))).toBe(true);
    expect(refused(request('PATCH', '/api/customers/1', { 'sec-fetch-site': 'cross-site', origin: APP }))).toBe(true);
    expect(refused(request('PUT', '/api/x', { origin: 'null' }))).toBe(true);
    expect(refused(request('POST', '/api/x', { origin: 'http://127.0.0.1:3000.evil.example' }))).toBe(true);
  });

  it('lets through our own origin, non-browser clients, reads, next-auth and the webhook', () => {
    expect(refused(request('POST', '/api/customers', { origin: APP, 'sec-fetch-site': 'same-origin' }))).toBe(false);
    expect(refused(request('POST', '/api/customers', { referer: `${APP}/customers/new` }))).toBe(false);
    expect(refused(request('POST', '/api/customers'))).toBe(false);
    expect(refused(request('GET', '/api/customers', { origin: 'https://evil.example' }))).toBe(false);
    expect(refused(request('POST', '/api/auth/callback/credentials', { origin: 'https://evil.example' }))).toBe(false);
    expect(refused(request('POST', '/api/payments/webhook', { 'sec-fetch-site': 'cross-site' }))).toBe(false);
  });
});

describe('client address', () => {
  it('is the last X-Forwarded-For entry, or the one a trusted proxy chain points at', () => {
    expect(clientIp(new Headers({ 'x-forwarded-for': '10.0.0.7' }), 0)).toBe('10.0.0.7');
    expect(clientIp(new Headers({ 'x-forwarded-for': '6.6.6.6, 10.0.0.7' }), 1)).toBe('10.0.0.7');
    expect(clientIp(new Headers({ 'x-forwarded-for': '6.6.6.6, 10.0.0.7, 10.0.0.1' }), 2)).toBe('10.0.0.7');
    expect(clientIp(new Headers({ 'x-real-ip': '10.0.0.9' }), 0)).toBe('10.0.0.9');
    expect(clientIp(new Headers(), 0)).toBe('unknown');
  });
});
