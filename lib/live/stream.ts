import 'server-only';
import { userFromClaims, type SessionUser } from '@/lib/auth/session';
import type { SessionClaims } from '@/lib/auth/claims';
import { currentLiveSeq, liveEventOf, mayReceive, replayLive, type LiveEvent, type LiveNotice } from '@/lib/data/live';
import { AppError } from '@/lib/server/errors';
import { liveHub, type LiveHub } from './hub';

// The SSE framing of the live stream (WHATWG HTML, "Server-sent events"): every tap is a `message` whose `id:`
// is its seq, so the browser's EventSource sends it back as Last-Event-ID when it reconnects and the stream
// replays what was committed meanwhile. A fresh stream first sends `ready` with the newest seq, so even a client
// that saw no tap yet resumes from the right place. `reset` tells a client that was too far behind to refetch.

/** A comment line every 20 s keeps proxies and load balancers from closing an idle stream. */
export const HEARTBEAT_MS = 20_000;
/** How long the browser waits before reconnecting (sent as `retry:`). */
const RETRY_MS = 2_000;

export type LiveStreamOptions = {
  /** Resume after this seq (from Last-Event-ID); a fresh stream starts at the newest seq. */
  after: string | null;
  /** Send what is waiting (the replay, or just `ready`) and end: for checks and for clients that poll. */
  once: boolean;
  signal?: AbortSignal;
  /** The session, re-checked at each heartbeat: a deactivated user or a bumped token ends the stream. */
  claims?: SessionClaims | null;
  hub?: LiveHub;
  heartbeatMs?: number;
};

export const LIVE_HEADERS = {
  'Content-Type': 'text/event-stream; charset=utf-8',
  // no-transform: compression would hold the events back until a buffer fills (and a CDN must not cache them).
  'Cache-Control': 'no-cache, no-transform',
  // nginx and similar proxies buffer responses unless told not to.
  'X-Accel-Buffering': 'no',
} as const;

/** The caller's live stream as an HTTP response; throws 503 when this server cannot listen to the database. */
export async function liveStreamResponse(user: SessionUser, options: LiveStreamOptions): Promise<Response> {
  const hub = options.hub ?? liveHub();
  const encoder = new TextEncoder();
  let audience = user;
  let lastSeq: bigint = -1n;
  // Notices that arrive while the log is being replayed wait here, so the order stays the commit order.
  let held: LiveNotice[] | null = [];
  let closed = false;
  let unsubscribe: () => void = () => undefined;
  let heartbeat: ReturnType<typeof setInterval> | undefined;
  let work: Promise<void> = Promise.resolve();
  let controller!: ReadableStreamDefaultController<Uint8Array>;

  const write = (text: string) => {
    if (closed) return;
    try {
      controller.enqueue(encoder.encode(text));
    } catch {
      close();
    }
  };
  const sendEvent = (event: LiveEvent) => {
    write(`id: ${event.seq}\ndata: ${JSON.stringify(event)}\n\n`);
    if (BigInt(event.seq) > lastSeq) lastSeq = BigInt(event.seq);
  };
  const take = (notice: LiveNotice) => {
    if (!mayReceive(audience, notice)) return;
    if (held) held.push(notice);
    else if (BigInt(notice.seq) > lastSeq) sendEvent(liveEventOf(notice));
  };
  const release = () => {
    const waiting = held ?? [];
    held = null;
    for (const notice of waiting) if (BigInt(notice.seq) > lastSeq) sendEvent(liveEventOf(notice));
  };
  /** Everything after lastSeq from the log (several rounds when far behind), then what arrived meanwhile. */
  const catchUp = async () => {
    held ??= [];
    const { events, complete } = await replayLive(audience, lastSeq.toString());
    for (const event of events) sendEvent(event);
    if (!complete) {
      const newest = BigInt(await currentLiveSeq(audience));
      write(`event: reset\nid: ${newest}\ndata: ${JSON.stringify({ seq: newest.toString() })}\n\n`);
      lastSeq = newest;
    }
    release();
  };
  const serial = (step: () => Promise<void>) => {
    work = work.then(step).catch((error: unknown) => {
      console.error('[live] stream failed', error);
      close();
    });
    return work;
  };
  function close() {
    if (closed) return;
    closed = true;
    clearInterval(heartbeat);
    unsubscribe();
    options.signal?.removeEventListener('abort', close);
    try {
      controller.close();
    } catch {
      // Already closed or cancelled by the client.
    }
  }

  const stream = new ReadableStream<Uint8Array>({
    start(c) {
      controller = c;
    },
    cancel() {
      close();
    },
  });

  try {
    unsubscribe = await hub.subscribe({ onNotice: take, onResync: () => void serial(catchUp) });
  } catch (error) {
    console.error('[live] cannot listen', error instanceof Error ? error.message : error);
    throw new AppError(503, 'Live updates are not available right now; the screen refreshes by itself.');
  }
  write(`retry: ${RETRY_MS}\n\n`);
  await serial(async () => {
    if (options.after !== null) {
      lastSeq = BigInt(options.after);
      await catchUp();
      return;
    }
    const newest = await currentLiveSeq(audience);
    lastSeq = BigInt(newest);
    write(`event: ready\nid: ${newest}\ndata: ${JSON.stringify({ seq: newest })}\n\n`);
    release();
  });
  if (options.once) {
    close();
  } else if (!closed) {
    options.signal?.addEventListener('abort', close, { once: true });
    if (options.signal?.aborted) close();
    heartbeat = setInterval(() => {
      write(': heartbeat\n\n');
      void serial(async () => {
        if (!options.claims) return;
        const fresh = await userFromClaims(options.claims);
        if (!fresh) close();
        else audience = fresh;
      });
    }, options.heartbeatMs ?? HEARTBEAT_MS);
  }
  return new Response(stream, { status: 200, headers: LIVE_HEADERS });
}
