import 'fake-indexeddb/auto';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import {
  enqueueEvent,
  flushOutbox,
  listEntries,
  OutboxInputError,
  resetOutboxForTests,
  setOutboxUser,
} from '@/lib/client/outbox';
import { fakeServer, INSTALL_A, INSTALL_B, tap } from './fake-server';

// Each queued tap carries who made it and goes out only under that user's session.

const ANA = { id: '3f1d2c4b-5a69-4e7f-8a1b-2c3d4e5f6a7b', name: 'Ana Ruiz' };
const BO = { id: '9e8d7c6b-5a49-4382-9170-6f5e4d3c2b1a', name: 'Bo Lind' };
const tapBy = (user: { id: string; name: string }, installId = INSTALL_A, minute = 0) => ({
  ...tap(installId, 'note', minute),
  userId: user.id,
  userName: user.name,
});

beforeEach(resetOutboxForTests);
afterEach(resetOutboxForTests);

describe('the outbox and who is signed in', () => {
  it('keeps the user on the entry and sends it in the body', async () => {
    const entry = await enqueueEvent(tapBy(ANA));
    expect(entry).toMatchObject({ userId: ANA.id, userName: ANA.name, status: 'pending' });
    setOutboxUser(ANA);
    const server = fakeServer();
    expect(await flushOutbox({ fetchImpl: server.fetchImpl })).toEqual({ synced: 1, rejected: 0, remaining: 0 });
    expect(server.sent[0].body).toMatchObject({ clientEventId: entry.clientEventId, userId: ANA.id });
    expect(server.sent[0].body).not.toHaveProperty('userName');
  });

  it('sends only the signed-in user’s taps; the others wait, in order, until their user signs in', async () => {
    const a1 = await enqueueEvent(tapBy(ANA, INSTALL_A, 0));
    const b1 = await enqueueEvent(tapBy(BO, INSTALL_A, 1));
    const a2 = await enqueueEvent(tapBy(ANA, INSTALL_B, 2));
    const server = fakeServer();

    setOutboxUser(BO);
    expect(await flushOutbox({ fetchImpl: server.fetchImpl })).toEqual({
      synced: 1,
      rejected: 0,
      remaining: 2,
      waiting: 2,
    });
    expect(server.ids()).toEqual([b1.clientEventId]);
    expect((await listEntries()).map((e) => e.status)).toEqual(['pending', 'synced', 'pending']);

    setOutboxUser(ANA);
    expect(await flushOutbox({ fetchImpl: server.fetchImpl })).toEqual({ synced: 2, rejected: 0, remaining: 0 });
    expect(server.ids()).toEqual([b1.clientEventId, a1.clientEventId, a2.clientEventId]);
  });

  it('sends nobody’s taps while nobody is known, but still sends entries queued before taps carried a user', async () => {
    await enqueueEvent(tapBy(ANA));
    const legacy = await enqueueEvent(tap(INSTALL_B));
    const server = fakeServer();
    setOutboxUser(null);
    expect(await flushOutbox({ fetchImpl: server.fetchImpl })).toEqual({
      synced: 1,
      rejected: 0,
      remaining: 1,
      waiting: 1,
    });
    expect(server.ids()).toEqual([legacy.clientEventId]);
    // The user can also be given per flush.
    expect(await flushOutbox({ fetchImpl: server.fetchImpl, userId: ANA.id })).toEqual({
      synced: 1,
      rejected: 0,
      remaining: 0,
    });
  });

  it('parks a tap refused with 403 and keeps syncing the next ones', async () => {
    setOutboxUser(ANA);
    const refused = await enqueueEvent(tapBy(ANA, INSTALL_A, 0));
    const next = [await enqueueEvent(tapBy(ANA, INSTALL_A, 1)), await enqueueEvent(tapBy(ANA, INSTALL_B, 2))];
    const server = fakeServer((request) =>
      request.body.clientEventId === refused.clientEventId
        ? { status: 403, message: 'Only the foreman can sign off an install.' }
        : 201,
    );
    expect(await flushOutbox({ fetchImpl: server.fetchImpl })).toEqual({ synced: 2, rejected: 1, remaining: 0 });
    const [parked, ...rest] = await listEntries();
    expect(parked).toMatchObject({
      clientEventId: refused.clientEventId,
      status: 'rejected',
      lastError: 'Only the foreman can sign off an install.',
    });
    expect(rest.map((e) => [e.clientEventId, e.status])).toEqual(next.map((e) => [e.clientEventId, 'synced']));
  });

  it('refuses a malformed user id before anything is stored', async () => {
    await expect(enqueueEvent({ ...tap(), userId: 'ana' })).rejects.toBeInstanceOf(OutboxInputError);
    expect(await listEntries()).toEqual([]);
  });
});
