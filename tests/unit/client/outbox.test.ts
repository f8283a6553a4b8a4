import 'fake-indexeddb/auto';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import {
  enqueueEvent,
  flushOutbox,
  listEntries,
  OutboxInputError,
  pendingCount,
  pruneSynced,
  resetOutboxForTests,
  subscribe,
  type OutboxEntry,
} from '@/lib/client/outbox';
import { fakeServer, INSTALL_A, INSTALL_B, tap } from './fake-server';

beforeEach(resetOutboxForTests);
afterEach(resetOutboxForTests);

describe('enqueueEvent', () => {
  it('stores the tap as pending before anything is sent, with a rising seq', async () => {
    const first = await enqueueEvent(tap(INSTALL_A, 'safety_acknowledged'));
    const second = await enqueueEvent(tap(INSTALL_A, 'note', 1));
    expect(first).toMatchObject({ installId: INSTALL_A, type: 'safety_acknowledged', status: 'pending', attempts: 0 });
    expect(second.seq).toBeGreaterThan(first.seq);
    expect((await listEntries()).map((e) => e.clientEventId)).toEqual([first.clientEventId, second.clientEventId]);
  });

  it('keeps one entry for a clientEventId enqueued twice (a double tap)', async () => {
    const body = tap();
    const first = await enqueueEvent(body);
    const again = await enqueueEvent({ ...body, payload: { text: 'changed' } });
    expect(again).toEqual(first);
    expect(await pendingCount()).toBe(1);
  });

  it('refuses a malformed tap with the field at fault, and stores nothing', async () => {
    await expect(enqueueEvent({ ...tap(), installId: 'not-a-uuid' })).rejects.toThrow(OutboxInputError);
    await expect(enqueueEvent({ ...tap(), type: 'dance' })).rejects.toThrow(/type/);
    await expect(enqueueEvent({ ...tap(INSTALL_A, 'bladder_inflated'), payload: { pressureKpa: -5 } })).rejects.toThrow(
      /payload\.pressureKpa/,
    );
    expect(await listEntries()).toEqual([]);
  });
});

describe('listEntries and pendingCount', () => {
  it('count and list per install or for all', async () => {
    await enqueueEvent(tap(INSTALL_A, 'note', 0));
    await enqueueEvent(tap(INSTALL_B, 'note', 1));
    await enqueueEvent(tap(INSTALL_A, 'note', 2));
    expect(await pendingCount()).toBe(3);
    expect(await pendingCount(INSTALL_A)).toBe(2);
    expect(await pendingCount(INSTALL_B)).toBe(1);
    expect((await listEntries(INSTALL_A)).map((e) => e.installId)).toEqual([INSTALL_A, INSTALL_A]);

    const server = fakeServer((request) => (request.body.payload.text === 'note at minute 0' ? 201 : 'network-error'));
    await flushOutbox({ fetchImpl: server.fetchImpl });
    expect(await pendingCount()).toBe(2);
    expect(await pendingCount(INSTALL_B)).toBe(1);
  });
});

