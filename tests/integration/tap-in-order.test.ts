import { randomUUID } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import type { SessionClaims } from '@/lib/auth/claims';
import type { SessionUser } from '@/lib/auth/session';
import { recordEvent } from '@/lib/data/install-events';
import { recordTapInOrder } from '@/lib/data/tap-in-order';
import { Install, InstallEvent, Repair, User } from '@/models';
import { T0, body, cleanInstall, postAll, postEvent, startInstall } from './helpers/installs';
import { signInAs } from './helpers/session';
import { makeInstallWorld, type InstallWorld } from './helpers/world';

// The tap's quick path (lib/data/tap-in-order.ts) takes the ordinary tap in two round trips and hands everything
// else to recordEvent. It must store exactly what recordEvent would, and hand over — writing nothing — whatever
// it does not take.

let w: InstallWorld;
beforeAll(async () => {
  w = await makeInstallWorld('Quick');
});

const claimsOf = (user: User): SessionClaims => ({
  sub: user.id,
  companyId: user.companyId,
  role: user.role,
  tokenVersion: user.tokenVersion,
});
const sessionUserOf = (user: User, crewIds: string[]): SessionUser => ({
  id: user.id,
  companyId: user.companyId,
  role: user.role,
  name: user.name,
  email: user.email,
  crewIds,
});

async function freshInstall() {
  const repair = await Repair.create({
    companyId: w.company.id,
    jobId: w.job.id,
    segmentId: w.segment.id,
    distanceMm: 4000 + Math.floor(Math.random() * 1000),
    defectType: 'hole',
    conditionGrade: 3,
    defectLengthMm: 300,
  });
  await signInAs(w.foreman);
  return startInstall({ ...w, repair });
}

/** The install's row and log without what differs between two installs (ids, times of writing). */
async function recordOf(installId: string) {
  const install = (await Install.findByPk(installId))!.get({ plain: true }) as Record<string, unknown>;
  for (const key of ['id', 'repairId', 'createdAt', 'updatedAt', 'derivedAt']) delete install[key];
  const fold = install.derivedFold as { lastReceivedAt?: string };
  delete fold.lastReceivedAt;
  const events = await InstallEvent.findAll({ where: { installId }, order: [['seq', 'ASC']] });
  const log = events.map((e) => {
    const { type, deviceTime, payload, userId, correctsEventId } = e.get({ plain: true });
    return { type, deviceTime, payload, userId, correctsEventId };
  });
  return { install, log };
}

