import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { FROM_CACHE_HEADER } from '@/lib/client/cache-rules';
import { FetchError, fetchJson } from '@/lib/client/fetch-json';
import { clockOffsetMs, resetServerClock } from '@/lib/client/server-time';

const HOUR_AHEAD = new Date(Date.now() + 3_600_000).toUTCString();

function answer(status: number, body: unknown, headers: Record<string, string> = {}) {
  return vi.fn(
    async () =>
      new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json', ...headers } }),
  );
}

beforeEach(() => resetServerClock());
afterEach(() => vi.unstubAllGlobals());

describe('fetchJson', () => {
  it('returns the JSON of a 2xx answer, asking for JSON and bypassing the HTTP cache', async () => {
    const fetch = answer(200, { id: 'x' });
    vi.stubGlobal('fetch', fetch);
    await expect(fetchJson('/api/today')).resolves.toEqual({ id: 'x' });
    const init = (fetch.mock.calls[0] as unknown as [string, RequestInit])[1];
    expect(init.cache).toBe('no-store');
    expect(new Headers(init.headers).get('accept')).toBe('application/json');
  });

  it("throws a FetchError with the server's error.message and fields on non-2xx", async () => {
    vi.stubGlobal(
      'fetch',
      answer(422, {
        error: { message: 'Invalid input — pressureKpa: too high', fields: { pressureKpa: ['too high'] } },
      }),
    );
    const error = await fetchJson('/api/installs/x').catch((e: unknown) => e);
    expect(error).toBeInstanceOf(FetchError);
    expect(error).toMatchObject({
      status: 422,
      message: 'Invalid input — pressureKpa: too high',
      fields: { pressureKpa: ['too high'] },
    });
  });

  it('throws a plain message when the error body is not ours, and status 0 with no connection', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => new Response('<html>bad gateway</html>', { status: 502 })),
    );
    await expect(fetchJson('/api/today')).rejects.toMatchObject({ status: 502, message: 'The server answered 502.' });
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => Promise.reject(new TypeError('Failed to fetch'))),
    );
    await expect(fetchJson('/api/today')).rejects.toMatchObject({ status: 0 });
  });

  it("corrects the clock from a network answer's Date header, but not from the service worker's copy", async () => {
    vi.stubGlobal('fetch', answer(200, {}, { date: HOUR_AHEAD, [FROM_CACHE_HEADER]: '1' }));
    await fetchJson('/api/today');
    expect(clockOffsetMs()).toBe(0);

    vi.stubGlobal('fetch', answer(200, {}, { date: HOUR_AHEAD }));
    await fetchJson('/api/today');
    expect(Math.abs(clockOffsetMs() - 3_600_000)).toBeLessThan(1500);
  });
});
