import { describe, expect, it } from 'vitest';
import { cacheRuleFor } from '@/lib/client/cache-rules';

const ORIGIN = 'https://app.example.test';
function rule(path: string, { method = 'GET', rsc = false, origin = ORIGIN } = {}) {
  const headers = new Headers(rsc ? { RSC: '1' } : {});
  const url = new URL(path, origin);
  return cacheRuleFor({ url, method, sameOrigin: url.origin === ORIGIN, headers });
}

describe('cacheRuleFor', () => {
  it('keeps copies of the field pages, and their RSC payloads apart', () => {
    expect(rule('/today')).toBe('page');
    expect(rule('/today?date=2026-05-04')).toBe('page');
    expect(rule('/installs/7d3c9a4e-0b1f-4c55-9a0e-1f2b3c4d5e6f')).toBe('page');
    expect(rule('/installs/abc?_rsc=1x2y', { rsc: true })).toBe('page-data');
  });

  it('keeps copies of the install and today API reads', () => {
    expect(rule('/api/installs/abc')).toBe('api');
    expect(rule('/api/installs/abc/events')).toBe('api');
    expect(rule('/api/installs')).toBe('api');
    expect(rule('/api/today')).toBe('api');
    expect(rule('/api/today?date=2026-05-04')).toBe('api');
  });

  it('never caches a write, even to a cached path', () => {
    for (const method of ['POST', 'PUT', 'PATCH', 'DELETE']) {
      expect(rule('/api/installs/abc/events', { method })).toBe('none');
      expect(rule('/today', { method })).toBe('none');
    }
  });

  it('leaves sign-in, sessions, other APIs, desk pages and other origins alone', () => {
    expect(rule('/api/auth/session')).toBe('none');
    expect(rule('/api/auth/csrf')).toBe('none');
    expect(rule('/api/jobs')).toBe('none');
    expect(rule('/api/installsx')).toBe('none');
    expect(rule('/jobs/123')).toBe('none');
    expect(rule('/todays')).toBe('none');
    expect(rule('/installs')).toBe('none');
    expect(rule('/serwist/sw.js')).toBe('none');
    expect(rule('/today', { origin: 'https://elsewhere.test' })).toBe('none');
  });

  it('serves hashed build files from the cache first, public files while refreshing', () => {
    expect(rule('/_next/static/chunks/abc123.js')).toBe('static');
    expect(rule('/_next/static/media/inter-latin-400-normal.abc.woff2')).toBe('static');
    expect(rule('/favicon.ico')).toBe('public-file');
    expect(rule('/icon.svg')).toBe('public-file');
  });
});