describe('the quick tap path', () => {
  it('stores every tap it takes exactly as recordEvent does, and takes the ordinary ones', async () => {
    const [quick, full] = [await freshInstall(), await freshInstall()];
    const foreman = sessionUserOf(w.foreman, [w.crew.id]);
    const taps = cleanInstall(w);
    const taken: string[] = [];
    for (const tap of taps) {
      const answer = await recordTapInOrder(claimsOf(w.foreman), quick, tap);
      if (answer) taken.push(tap.type);
      else expect((await recordEvent(foreman, quick, tap)).created).toBe(true);
      expect((await recordEvent(foreman, full, { ...tap, clientEventId: randomUUID() })).created).toBe(true);
    }
    // The first tap starts the install (and its job); conditions, the decision and the sign-off read or write more.
    expect(taken).toEqual(
      taps
        .map((t) => t.type)
        .filter((t, i) => i > 0 && !['conditions_recorded', 'go_decision', 'signed_off'].includes(t)),
    );
    expect(await recordOf(quick)).toEqual(await recordOf(full));
  });

  it('hands over, writing nothing, every tap it must not take', async () => {
    const id = await freshInstall();
    await postAll(id, cleanInstall(w).slice(0, 3));
    const count = () => InstallEvent.count({ where: { installId: id } });
    const before = await count();
    const stored = await InstallEvent.findOne({ where: { installId: id, type: 'checks_done' } });
    const foremanClaims = claimsOf(w.foreman);
    const later = (extra: Record<string, unknown> = {}) => ({
      ...body('note', 20, { text: 'Flow holding upstream' }),
      ...extra,
    });
    const other = await freshInstall();
    const closed = await freshInstall();
    await postAll(closed, cleanInstall(w).slice(0, 1));
    await Install.update({ status: 'abandoned' }, { where: { id: closed } });
    const refused: [string, Promise<unknown>][] = [
      [
        'a replay',
        recordTapInOrder(foremanClaims, id, {
          clientEventId: stored!.clientEventId,
          type: stored!.type,
          deviceTime: stored!.deviceTime.toISOString(),
          payload: stored!.payload,
        }),
      ],
      [
        'a correction',
        recordTapInOrder(
          foremanClaims,
          id,
          body('correction', 20, { reason: 'x', payload: {} }, { correctsEventId: stored!.id }),
        ),
      ],
      ['conditions', recordTapInOrder(foremanClaims, id, cleanInstall(w)[4])],
      ['the first tap', recordTapInOrder(foremanClaims, other, body('safety_acknowledged', 0))],
      ['out of log order', recordTapInOrder(foremanClaims, id, body('note', 1, { text: 'late' }))],
      ['out of step', recordTapInOrder(foremanClaims, id, body('bladder_deflated', 20))],
      ['another crew', recordTapInOrder(claimsOf(w.otherTechnician), id, later())],
      ['another user named', recordTapInOrder(foremanClaims, id, later({ userId: w.technician.id }))],
      [
        'a stale session',
        recordTapInOrder({ ...foremanClaims, tokenVersion: w.foreman.tokenVersion + 1 }, id, later()),
      ],
      ['another company', recordTapInOrder({ ...foremanClaims, companyId: randomUUID() }, id, later())],
      ['an unknown install', recordTapInOrder(foremanClaims, randomUUID(), later())],
      ['a closed install', recordTapInOrder(foremanClaims, closed, later())],
      ['not an id', recordTapInOrder(foremanClaims, 'nope', later())],
      ['a bad body', recordTapInOrder(foremanClaims, id, { type: 'pressure_reading' })],
      [
        'a time far ahead',
        recordTapInOrder(foremanClaims, id, later({ deviceTime: new Date(Date.now() + 86_400_000).toISOString() })),
      ],
    ];
    for (const [what, answer] of refused) expect(await answer, what).toBeNull();
    expect(await count()).toBe(before);
    // Every connection went back to the pool and no lock was left: the next ordinary tap is taken.
    expect(await recordTapInOrder(foremanClaims, id, later())).not.toBeNull();
    expect(await count()).toBe(before + 1);
  });

  it('stores one row when the same tap id reaches two installs at once, and answers the second 409', async () => {
    const [a, b] = [await freshInstall(), await freshInstall()];
    for (const id of [a, b]) await postAll(id, cleanInstall(w).slice(0, 1));
    const tap = body('checks_done', 4, {
      items: [
        { id: 'flow', ok: true },
        { id: 'clean', ok: true },
      ],
    });
    const answers = await Promise.all([postEvent(a, tap), postEvent(b, tap)]);
    expect(answers.map((r) => r.status).sort()).toEqual([201, 409]);
    expect(await InstallEvent.count({ where: { clientEventId: tap.clientEventId } })).toBe(1);
  });

  it('answers a tap at the bench path through the route with 201, the event, and its step on the row', async () => {
    const id = await freshInstall();
    await postAll(id, cleanInstall(w).slice(0, 2));
    const tap = body('dry_run_started', 8);
    const answer = await postEvent(id, tap);
    expect(answer.status).toBe(201);
    expect(answer.body.event).toMatchObject({
      installId: id,
      clientEventId: tap.clientEventId,
      type: 'dry_run_started',
    });
    expect((await Install.findByPk(id))!.step).toBe('dry_run');
    expect(new Date(answer.body.event.deviceTime).getTime()).toBe(T0 + 8 * 60_000);
  });
});
