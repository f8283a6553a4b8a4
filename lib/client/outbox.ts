import { Dexie, liveQuery } from 'dexie';
import { checkEventBody, isUuid } from '@/lib/validation/install-events-check';
import { deleteOutboxDb, firstSendable, mayBeSentBy, outboxDb, type OutboxEntry } from './outbox-db';
import { sendEntry } from './outbox-send';

// The on-device outbox: every tap of an install is written to IndexedDB first and sent
// afterwards, so a tap made without signal, or in a tab closed since, is never lost.
//
// Order and failure policy of flushOutbox:
// - Entries go strictly in insertion order (`seq`), one request at a time, across installs.
// - Each entry carries the user who tapped it and is sent only while that user is signed in on
//   this tablet (setOutboxUser): other users' entries stay pending, skipped, "waiting for <name>
//   to sign in", and never go out under someone else's session.
// - No answer, a timeout, 401 (no session), 408, 429 and 5xx stop the whole flush with the entry
//   still pending: the next one would fail alike, and going on would send a later tap before an
//   earlier one.
// - Any other 4xx (400, 403, 404, 409, 422 …) will never succeed: the entry becomes 'rejected'
//   ("needs attention") with the server's message, stays on the tablet to be seen, and the flush
//   goes on — including later entries of the same install, because the server orders an install's
//   events by their device time, not by arrival, and one bad tap must not hold back the rest.
// - The server must answer a replayed clientEventId with 2xx: an entry whose answer was lost
//   on the way back is sent again.

export type { OutboxEntry, OutboxStatus } from './outbox-db';

export type NewOutboxEvent = Pick<
  OutboxEntry,
  'installId' | 'clientEventId' | 'type' | 'deviceTime' | 'payload' | 'correctsEventId' | 'userId' | 'userName'
>;

/** Who is signed in on this tablet, as far as the outbox knows. */
export type OutboxUser = { id: string; name: string };

export interface FlushOptions {
  fetchImpl?: typeof fetch;
  baseUrl?: string;
  /** A request on a weak signal can hang for minutes; past this it counts as no answer. */
  timeoutMs?: number;
  /** Whose entries to send; default the user given to setOutboxUser (or startOutboxSync). */
  userId?: string | null;
}

export interface FlushResult {
  synced: number;
  rejected: number;
  /** Entries still pending (all installs) when the flush ended. */
  remaining: number;
  /** Why the flush stopped with entries left to retry; absent when it ran to the end. */
  failed?: string;
  /** Of `remaining`, entries of other users waiting for them to sign in; absent when none. */
  waiting?: number;
}

/** A tap that cannot be stored as it is (caught before it reaches the outbox). */
export class OutboxInputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'OutboxInputError';
  }
}

const LOCK_NAME = 'setline-outbox-flush';

let signedInUserId: string | null = null;

/** Tells the outbox who is signed in (null: nobody known), so it sends only that user's taps. */
export function setOutboxUser(user: OutboxUser | null): void {
  signedInUserId = user?.id ?? null;
}
const DEFAULT_TIMEOUT_MS = 20_000;

/**
 * Stores a tap as 'pending' and returns it; nothing is sent here. Enqueueing the same
 * clientEventId again returns the stored entry, so a double tap is one event.
 * Throws OutboxInputError for a malformed event (the server's rules: install-events-check.ts), and Dexie's
 * error when the tablet's storage refuses the write — the UI must then say it was NOT saved.
 */
export async function enqueueEvent(body: NewOutboxEvent): Promise<OutboxEntry> {
  const event = validate(body);
  const table = outboxDb().entries;
  const entry = await outboxDb().transaction('rw', table, async () => {
    const existing = await table.where('clientEventId').equals(event.clientEventId).first();
    if (existing) return existing;
    const fresh = { ...event, status: 'pending' as const, attempts: 0 };
    return { ...fresh, seq: await table.add(fresh) };
  });
  for (const listener of enqueuedListeners) listener();
  return entry;
}

