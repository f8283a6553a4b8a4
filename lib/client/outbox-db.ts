import { Dexie, type EntityTable } from 'dexie';

// The IndexedDB database behind lib/client/outbox.ts. Only the outbox modules use it.

/** 'rejected' is a tap the server refused for good: parked as "needs attention", kept on the tablet. */
export type OutboxStatus = 'pending' | 'synced' | 'rejected';

export type OutboxEntry = {
  clientEventId: string;
  installId: string;
  type: string;
  deviceTime: string;
  payload: Record<string, unknown>;
  correctsEventId?: string;
  /** Who tapped it: the entry is sent only while this user is signed in on the tablet. */
  userId?: string;
  /** Their name, for "waiting for <name> to sign in". */
  userName?: string;
  /** Insertion order, monotonic: IndexedDB's key generator never hands a number out twice. */
  seq: number;
  status: OutboxStatus;
  attempts: number;
  lastError?: string;
  syncedAt?: string;
};

const DB_NAME = 'setline-outbox';

class OutboxDb extends Dexie {
  entries!: EntityTable<OutboxEntry, 'seq'>;

  constructor() {
    super(DB_NAME);
    // A schema change is a new version() with an upgrade, never an edit of this one: tablets
    // in the field hold unsent entries in it.
    this.version(1).stores({
      entries: '++seq, &clientEventId, status, [status+seq], [installId+seq], [installId+status]',
    });
  }
}

// Opened on first use, so importing the outbox during a server render touches nothing.
let database: OutboxDb | null = null;

export function outboxDb(): OutboxDb {
  database ??= new OutboxDb();
  return database;
}

/**
 * The first pending entry that `userId` may send: their own, or one queued before entries carried
 * their user (sent under whoever is signed in, as it always was). Null `userId`: nobody known.
 */
export function firstSendable(userId: string | null): Promise<OutboxEntry | undefined> {
  return pendingInOrder()
    .filter((entry) => mayBeSentBy(entry, userId))
    .first();
}

export const mayBeSentBy = (entry: Pick<OutboxEntry, 'userId'>, userId: string | null) =>
  entry.userId === undefined || entry.userId === userId;

const pendingInOrder = () =>
  outboxDb().entries.where('[status+seq]').between(['pending', Dexie.minKey], ['pending', Dexie.maxKey]);

export async function deleteOutboxDb(): Promise<void> {
  database?.close();
  database = null;
  await Dexie.delete(DB_NAME);
}
