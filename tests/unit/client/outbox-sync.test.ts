// @vitest-environment jsdom
import 'fake-indexeddb/auto';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import {
  enqueueEvent,
  pendingCount,
  resetOutboxForTests,
  startOutboxSync,
  type FlushResult,
} from '@/lib/client/outbox';
import { fakeServer, tap, type Answer } from './fake-server';

// Only the sync loop's timers are faked; IndexedDB (fake-indexeddb) runs on real tasks.
beforeEach(async () => {
  await resetOutboxForTests();
  vi.useFakeTimers({ toFake: ['setTimeout', 'clearTimeout'] });
});
const running = new Set<() => void>();
afterEach(async () => {
  // A failed test must not leave its loop listening to the next test's events.
  running.forEach((stop) => stop());
  running.clear();
  vi.useRealTimers();
  await resetOutboxForTests();
});

// vi.waitFor would advance the fake clock while it polls; this waits on real tasks only.
const tick = () => new Promise((resolve) => setImmediate(resolve));
const until = async (check: () => boolean | Promise<boolean>) => {
  for (let i = 0; i < 5000 && !(await check()); i += 1) await tick();
  expect(await check()).toBe(true);
};

/** A sync loop against a fake server; `flushes(n)` waits until n flushes have finished. */
function syncWith(answer: () => Answer) {
  const server = fakeServer(answer);
  const results: FlushResult[] = [];
  const stop = startOutboxSync({ fetchImpl: server.fetchImpl, onResult: (result) => results.push(result) });
  running.add(stop);
  const flushes = async (count: number) => {
    await until(() => results.length >= count);
    await tick(); // the next timer is set right after onResult
    expect(results, JSON.stringify(results)).toHaveLength(count);
  };
  return { server, results, stop, flushes };
}

describe('startOutboxSync', () => {
  it('flushes at once on start and right after a tap is enqueued', async () => {
    await enqueueEvent(tap(undefined, 'note', 0));
    const { server, stop, flushes } = syncWith(() => 201);
    await flushes(1);
    expect(server.sent).toHaveLength(1);

    await enqueueEvent(tap(undefined, 'note', 1));
    await flushes(2);
    expect(server.sent).toHaveLength(2);
    expect(await pendingCount()).toBe(0);
    stop();
  });

  it('backs off 5, 10, 20, 40, 60, 60 s while the network fails', async () => {
    await enqueueEvent(tap());
    const { server, stop, flushes } = syncWith(() => 'network-error');
    await flushes(1);

    for (const [index, seconds] of [5, 10, 20, 40, 60, 60].entries()) {
      await vi.advanceTimersByTimeAsync(seconds * 1000 - 1);
      expect(server.sent).toHaveLength(index + 1);
      await vi.advanceTimersByTimeAsync(1);
      await flushes(index + 2);
      expect(server.sent).toHaveLength(index + 2);
    }
    stop();
  });

  it('polls every 5 s while all is well', async () => {
    const { results, stop, flushes } = syncWith(() => 201);
    await flushes(1);
    await vi.advanceTimersByTimeAsync(5000);
    await flushes(2);
    await vi.advanceTimersByTimeAsync(5000);
    await flushes(3);
    expect(results.every((r) => !r.failed)).toBe(true);
    stop();
  });

  it('tries again at once when the tablet comes back online, and forgets the backoff', async () => {
    await enqueueEvent(tap());
    let online = false;
    const { server, stop, flushes } = syncWith(() => (online ? 201 : 'network-error'));
    await flushes(1);
    for (const [index, seconds] of [5, 10, 20].entries()) {
      await vi.advanceTimersByTimeAsync(seconds * 1000);
      await flushes(index + 2);
    }
    expect(server.sent).toHaveLength(4);

    online = true;
    window.dispatchEvent(new Event('online'));
    await flushes(5);
    expect(await pendingCount()).toBe(0);
    // Back to the short interval.
    await vi.advanceTimersByTimeAsync(5000);
    await flushes(6);
    stop();
  });

  it('flushes when the page comes back into view', async () => {
    await enqueueEvent(tap());
    const { server, stop, flushes } = syncWith(() => 'network-error');
    await flushes(1);
    document.dispatchEvent(new Event('visibilitychange'));
    await flushes(2);
    expect(server.sent, JSON.stringify(server.sent)).toHaveLength(2);
    stop();
  });

  it('does nothing more once stopped', async () => {
    await enqueueEvent(tap());
    const { server, stop, flushes } = syncWith(() => 'network-error');
    await flushes(1);
    stop();
    await vi.advanceTimersByTimeAsync(120_000);
    window.dispatchEvent(new Event('online'));
    await enqueueEvent(tap(undefined, 'note', 3));
    for (let i = 0; i < 100; i += 1) await tick();
    expect(server.sent).toHaveLength(1);
  });
});