describe('flushOutbox', () => {
  it('sends pending entries one at a time in seq order, across installs, to the install events URL', async () => {
    const taps = [tap(INSTALL_B, 'note', 9), tap(INSTALL_A, 'note', 1), tap(INSTALL_B, 'note', 3)];
    for (const t of taps) await enqueueEvent(t);
    const server = fakeServer();
    const result = await flushOutbox({ fetchImpl: server.fetchImpl, baseUrl: 'https://example.test' });

    expect(result).toEqual({ synced: 3, rejected: 0, remaining: 0 });
    expect(server.ids()).toEqual(taps.map((t) => t.clientEventId));
    expect(server.sent[0].url).toBe(`https://example.test/api/installs/${INSTALL_B}/events`);
    expect(server.sent[0].body).toEqual({
      clientEventId: taps[0].clientEventId,
      type: 'note',
      deviceTime: taps[0].deviceTime,
      payload: taps[0].payload,
    });
    const stored = await listEntries();
    expect(stored.every((e) => e.status === 'synced' && e.attempts === 1 && typeof e.syncedAt === 'string')).toBe(true);
  });

  it('sends correctsEventId when the tap has one', async () => {
    const original = await enqueueEvent(tap());
    const correction = {
      ...tap(INSTALL_A, 'correction'),
      payload: { reason: 'wrong time typed', deviceTime: '2026-05-04T08:03:00.000Z' },
      correctsEventId: original.clientEventId,
    };
    await enqueueEvent(correction);
    const server = fakeServer();
    await flushOutbox({ fetchImpl: server.fetchImpl });
    expect(server.sent[1].body.correctsEventId).toBe(original.clientEventId);
    expect('correctsEventId' in server.sent[0].body).toBe(false);
  });

  it('stops at a network error, keeps the entry pending, and resumes in the same order', async () => {
    const taps = [tap(INSTALL_A, 'note', 0), tap(INSTALL_A, 'note', 1), tap(INSTALL_A, 'note', 2)];
    for (const t of taps) await enqueueEvent(t);
    let online = false;
    const server = fakeServer((_request, index) => (index === 0 || online ? 201 : 'network-error'));

    const first = await flushOutbox({ fetchImpl: server.fetchImpl });
    expect(first).toEqual({ synced: 1, rejected: 0, remaining: 2, failed: 'No connection to the server.' });
    const waiting = (await listEntries())[1];
    expect(waiting).toMatchObject({ status: 'pending', attempts: 1, lastError: 'No connection to the server.' });

    online = true;
    const second = await flushOutbox({ fetchImpl: server.fetchImpl });
    expect(second).toEqual({ synced: 2, rejected: 0, remaining: 0 });
    // The failed entry went again, first, and nothing already synced was repeated.
    expect(server.ids()).toEqual([taps[0], taps[1], taps[1], taps[2]].map((t) => t.clientEventId));
    expect((await listEntries())[1]).toMatchObject({ status: 'synced', attempts: 2 });
    expect((await listEntries())[1].lastError).toBeUndefined();
  });

  it.each([500, 503, 401, 408, 429])('treats %i as try-again-later: stops, entry stays pending', async (status) => {
    await enqueueEvent(tap());
    await enqueueEvent(tap(INSTALL_B));
    const server = fakeServer(() => ({ status, message: 'not now' }));
    const result = await flushOutbox({ fetchImpl: server.fetchImpl });
    expect(result).toEqual({ synced: 0, rejected: 0, remaining: 2, failed: 'not now' });
    expect(server.sent).toHaveLength(1);
  });

  it.each([409, 422, 400, 404, 403, 425])(
    'marks %i rejected with the server message, and still sends the next entry',
    async (status) => {
      const bad = await enqueueEvent(tap(INSTALL_A, 'note', 0));
      const next = await enqueueEvent(tap(INSTALL_A, 'note', 1));
      const server = fakeServer((request) =>
        request.body.clientEventId === bad.clientEventId
          ? { status, message: 'Inflated before the resin was mixed.' }
          : 201,
      );

      const result = await flushOutbox({ fetchImpl: server.fetchImpl });
      expect(result).toEqual({ synced: 1, rejected: 1, remaining: 0 });
      expect(server.ids()).toEqual([bad.clientEventId, next.clientEventId]);
      const [rejected, synced] = await listEntries();
      expect(rejected).toMatchObject({
        status: 'rejected',
        attempts: 1,
        lastError: 'Inflated before the resin was mixed.',
      });
      expect(synced.status).toBe('synced');

      // A rejected entry stays on the tablet and is never sent again.
      await flushOutbox({ fetchImpl: server.fetchImpl });
      expect(server.sent).toHaveLength(2);
    },
  );

  it('does not send synced entries again', async () => {
    await enqueueEvent(tap());
    const server = fakeServer();
    await flushOutbox({ fetchImpl: server.fetchImpl });
    await enqueueEvent(tap(INSTALL_A, 'note', 5));
    await flushOutbox({ fetchImpl: server.fetchImpl });
    await flushOutbox({ fetchImpl: server.fetchImpl });
    expect(server.sent).toHaveLength(2);
    expect(new Set(server.ids()).size).toBe(2);
  });

  it('never runs two flushes at once: overlapping calls share one flush and send each entry once', async () => {
    for (let minute = 0; minute < 4; minute += 1) await enqueueEvent(tap(INSTALL_A, 'note', minute));
    const server = fakeServer(() => 201, 5);
    let concurrent = 0;
    let most = 0;
    const counting = (async (...args: Parameters<typeof fetch>) => {
      concurrent += 1;
      most = Math.max(most, concurrent);
      try {
        return await server.fetchImpl(...args);
      } finally {
        concurrent -= 1;
      }
    }) as typeof fetch;

    const results = await Promise.all([
      flushOutbox({ fetchImpl: counting }),
      flushOutbox({ fetchImpl: counting }),
      flushOutbox({ fetchImpl: counting }),
    ]);
    expect(server.sent).toHaveLength(4);
    expect(new Set(server.ids()).size).toBe(4);
    expect(most).toBe(1);
    expect(results[0]).toBe(results[1]);
    expect(results[0]).toEqual({ synced: 4, rejected: 0, remaining: 0 });
  });

  it('also sends an entry enqueued while a flush is running', async () => {
    await enqueueEvent(tap(INSTALL_A, 'note', 0));
    let late: string | undefined;
    const server = fakeServer((_request, index) => {
      if (index === 0) void enqueueEvent(tap(INSTALL_A, 'note', 1)).then((e) => (late = e.clientEventId));
      return 201;
    }, 5);
    const result = await flushOutbox({ fetchImpl: server.fetchImpl });
    expect(result.synced).toBe(2);
    expect(server.ids()[1]).toBe(late);
  });

  it('counts a request that hangs past the timeout as no answer', async () => {
    await enqueueEvent(tap());
    const hanging = ((_url: string, init?: RequestInit) =>
      new Promise((_resolve, reject) =>
        init?.signal?.addEventListener('abort', () => reject(new DOMException('aborted', 'AbortError'))),
      )) as typeof fetch;
    const result = await flushOutbox({ fetchImpl: hanging, timeoutMs: 20 });
    expect(result).toEqual({ synced: 0, rejected: 0, remaining: 1, failed: 'The server did not answer in time.' });
  });
});

