import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { GET as liveRoute } from '@/app/api/live/route';
import { GET as boardRoute } from '@/app/api/live/board/route';
import { userFromClaims } from '@/lib/auth/session';
import { LiveHub, closeLiveHub, liveHub } from '@/lib/live/hub';
import { liveStreamResponse } from '@/lib/live/stream';
import { Repair, User } from '@/models';
import { call } from './helpers/call';
import { body, cleanInstall, postAll, postEvent, startInstall } from './helpers/installs';
import { signInAs, signOut } from './helpers/session';
import { makeInstallWorld, type InstallWorld } from './helpers/world';

// The live stream against the real PostgreSQL: a tap stored through the app's pool (one connection) is
// NOTIFYed on commit and reaches streams fed by LISTEN connections of their own (the process's hub, and a
// second hub standing for a second app server).

type Frame = { id?: string; event?: string; data?: string; retry?: string; comment?: string };

/** Reads an SSE body frame by frame (WHATWG HTML, "Server-sent events": a field per line, a blank line ends a frame). */
function sseReader(response: Response, abort?: AbortController) {
  const frames: Frame[] = [];
  const waiters = new Set<() => void>();
  const reader = response.body!.getReader();
  const decoder = new TextDecoder();
  let buffer = '';
  let ended = false;
  const pump = (async () => {
    for (;;) {
      const { value, done } = await reader.read().catch(() => ({ value: undefined, done: true }));
      if (done) break;
      buffer += decoder.decode(value, { stream: true });
      let cut: number;
      while ((cut = buffer.indexOf('\n\n')) >= 0) {
        const raw = buffer.slice(0, cut);
        buffer = buffer.slice(cut + 2);
        const frame: Frame = {};
        for (const line of raw.split('\n')) {
          if (line.startsWith(':')) frame.comment = line.slice(1).trim();
          const match = /^(id|event|data|retry): ?(.*)$/.exec(line);
          if (match) frame[match[1] as 'id' | 'event' | 'data' | 'retry'] = match[2];
        }
        frames.push(frame);
      }
      for (const wake of [...waiters]) wake();
    }
    ended = true;
    for (const wake of [...waiters]) wake();
  })();
  /** The first frame (from `from` on) that matches, or a failure after `timeoutMs`. */
  const next = (match: (f: Frame) => boolean, timeoutMs = 5000, from = 0) =>
    new Promise<Frame>((resolve, reject) => {
      const check = () => {
        const found = frames.slice(from).find(match);
        if (found) {
          cleanup();
          resolve(found);
        } else if (ended) {
          cleanup();
          reject(new Error(`stream ended without the frame; got ${JSON.stringify(frames)}`));
        }
      };
      const timer = setTimeout(() => {
        cleanup();
        reject(new Error(`no such frame within ${timeoutMs} ms; got ${JSON.stringify(frames)}`));
      }, timeoutMs);
      const cleanup = () => {
        clearTimeout(timer);
        waiters.delete(check);
      };
      waiters.add(check);
      check();
    });
  const taps = () => frames.filter((f) => f.data && !f.event).map((f) => ({ ...JSON.parse(f.data!), sseId: f.id }));
  const close = async () => {
    abort?.abort();
    await reader.cancel().catch(() => undefined);
    await pump;
  };
  return { frames, next, taps, close, done: pump, isTap: (f: Frame) => Boolean(f.data && !f.event) };
}

/** Opens GET /api/live as whoever is signed in now. */
async function openLive(headers: Record<string, string> = {}, query = '') {
  const abort = new AbortController();
  const response = await liveRoute(new Request(`http://localhost/api/live${query}`, { headers, signal: abort.signal }));
  expect(response.status).toBe(200);
  const stream = sseReader(response, abort);
  const ready =
    query.includes('once') || headers['last-event-id'] ? null : await stream.next((f) => f.event === 'ready');
  return { response, ...stream, readySeq: ready?.id ?? null };
}

