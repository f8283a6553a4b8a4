import { errorOf } from './fetch-json';
import type { OutboxEntry } from './outbox-db';
import { recordServerDate } from './server-clock';

// One outbox entry → one POST, and what its answer means for the entry (policy in outbox.ts).

export type SendOutcome = { kind: 'synced' } | { kind: 'rejected' | 'retry'; message: string };

// Session, role, throttling and timeouts are true of every entry alike and pass with time.
const RETRY_STATUSES = new Set([401, 403, 408, 425, 429]);

export async function sendEntry(entry: OutboxEntry, fetchImpl: typeof fetch, baseUrl: string, timeoutMs: number): Promise<SendOutcome> {
  const { clientEventId, type, deviceTime, payload, correctsEventId } = entry;
  const controller = new AbortController();
  const timer = setTimeout(() => controller.abort(), timeoutMs);
  const started = Date.now();
  try {
    const response = await fetchImpl(`${baseUrl}/api/installs/${encodeURIComponent(entry.installId)}/events`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', accept: 'application/json' },
      body: JSON.stringify({ clientEventId, type, deviceTime, payload, ...(correctsEventId ? { correctsEventId } : {}) }),
      signal: controller.signal,
    });
    // Every answer is a clock sample for free.
    recordServerDate(response.headers.get('date'), started, Date.now());
    if (response.ok) return { kind: 'synced' };
    const message = errorOf(await response.json().catch(() => undefined))?.message ?? `The server answered ${response.status}.`;
    return { kind: RETRY_STATUSES.has(response.status) || response.status >= 500 ? 'retry' : 'rejected', message };
  } catch {
    return { kind: 'retry', message: controller.signal.aborted ? 'The server did not answer in time.' : 'No connection to the server.' };
  } finally {
    clearTimeout(timer);
  }
}