describe('subscribe', () => {
  it('reports the entries now and after each change', async () => {
    const seen: OutboxEntry[][] = [];
    const unsubscribe = subscribe((entries) => seen.push(entries));
    const waitFor = async (check: (entries: OutboxEntry[]) => boolean) => {
      for (let i = 0; i < 100 && !check(seen.at(-1) ?? []); i += 1) await new Promise((r) => setTimeout(r, 5));
      expect(check(seen.at(-1) ?? [])).toBe(true);
    };
    await waitFor((entries) => entries.length === 0);
    const entry = await enqueueEvent(tap());
    await waitFor((entries) => entries.length === 1 && entries[0].status === 'pending');
    await flushOutbox({ fetchImpl: fakeServer().fetchImpl });
    await waitFor((entries) => entries[0]?.clientEventId === entry.clientEventId && entries[0].status === 'synced');
    unsubscribe();
  });
});

describe('pruneSynced', () => {
  it('deletes old synced entries only', async () => {
    await enqueueEvent(tap(INSTALL_A, 'note', 0));
    await flushOutbox({ fetchImpl: fakeServer().fetchImpl });
    await enqueueEvent(tap(INSTALL_A, 'note', 1));
    await enqueueEvent(tap(INSTALL_A, 'note', 2));
    await flushOutbox({ fetchImpl: fakeServer(() => 422).fetchImpl });
    await enqueueEvent(tap(INSTALL_A, 'note', 3));

    expect(await pruneSynced(7 * 24 * 3600_000)).toBe(0);
    expect(await pruneSynced(0, Date.now() + 1000)).toBe(1);
    expect((await listEntries()).map((e) => e.status)).toEqual(['rejected', 'rejected', 'pending']);
  });
});