describe('GET /api/live', () => {
  let w: InstallWorld;
  let installId: string;
  beforeAll(async () => {
    w = await makeInstallWorld('Live');
    await signInAs(w.foreman);
    installId = await startInstall(w);
  });
  beforeEach(() => signOut());
  afterAll(() => closeLiveHub());

  it('is a text/event-stream that does not wait in buffers, with its first id (ready)', async () => {
    await signInAs(w.office);
    const live = await openLive();
    expect(live.response.headers.get('content-type')).toBe('text/event-stream; charset=utf-8');
    expect(live.response.headers.get('cache-control')).toBe('no-cache, no-transform');
    expect(live.response.headers.get('x-accel-buffering')).toBe('no');
    expect(live.readySeq).toMatch(/^\d+$/);
    // The browser waits 2 s before reconnecting; the ready frame carries the newest id as its SSE id.
    expect(live.frames[0]).toEqual({ retry: '2000' });
    expect(live.frames[1]).toMatchObject({ event: 'ready', id: live.readySeq });
    await live.close();
  });

  it('delivers a tap posted on another connection within 2 s, to this server and a second one', async () => {
    await signInAs(w.office);
    const live = await openLive();
    // A second app server: a hub with its own LISTEN connection, serving a stream of its own.
    const secondServer = new LiveHub(() => process.env.DATABASE_URL!);
    const office = (await userFromClaims({
      sub: w.office.id,
      companyId: w.company.id,
      role: 'office',
      tokenVersion: w.office.tokenVersion,
    }))!;
    const other = sseReader(await liveStreamResponse(office, { after: null, once: false, hub: secondServer }));
    await other.next((f) => f.event === 'ready');

    await signInAs(w.foreman);
    const started = Date.now();
    const tap = body('safety_acknowledged', 0);
    const posted = await postEvent(installId, tap);
    expect(posted.status).toBe(201);
    const frame = await live.next(live.isTap, 2000);
    const elapsed = Date.now() - started;
    const data = JSON.parse(frame.data!);
    expect(data).toMatchObject({
      id: installId,
      installId,
      type: 'safety_acknowledged',
      step: 'checks',
      eventId: posted.body.event.id,
      status: 'in_progress',
    });
    expect(frame.id).toBe(data.seq);
    expect(BigInt(frame.id!)).toBeGreaterThan(BigInt(live.readySeq!));
    expect(elapsed).toBeLessThan(2000);
    // Routing fields stay on the server.
    expect(data).not.toHaveProperty('companyId');
    expect(data).not.toHaveProperty('crewIds');

    const onSecond = await other.next(other.isTap, 2000);
    expect(JSON.parse(onSecond.data!)).toMatchObject({ id: installId, type: 'safety_acknowledged', step: 'checks' });
    await other.close();
    await secondServer.close();
    await live.close();
  });

  it('never sends a field user another crew’s installs, nor anyone another company’s', async () => {
    const stranger = await makeInstallWorld('Elsewhere');
    await signInAs(w.otherTechnician);
    const otherCrew = await openLive();
    await signInAs(stranger.office);
    const otherCompany = await openLive();
    await signInAs(w.technician);
    const ownCrew = await openLive();

    await signInAs(w.foreman);
    expect(
      (
        await postEvent(
          installId,
          body('checks_done', 4, {
            items: [
              { id: 'flow', ok: true },
              { id: 'clean', ok: true },
            ],
          }),
        )
      ).status,
    ).toBe(201);
    const seen = await ownCrew.next(ownCrew.isTap, 2000);
    expect(JSON.parse(seen.data!)).toMatchObject({ id: installId, type: 'checks_done', step: 'dry_run' });
    // The same notice reached every stream of the process at once; a second more rules out a late one.
    await new Promise((resolve) => setTimeout(resolve, 1000));
    expect(otherCrew.taps()).toEqual([]);
    expect(otherCompany.taps()).toEqual([]);

    // Nor does a replay of the log hand them over.
    await signInAs(w.otherTechnician);
    const replayed = await openLive({ 'last-event-id': '0' }, '?once=1');
    await replayed.done;
    expect(replayed.taps()).toEqual([]);
    await signInAs(w.technician);
    const ownReplay = await openLive({ 'last-event-id': '0' }, '?once=1');
    await ownReplay.done;
    expect(ownReplay.taps().map((t) => t.type)).toEqual(['safety_acknowledged', 'checks_done']);
    for (const stream of [otherCrew, otherCompany, ownCrew]) await stream.close();
  });

  it('resumes after Last-Event-ID: what was committed while away is replayed in order, then live again', async () => {
    await signInAs(w.office);
    const first = await openLive();
    const lastSeen = first.readySeq!;
    await first.close();

    await signInAs(w.foreman);
    const away = [body('dry_run_started', 8), body('dry_run_finished', 11, { seconds: 180 })];
    for (const tap of away) expect((await postEvent(installId, tap)).status).toBe(201);

    await signInAs(w.office);
    const resumed = await openLive({ 'last-event-id': lastSeen });
    const replay = await resumed.next((f) => resumed.taps().length >= 2 && resumed.isTap(f));
    expect(replay).toBeDefined();
    expect(resumed.taps().map((t) => [t.type, t.step])).toEqual([
      ['dry_run_started', 'dry_run'],
      ['dry_run_finished', 'conditions'],
    ]);
    const ids = resumed.taps().map((t) => BigInt(t.sseId));
    expect(ids[0]).toBeGreaterThan(BigInt(lastSeen));
    expect(ids[1]).toBeGreaterThan(ids[0]);

    // …and the same stream goes on live.
    await signInAs(w.foreman);
    const count = resumed.frames.length;
    const conditions = {
      mixTempC: 20,
      pipeTempC: 20,
      resinKitId: w.resinKit.id,
      packerId: w.packer.id,
      patchLengthMm: 910,
    };
    expect((await postEvent(installId, body('conditions_recorded', 13, conditions))).status).toBe(201);
    const live = await resumed.next(resumed.isTap, 2000, count);
    expect(JSON.parse(live.data!)).toMatchObject({ type: 'conditions_recorded', step: 'mix' });
    await resumed.close();

    // The same resume through the query parameter (for clients that cannot set the header).
    await signInAs(w.office);
    const polled = await openLive({}, `?once=1&lastEventId=${lastSeen}`);
    await polled.done;
    expect(polled.taps().map((t) => t.type)).toEqual(['dry_run_started', 'dry_run_finished', 'conditions_recorded']);
  });

  it('refuses signed-out callers and malformed ids, and ends the stream when the client goes', async () => {
    expect((await call(liveRoute, '/api/live')).status).toBe(401);
    await signInAs(w.office);
    const bad = await liveRoute(new Request('http://localhost/api/live', { headers: { 'last-event-id': 'abc' } }));
    expect(bad.status).toBe(400);
    expect((await call(liveRoute, '/api/live?lastEventId=-1')).status).toBe(400);
    expect((await call(liveRoute, '/api/live?other=1')).status).toBe(400);

    const before = liveHub().size;
    const live = await openLive();
    expect(liveHub().size).toBe(before + 1);
    await live.close();
    await expect.poll(() => liveHub().size).toBe(before);
  });

  it('sends a heartbeat comment and ends when the user is deactivated', async () => {
    const claims = { sub: w.admin.id, companyId: w.company.id, role: 'admin', tokenVersion: w.admin.tokenVersion };
    const admin = (await userFromClaims(claims))!;
    const stream = sseReader(await liveStreamResponse(admin, { after: null, once: false, claims, heartbeatMs: 100 }));
    await stream.next((f) => f.comment === 'heartbeat', 2000);
    await User.update({ active: false }, { where: { id: w.admin.id } });
    try {
      await stream.done;
    } finally {
      await User.update({ active: true }, { where: { id: w.admin.id } });
    }
    expect(stream.frames.filter((f) => f.comment === 'heartbeat').length).toBeGreaterThan(0);
  });
});