/** Entries in insertion order, of one install or all. */
export async function listEntries(installId?: string): Promise<OutboxEntry[]> {
  const table = outboxDb().entries;
  if (installId === undefined) return table.orderBy('seq').toArray();
  return table.where('[installId+seq]').between([installId, Dexie.minKey], [installId, Dexie.maxKey]).toArray();
}

export async function pendingCount(installId?: string): Promise<number> {
  const table = outboxDb().entries;
  if (installId === undefined) return table.where('status').equals('pending').count();
  return table.where('[installId+status]').equals([installId, 'pending']).count();
}

/**
 * Calls `listener` with every entry (insertion order) now and after each change, made in this
 * tab or another. Returns the unsubscribe function.
 */
export function subscribe(listener: (entries: OutboxEntry[]) => void, onError?: (error: unknown) => void): () => void {
  const subscription = liveQuery(() => outboxDb().entries.orderBy('seq').toArray()).subscribe({
    next: listener,
    error: (error) => (onError ? onError(error) : console.error('Outbox subscription failed', error)),
  });
  return () => subscription.unsubscribe();
}

let inFlight: Promise<FlushResult> | null = null;

/**
 * Sends the pending entries (policy at the top of this file). A call made while a flush runs
 * gets that flush's result; a running flush also takes entries enqueued meanwhile.
 */
export function flushOutbox(options: FlushOptions = {}): Promise<FlushResult> {
  inFlight ??= acrossTabs(() => drain(options)).finally(() => {
    inFlight = null;
  });
  return inFlight;
}

export interface OutboxSyncOptions extends FlushOptions {
  /** The signed-in user: only their taps are sent (see setOutboxUser). */
  user?: OutboxUser | null;
  /** Wait between flushes while all is well, and the first wait after a failure, ms. */
  minDelayMs?: number;
  /** The longest wait while flushes keep failing, ms. */
  maxDelayMs?: number;
  onResult?: (result: FlushResult) => void;
}

/**
 * Keeps the outbox flowing while a page is open: a flush now, after every tap enqueued, when
 * the tablet comes back online or the page back into view, and on a timer that backs off
 * (doubling from minDelayMs up to maxDelayMs) while flushes fail. Returns the stop function.
 */
export function startOutboxSync(options: OutboxSyncOptions = {}): () => void {
  const { minDelayMs = 5_000, maxDelayMs = 60_000, onResult, user, ...flushOptions } = options;
  if (user !== undefined) setOutboxUser(user);
  let failures = 0;
  let timer: ReturnType<typeof setTimeout> | undefined;
  let busy = false;
  let stopped = false;

  // With the defaults: every 5 s while all is well; after failures 5, 10, 20, 40, 60, 60 … s.
  const schedule = () => {
    clearTimeout(timer);
    const delay = failures === 0 ? minDelayMs : Math.min(minDelayMs * 2 ** (failures - 1), maxDelayMs);
    if (!stopped) timer = setTimeout(run, delay);
  };
  async function run() {
    if (stopped || busy) return;
    // The browser knows for sure when there is no network at all; sending would only fail.
    if (typeof navigator !== 'undefined' && navigator.onLine === false) {
      failures += 1;
      return schedule();
    }
    busy = true;
    let result: FlushResult | undefined;
    try {
      result = await flushOutbox(flushOptions);
      onResult?.(result);
    } catch (error) {
      console.error('Outbox flush failed', error);
    } finally {
      busy = false;
    }
    failures = result && !result.failed ? 0 : failures + 1;
    schedule();
  }
  // Something new to send, or a network that may be back: try now and forget the backoff.
  const now = () => {
    failures = 0;
    void run();
  };
  const onVisible = () => {
    if (document.visibilityState === 'visible') now();
  };

  enqueuedListeners.add(now);
  if (typeof window !== 'undefined') window.addEventListener('online', now);
  if (typeof document !== 'undefined') document.addEventListener('visibilitychange', onVisible);
  void keepStorage();
  void pruneSynced().catch(() => undefined);
  void run();

  return () => {
    stopped = true;
    clearTimeout(timer);
    enqueuedListeners.delete(now);
    if (typeof window !== 'undefined') window.removeEventListener('online', now);
    if (typeof document !== 'undefined') document.removeEventListener('visibilitychange', onVisible);
  };
}

