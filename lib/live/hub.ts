import 'server-only';
import pg from 'pg';
import { env } from '@/lib/env';
import { LIVE_CHANNEL, type LiveNotice } from '@/lib/data/live';

// One LISTEN connection per server process, shared by every live stream the process serves. It is a
// dedicated pg Client (a pooled connection would be handed back and lose its LISTEN). When the connection
// drops it reconnects with backoff, then tells every subscriber to replay from the log what it may have
// missed meanwhile. Each app server listens for itself, so a tap stored through one reaches streams on all.

export type LiveSubscriber = {
  onNotice: (notice: LiveNotice) => void;
  /** The listener was reconnected: notices may have been missed, replay from the log. */
  onResync: () => void;
};

const RECONNECT_MIN_MS = 500;
const RECONNECT_MAX_MS = 15_000;

export class LiveHub {
  private client: pg.Client | null = null;
  private connecting: Promise<void> | null = null;
  private subscribers = new Set<LiveSubscriber>();
  private retryMs = RECONNECT_MIN_MS;
  private retryTimer: ReturnType<typeof setTimeout> | null = null;
  private everConnected = false;
  private closed = false;

  constructor(private readonly connectionString: () => string) {}

  /** Adds a stream; resolves once the process is listening, so nothing committed after this is missed. */
  async subscribe(subscriber: LiveSubscriber): Promise<() => void> {
    this.subscribers.add(subscriber);
    const unsubscribe = () => {
      this.subscribers.delete(subscriber);
    };
    try {
      await this.ready();
    } catch (error) {
      unsubscribe();
      throw error;
    }
    return unsubscribe;
  }

  get size() {
    return this.subscribers.size;
  }

  /** Connected and listening (connects on first use). */
  ready(): Promise<void> {
    if (this.client) return Promise.resolve();
    this.connecting ??= this.connect().finally(() => {
      this.connecting = null;
    });
    return this.connecting;
  }

  /** Stops listening for good (tests; a second hub standing for a second app server). */
  async close(): Promise<void> {
    this.closed = true;
    if (this.retryTimer) clearTimeout(this.retryTimer);
    const client = this.client;
    this.client = null;
    this.subscribers.clear();
    await client?.end().catch(() => undefined);
  }

  private async connect(): Promise<void> {
    if (this.closed) throw new Error('The live hub is closed.');
    const client = new pg.Client({ connectionString: this.connectionString(), application_name: 'setline-live' });
    client.on('notification', (message) => {
      if (message.channel !== LIVE_CHANNEL || !message.payload) return;
      const notice = parseNotice(message.payload);
      if (!notice) return;
      for (const subscriber of [...this.subscribers]) {
        try {
          subscriber.onNotice(notice);
        } catch (error) {
          console.error('[live] a stream failed to take a notice', error);
        }
      }
    });
    const lost = (error?: Error) => {
      if (this.client !== client) return;
      this.client = null;
      console.warn('[live] listener connection lost', error?.message ?? '');
      client.end().catch(() => undefined);
      this.scheduleReconnect();
    };
    client.on('error', lost);
    client.on('end', () => lost());
    try {
      await client.connect();
      await client.query(`LISTEN ${LIVE_CHANNEL}`);
    } catch (error) {
      client.removeAllListeners();
      await client.end().catch(() => undefined);
      throw error;
    }
    this.client = client;
    this.retryMs = RECONNECT_MIN_MS;
    const resync = this.everConnected;
    this.everConnected = true;
    if (resync) for (const subscriber of [...this.subscribers]) subscriber.onResync();
  }

  private scheduleReconnect() {
    if (this.closed || this.retryTimer || this.subscribers.size === 0) return;
    const wait = this.retryMs;
    this.retryMs = Math.min(this.retryMs * 2, RECONNECT_MAX_MS);
    this.retryTimer = setTimeout(() => {
      this.retryTimer = null;
      this.ready().catch((error: Error) => {
        console.warn('[live] reconnect failed', error.message);
        this.scheduleReconnect();
      });
    }, wait);
    this.retryTimer.unref?.();
  }
}

/** A notice as sent by notifyTap; null for anything else on the channel. */
export function parseNotice(payload: string): LiveNotice | null {
  try {
    const raw = JSON.parse(payload) as Record<string, unknown>;
    if (typeof raw.seq !== 'string' || typeof raw.installId !== 'string' || typeof raw.companyId !== 'string')
      return null;
    const crewIds = Array.isArray(raw.crewIds) ? raw.crewIds.filter((id): id is string => typeof id === 'string') : [];
    return {
      ...(raw as LiveNotice),
      crewIds,
      deviceTime: new Date(String(raw.deviceTime)).toISOString(),
      receivedAt: new Date(String(raw.receivedAt)).toISOString(),
    };
  } catch {
    return null;
  }
}

// One hub per process, kept on globalThis so dev hot reloads do not open a second listener.
const globalForHub = globalThis as unknown as { setlineLiveHub?: LiveHub };

export function liveHub(): LiveHub {
  globalForHub.setlineLiveHub ??= new LiveHub(() => env().DATABASE_URL);
  return globalForHub.setlineLiveHub;
}

/** Stops this process's listener and forgets it (the next stream starts a new one): tests and shutdown. */
export async function closeLiveHub(): Promise<void> {
  const hub = globalForHub.setlineLiveHub;
  globalForHub.setlineLiveHub = undefined;
  await hub?.close();
}