describe('GET /api/live/board', () => {
  let w: InstallWorld;
  let installId: string;
  beforeAll(async () => {
    w = await makeInstallWorld('Board');
    await signInAs(w.foreman);
    installId = await startInstall(w);
    expect((await postEvent(installId, body('safety_acknowledged', 0))).status).toBe(201);
  });

  it('lists the installs in progress with their step for the office and the crew’s foreman', async () => {
    for (const user of [w.office, w.admin, w.foreman]) {
      await signInAs(user);
      const { status, body: board } = await call(boardRoute, '/api/live/board');
      expect(status).toBe(200);
      const row = board.inProgress.find((i: { id: string }) => i.id === installId);
      expect(row).toMatchObject({
        step: 'checks',
        status: 'in_progress',
        crew: { id: w.crew.id },
        job: { id: w.job.id },
        inflateBy: null,
      });
      expect(board.timeZone).toBe('America/Denver');
    }
  });

  it('runs inflate-by from the mix, deflate-after from the inflate, moves a signed-off install to done today', async () => {
    // A zone where it is mid-day now, so the install signed off 2½ hours ago (device time) was signed off today.
    const offset = [...Array(27).keys()]
      .map((k) => k - 12)
      .find((h) => {
        const hour = (new Date().getUTCHours() + h + 24) % 24;
        return hour >= 8 && hour <= 20;
      })!;
    // The IANA Etc zones carry the POSIX sign: Etc/GMT-3 is UTC+3.
    const zone = offset === 0 ? 'Etc/UTC' : `Etc/GMT${offset > 0 ? '-' : '+'}${Math.abs(offset)}`;
    await w.company.update({ timeZone: zone });
    const repair = await Repair.create({
      companyId: w.company.id,
      jobId: w.job.id,
      segmentId: w.segment.id,
      distanceMm: 15000,
      defectType: 'hole',
      conditionGrade: 3,
      defectLengthMm: 300,
    });
    await signInAs(w.foreman);
    const id = await startInstall({ ...w, repair });
    const taps = cleanInstall(w);
    const boardRow = async () => {
      await signInAs(w.office);
      const { body: board } = await call(boardRoute, '/api/live/board');
      await signInAs(w.foreman);
      return {
        running: board.inProgress.find((i: { id: string }) => i.id === id),
        done: board.doneToday.find((i: { id: string }) => i.id === id),
      };
    };
    await postAll(id, taps.slice(0, 7)); // … resin mixed
    const mixed = (await boardRow()).running;
    expect(mixed).toMatchObject({ step: 'load', mixedAt: taps[6].deviceTime, deflateAfter: null });
    expect(Date.parse(mixed.inflateBy)).toBeGreaterThan(Date.parse(mixed.mixedAt));
    await postAll(id, taps.slice(7, 10)); // … bladder inflated
    const held = (await boardRow()).running;
    expect(held).toMatchObject({ step: 'hold', inflatedAt: taps[9].deviceTime, inflateBy: mixed.inflateBy });
    expect(Date.parse(held.deflateAfter)).toBeGreaterThan(Date.parse(held.inflatedAt));
    await postAll(id, taps.slice(10));
    const signed = await boardRow();
    expect(signed.running).toBeUndefined();
    expect(signed.done).toMatchObject({ status: 'awaiting_review', step: 'done', finishedAt: taps[13].deviceTime });
  });

  it('refuses technicians and shows nothing of another company', async () => {
    await signInAs(w.technician);
    expect((await call(boardRoute, '/api/live/board')).status).toBe(403);
    const stranger = await makeInstallWorld('Board elsewhere');
    await signInAs(stranger.office);
    const { body: theirs } = await call(boardRoute, '/api/live/board');
    expect(theirs.inProgress.map((i: { id: string }) => i.id)).not.toContain(installId);
    signOut();
    expect((await call(boardRoute, '/api/live/board')).status).toBe(401);
  });
});