/** Deletes synced entries older than `olderThanMs` (default a week); pending and rejected stay. */
export async function pruneSynced(olderThanMs = 7 * 24 * 3600_000, now = Date.now()): Promise<number> {
  const cutoff = new Date(now - olderThanMs).toISOString();
  return outboxDb()
    .entries.where('status')
    .equals('synced')
    .filter((entry) => (entry.syncedAt ?? '') < cutoff)
    .delete();
}

/** Closes and deletes the database so each test starts empty. */
export async function resetOutboxForTests(): Promise<void> {
  await inFlight?.catch(() => undefined);
  inFlight = null;
  signedInUserId = null;
  enqueuedListeners.clear();
  await deleteOutboxDb();
}

const enqueuedListeners = new Set<() => void>();

async function drain({
  fetchImpl = fetch,
  baseUrl = '',
  timeoutMs = DEFAULT_TIMEOUT_MS,
  userId = signedInUserId,
}: FlushOptions): Promise<FlushResult> {
  const table = outboxDb().entries;
  const result: FlushResult = { synced: 0, rejected: 0, remaining: 0 };
  for (let entry = await firstSendable(userId); entry; entry = await firstSendable(userId)) {
    const outcome = await sendEntry(entry, fetchImpl, baseUrl, timeoutMs);
    const attempts = entry.attempts + 1;
    if (outcome.kind === 'synced') {
      await table.update(entry.seq, {
        status: 'synced',
        attempts,
        syncedAt: new Date().toISOString(),
        lastError: undefined,
      });
      result.synced += 1;
    } else if (outcome.kind === 'rejected') {
      await table.update(entry.seq, { status: 'rejected', attempts, lastError: outcome.message });
      result.rejected += 1;
    } else {
      await table.update(entry.seq, { attempts, lastError: outcome.message });
      result.failed = outcome.message;
      break;
    }
  }
  result.remaining = await pendingCount();
  const waiting = await table
    .where('status')
    .equals('pending')
    .filter((entry) => !mayBeSentBy(entry, userId))
    .count();
  if (waiting > 0) result.waiting = waiting;
  return result;
}

// Two tabs flushing at once would send an entry twice and could interleave the order; the
// Web Locks API (where present) lets one tab flush while the others skip.
async function acrossTabs(run: () => Promise<FlushResult>): Promise<FlushResult> {
  const locks = typeof navigator === 'undefined' ? undefined : navigator.locks;
  if (!locks) return run();
  return locks.request(LOCK_NAME, { ifAvailable: true }, async (lock) =>
    lock ? run() : { synced: 0, rejected: 0, remaining: await pendingCount() },
  );
}

// Without this the browser may evict IndexedDB under storage pressure — unsent taps included.
async function keepStorage(): Promise<void> {
  try {
    if (typeof navigator !== 'undefined' && navigator.storage?.persist && !(await navigator.storage.persisted())) {
      await navigator.storage.persist();
    }
  } catch {
    // Not granted or not supported: the outbox still works, only without that guarantee.
  }
}

function validate(body: NewOutboxEvent): Omit<OutboxEntry, 'seq' | 'status' | 'attempts'> {
  if (!isUuid(body?.installId)) throw new OutboxInputError('installId: Not a valid id');
  const checked = checkEventBody(body);
  if (!checked.ok) throw new OutboxInputError(checked.path ? `${checked.path}: ${checked.message}` : checked.message);
  const { clientEventId, type, deviceTime, payload, correctsEventId } = checked.data;
  if (body.userId !== undefined && !isUuid(body.userId)) throw new OutboxInputError('userId: Not a valid id');
  const who = body.userId === undefined ? {} : { userId: body.userId, userName: body.userName ?? '' };
  return {
    installId: body.installId,
    clientEventId,
    type,
    deviceTime,
    payload,
    ...(correctsEventId ? { correctsEventId } : {}),
    ...who,
  };
}
