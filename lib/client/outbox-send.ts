import { errorOf } from './fetch-json';
import type { OutboxEntry } from './outbox-db';
import { recordServerDate } from '@/lib/client/server-time';

// One outbox entry → one POST, and what its answer means for the entry (policy in outbox.ts).

export type SendOutcome = { kind: 'synced' } | { kind: 'rejected' | 'retry'; message: string };

// No session, a timeout and throttling pass with time and are true of every entry alike: try again
// later. Any other 4xx (a 403 included: this tap, by this user, is not allowed) will never succeed.
const RETRY_STATUSES = new Set([401, 408, 429]);

export async function sendEntry(
  entry: OutboxEntry,
  fetchImpl: typeof fetch,
  baseUrl: string,
  timeoutMs: number,
): Promise<SendOutcome> {
  const { clientEventId, type, deviceTime, payload, correctsEventId, userId } = entry;
  const controller = new AbortController();
  const timer = setTimeout(() => controller.abort(), timeoutMs);
  const started = Date.now();
  try {
    const response = await fetchImpl(`${baseUrl}/api/installs/${encodeURIComponent(entry.installId)}/events`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', accept: 'application/json' },
      // The server refuses (403) a tap whose user is not the one signed in.
      body: JSON.stringify({
        clientEventId,
        type,
        deviceTime,
        payload,
        ...(correctsEventId ? { correctsEventId } : {}),
        ...(userId ? { userId } : {}),
      }),
      signal: controller.signal,
    });
    // Every answer is a clock sample for free.
    recordServerDate(response.headers.get('date'), started, Date.now());
    if (response.ok) return { kind: 'synced' };
    const message =
      errorOf(await response.json().catch(() => undefined))?.message ?? `The server answered ${response.status}.`;
    return { kind: RETRY_STATUSES.has(response.status) || response.status >= 500 ? 'retry' : 'rejected', message };
  } catch {
    return {
      kind: 'retry',
      message: controller.signal.aborted ? 'The server did not answer in time.' : 'No connection to the server.',
    };
  } finally {
    clearTimeout(timer);
  }
}
