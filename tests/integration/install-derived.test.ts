import { randomUUID } from 'node:crypto';
import pg from 'pg';
import { QueryTypes } from 'sequelize';
import { afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { resinClockSpec } from '@/lib/cure';
import { ensureDerived, flagKindsNowSql, settingsOf, severityRankSql } from '@/lib/data/install-derive';
import { listInstalls } from '@/lib/data/install-list';
import { installClock } from '@/lib/install/plan-and-flags';
import { deriveInstallState } from '@/lib/install/state';
import { worstRank } from '@/lib/review/flags';
import { installListQuerySchema } from '@/lib/validation/reviews';
import { Company, Install, InstallEvent, Packer, Repair, ResinKit, ResinSystem, sequelize } from '@/models';
import { T0, at, body, cleanInstall, postAll, postEvent, startInstall } from './helpers/installs';
import { signInAs } from './helpers/session';
import { makeInstallWorld, type InstallWorld } from './helpers/world';

// The state a tap keeps on the install's row must be what the whole log says (deriveInstallState + the flags of
// installClock at the database's now()), whatever the crew sent: taps in and out of order, replays, corrections.
// And an ordinary tap must cost the same whatever the length of the log.

let w: InstallWorld;
beforeAll(async () => {
  w = await makeInstallWorld('Derived');
});
afterEach(() => vi.restoreAllMocks());

const freshRepair = () =>
  Repair.create({
    companyId: w.company.id,
    jobId: w.job.id,
    segmentId: w.segment.id,
    distanceMm: 9000,
    defectType: 'hole',
    conditionGrade: 3,
    defectLengthMm: 300,
  });

const officeUser = () => ({
  id: w.office.id,
  companyId: w.company.id,
  role: 'office' as const,
  name: w.office.name,
  email: w.office.email,
  crewIds: [],
});

/** The stored row next to what the log says now (both read at one database instant). */
async function compare(installId: string) {
  const [row] = await sequelize.query<Record<string, unknown> & { now: Date; kinds: string[]; rank: number }>(
    `SELECT now() AS now, ${flagKindsNowSql()} AS kinds, ${severityRankSql()} AS rank, i.*
     FROM installs i LEFT JOIN resin_kits k ON k.id = i.resin_kit_id WHERE i.id = :id`,
    { replacements: { id: installId }, type: QueryTypes.SELECT },
  );
  const events = await InstallEvent.findAll({ where: { installId } });
  const state = deriveInstallState(events.map((e) => e.get({ plain: true })));
  const install = (await Install.findByPk(installId))!;
  const [resin, packer, kit, company] = await Promise.all([
    install.resinSystemId ? ResinSystem.findByPk(install.resinSystemId) : null,
    install.packerId ? Packer.findByPk(install.packerId) : null,
    install.resinKitId ? ResinKit.findByPk(install.resinKitId) : null,
    Company.findByPk(install.companyId),
  ]);
  const clockAt = (now: Date | null) =>
    installClock({
      state,
      resin: resin ? resinClockSpec(resin) : null,
      packer: packer ? { minPressureKpa: packer.minPressureKpa, maxPressureKpa: packer.maxPressureKpa } : null,
      resinKitExpiresOn: kit?.expiresOn ?? null,
      safetyMargin: company!.workingWindowSafetyMargin,
      holdReserve: company!.holdReserve,
      unitSystem: company!.unitSystem,
      now,
    });
  const { plan, flags } = clockAt(new Date(row.now));
  // What holds whatever the time: the rank the row keeps for the severity list.
  const timeless = clockAt(null);
  const mixedPlan = plan && !plan.preview ? plan : null;
  const ms = (value: unknown) => (value == null ? null : new Date(value as string).getTime());
  const stored = {
    step: install.step,
    eventCount: install.eventCount,
    lastDeviceTime: ms(install.lastDeviceTime),
    mixedAt: ms(install.mixedAt),
    inflatedAt: ms(install.inflatedAt),
    deflatedAt: ms(install.deflatedAt),
    inflateBy: ms(install.inflateBy),
    deflateAfter: ms(install.deflateAfter),
    holdPlannedMin: install.holdPlannedMin === null ? null : Number(install.holdPlannedMin.toFixed(2)),
    maxPressureKpa: install.maxPressureKpa,
    kindsNow: [...row.kinds].sort(),
    rankNow: Number(row.rank),
    storedRank: install.severityRank,
    derived: install.derivedAt !== null,
  };
  const fromLog = {
    step: state.step,
    eventCount: events.length,
    lastDeviceTime: ms(state.log.at(-1)?.deviceTime),
    mixedAt: ms(state.mixedAt),
    inflatedAt: ms(state.inflatedAt),
    deflatedAt: ms(state.deflatedAt),
    inflateBy: ms(mixedPlan?.inflateBy),
    deflateAfter: ms(mixedPlan?.deflateAfter),
    holdPlannedMin: mixedPlan?.keepInflatedMin == null ? null : Number(mixedPlan.keepInflatedMin.toFixed(2)),
    maxPressureKpa: state.pressuresKpa.length ? Math.max(...state.pressuresKpa) : null,
    kindsNow: flags.map((f) => f.kind).sort(),
    rankNow: worstRank(flags),
    storedRank: worstRank(timeless.flags),
    derived: true,
  };
  return { stored, fromLog, flags, finishedAt: ms(install.finishedAt) };
}

async function expectStoredMatchesLog(installId: string, context: string) {
  const { stored, fromLog } = await compare(installId);
  expect(stored, context).toEqual(fromLog);
}

/** A small seeded random source, so a failing sequence can be replayed from its seed. */
function random(seed: number) {
  let s = seed >>> 0;
  return () => (s = (Math.imul(s ^ (s >>> 15), 2246822507) + 0x9e3779b9) >>> 0) / 2 ** 32;
}

describe('the derived state on the install row', () => {
  it('equals the log after every tap of realistic random sequences: out of order, replays, corrections', async () => {
    await signInAs(w.foreman);
    const seen = { swapped: 0, replays: 0, corrections: 0 };
    for (const seed of [1, 2, 3, 4, 5, 6]) {
      const rnd = random(seed);
      const pick = <T>(list: T[]) => list[Math.floor(rnd() * list.length)];
      const repair = await freshRepair();
      const id = await startInstall({ ...w, repair });
      const bend = {
        bladder_inflated: 32 + Math.round(rnd() * 40), // sometimes after the 30 min working window
        bladder_deflated: 120 + Math.round(rnd() * 40), // sometimes inside the hold
        ...(rnd() < 0.3 ? { conditions_recorded: 13 } : {}),
      };
      const taps = cleanInstall(w, bend).filter((tap) => !(tap.type === 'dry_run_finished' && rnd() < 0.3));
      // Pressure readings and notes while the bladder is up, some outside the packer's 70–150 kPa.
      const extra = Array.from({ length: 3 + Math.floor(rnd() * 5) }, (_, i) =>
        rnd() < 0.5
          ? body('pressure_reading', 100 + i, { pressureKpa: Math.round(60 + rnd() * 110) })
          : body('note', 100 + i, { text: `note ${i}` }),
      );
      const inOrder = [...taps, ...extra].sort((a, b) => a.deviceTime.localeCompare(b.deviceTime));
      // Two tablets: now and then a tap arrives after the one that followed it.
      const sent = [...inOrder];
      for (let i = 1; i < sent.length; i++) {
        if (rnd() < 0.15) {
          [sent[i - 1], sent[i]] = [sent[i], sent[i - 1]];
          seen.swapped += 1;
        }
      }
      const accepted: typeof sent = [];
      for (const tap of sent) {
        const answer = await postEvent(id, tap);
        expect([201, 422], `seed ${seed} ${tap.type}: ${JSON.stringify(answer.body)}`).toContain(answer.status);
        if (answer.status === 201) accepted.push(tap);
        if (rnd() < 0.2 && accepted.length) {
          // An outbox replay of something already stored: the stored event, nothing changes.
          expect((await postEvent(id, pick(accepted))).status).toBe(200);
          seen.replays += 1;
        }
        if (rnd() < 0.2 && accepted.length) {
          const target = pick(accepted);
          const correction =
            target.type === 'conditions_recorded'
              ? { payload: { pipeTempC: Math.round(rnd() * 45) } }
              : target.type === 'pressure_reading' || target.type === 'bladder_inflated'
                ? { payload: { pressureKpa: Math.round(60 + rnd() * 110) } }
                : {
                    deviceTime: new Date(
                      new Date(target.deviceTime).getTime() + Math.round((rnd() - 0.5) * 20) * 60_000,
                    ).toISOString(),
                  };
          // Named by the device's id or by the server's.
          const byServerId =
            rnd() < 0.5 ? (await InstallEvent.findOne({ where: { clientEventId: target.clientEventId } }))!.id : null;
          const fix = body(
            'correction',
            200,
            { reason: 'Read the wrong figure', ...correction },
            { correctsEventId: byServerId ?? target.clientEventId },
          );
          const answer = await postEvent(id, fix);
          expect([201, 422], `seed ${seed} correction: ${JSON.stringify(answer.body)}`).toContain(answer.status);
          if (answer.status === 201) seen.corrections += 1;
        }
        await expectStoredMatchesLog(id, `seed ${seed} after ${tap.type}`);
      }
    }
    // The sequences did take each path: out-of-order taps, replays and stored corrections.
    expect(Math.min(seen.swapped, seen.replays, seen.corrections), JSON.stringify(seen)).toBeGreaterThan(0);
  }, 240_000);

  it('raises the flags time passing brings in SQL against now(): a mix left uninflated, a kit expiring before its mix', async () => {
    await signInAs(w.foreman);
    const late = await startInstall({ ...w, repair: await freshRepair() });
    // Mixed an hour ago (30 min working window): not inflated, so late now — the stored kinds cannot know it.
    const minutesAgo = (min: number) => (Date.now() - T0) / 60_000 - min;
    await postAll(
      late,
      cleanInstall(w, { resin_mixed: minutesAgo(60) }).filter((t) =>
        ['safety_acknowledged', 'conditions_recorded', 'resin_mixed'].includes(t.type),
      ),
    );
    const lateRow = await compare(late);
    expect(lateRow.stored).toEqual(lateRow.fromLog);
    expect(lateRow.stored.kindsNow).toContain('late-inflate');
    expect((await Install.findByPk(late))!.flagKinds).not.toContain('late-inflate');

    // Conditions recorded with a good kit that then expires before the resin is mixed.
    const kit = await ResinKit.create({
      companyId: w.company.id,
      resinSystemId: w.resinSystem.id,
      lot: `SOON-${randomUUID().slice(0, 6)}`,
      expiresOn: '2099-01-01',
      quantityL: 5,
    });
    const waiting = await startInstall({ ...w, repair: await freshRepair() });
    await postAll(waiting, [
      body('conditions_recorded', 13, {
        mixTempC: 20,
        pipeTempC: 20,
        resinKitId: kit.id,
        packerId: w.packer.id,
        patchLengthMm: 910,
      }),
    ]);
    expect((await compare(waiting)).stored.kindsNow).not.toContain('expired-resin');
    await kit.update({ expiresOn: '2021-06-30' });
    const expired = await compare(waiting);
    expect(expired.stored).toEqual(expired.fromLog);
    expect(expired.stored.kindsNow).toContain('expired-resin');
  });

  it('derives rows made without it (older rows, seeds) on the first read, and orders the severity list in SQL', async () => {
    await signInAs(w.foreman);
    const ids: string[] = [];
    for (const bend of [{}, { bladder_inflated: 70 }, { bladder_deflated: 100 }]) {
      const id = await startInstall({ ...w, repair: await freshRepair() });
      await postAll(id, cleanInstall(w, bend));
      ids.push(id);
    }
    const before = await Promise.all(ids.map((id) => compare(id)));
    // As a seed leaves them: nothing derived.
    await Install.update(
      { derivedAt: null, derivedFold: null, flagKinds: [], worstSeverity: null, step: 'safety', eventCount: 0 },
      { where: { id: ids } },
    );
    await ensureDerived(w.office, settingsOf(w.company.get({ plain: true })));
    for (const [i, id] of ids.entries()) expect((await compare(id)).stored).toEqual(before[i].stored);

    await Install.update({ derivedAt: null }, { where: { id: ids } });
    const office = officeUser();
    const page = await listInstalls(office, installListQuerySchema.parse({ sort: 'severity', pageSize: '100' }));
    expect(await Install.count({ where: { companyId: w.company.id, derivedAt: null } })).toBe(0);
    const ranks = page.items.map((item) => worstRank(item.flags));
    expect(ranks).toEqual([...ranks].sort((a, b) => b - a));
    expect(page.items.find((item) => item.id === ids[1])!.worstSeverity).toBe('critical');
    const cleanFirst = await listInstalls(office, installListQuerySchema.parse({ sort: '-severity', pageSize: '100' }));
    const cleanRanks = cleanFirst.items.map((item) => worstRank(item.flags));
    expect(cleanRanks).toEqual([...cleanRanks].sort((a, b) => a - b));
  });
});

describe('the severity list', () => {
  /** Every install of the company in the order its flags worked out from its own log give now. */
  async function orderFromLogs(dir: 'asc' | 'desc') {
    const installs = await Install.findAll({ where: { companyId: w.company.id }, attributes: ['id'] });
    const rows = await Promise.all(installs.map(async ({ id }) => ({ id, ...(await compare(id)) })));
    const sign = dir === 'asc' ? -1 : 1;
    return rows
      .sort(
        (a, b) =>
          sign * (a.fromLog.rankNow - b.fromLog.rankNow) ||
          (a.finishedAt ?? Infinity) - (b.finishedAt ?? Infinity) ||
          (a.id < b.id ? -1 : a.id > b.id ? 1 : 0),
      )
      .map((row) => row.id);
  }
  const listed = async (sort: string, pageSize: number, page = 1) =>
    listInstalls(officeUser(), installListQuerySchema.parse({ sort, pageSize: String(pageSize), page: String(page) }));

  it('orders and pages from the stored rank exactly as the flags of each log, running clocks and corrections included', async () => {
    await signInAs(w.foreman);
    const minutesAgo = (min: number) => (Date.now() - T0) / 60_000 - min;
    const made: Record<string, string> = {};
    for (const [name, bend] of Object.entries({
      clean: {},
      late: { bladder_inflated: 70 },
      early: { bladder_deflated: 100 },
    })) {
      made[name] = await startInstall({ ...w, repair: await freshRepair() });
      await postAll(made[name], cleanInstall(w, bend));
    }
    const mixedOnly = (mixedMinAgo: number) =>
      cleanInstall(w, { resin_mixed: minutesAgo(mixedMinAgo) }).filter((t) =>
        ['safety_acknowledged', 'conditions_recorded', 'resin_mixed'].includes(t.type),
      );
    // Running: one mixed an hour ago and never inflated (its inflate-by has passed), one mixed just now.
    made.overdue = await startInstall({ ...w, repair: await freshRepair() });
    await postAll(made.overdue, mixedOnly(60));
    made.fresh = await startInstall({ ...w, repair: await freshRepair() });
    await postAll(made.fresh, mixedOnly(1));
    made.notStarted = await startInstall({ ...w, repair: await freshRepair() });

    const overdue = await compare(made.overdue);
    expect(overdue.fromLog.rankNow).toBe(2);
    expect(overdue.stored.storedRank).toBeLessThan(2); // time passing, not the stored kinds, makes it critical
    for (const dir of ['asc', 'desc'] as const) {
      const expected = await orderFromLogs(dir);
      const sort = dir === 'asc' ? 'severity' : '-severity';
      expect((await listed(sort, 100)).items.map((item) => item.id)).toEqual(expected);
      // Page by page, the same order (the page's end is taken from each side before merging).
      const pages = [];
      for (let page = 1; page <= Math.ceil(expected.length / 3); page++)
        pages.push(...(await listed(sort, 3, page)).items.map((item) => item.id));
      expect(pages).toEqual(expected);
      expect((await listed(sort, 3)).total).toBe(expected.length);
    }

    // A correction moves the late inflate back inside the working window: its stored rank follows.
    const late = await compare(made.late);
    expect(late.stored.storedRank).toBe(2);
    const inflated = await InstallEvent.findOne({ where: { installId: made.late, type: 'bladder_inflated' } });
    const fix = body(
      'correction',
      300,
      { reason: 'Wrong time', deviceTime: at(40) },
      { correctsEventId: inflated!.clientEventId },
    );
    expect((await postEvent(made.late, fix)).status).toBe(201);
    const corrected = await compare(made.late);
    expect(corrected.stored).toEqual(corrected.fromLog);
    expect(corrected.stored.storedRank).toBeLessThan(2);
    expect((await listed('severity', 100)).items.map((item) => item.id)).toEqual(await orderFromLogs('asc'));
  });
});

describe('the cost of a tap', () => {
  /**
   * Runs `fn` counting the round trips to PostgreSQL (every query of the driver, Sequelize's and the quick tap
   * path's) and the most rows any statement of each brought back.
   */
  async function measured(fn: () => Promise<unknown>) {
    const queries: { sql: string; rows: number }[] = [];
    type Query = (this: pg.Client, ...args: unknown[]) => unknown;
    const original = pg.Client.prototype.query as unknown as Query;
    const record = (sql: string, result: unknown) => {
      const results = (Array.isArray(result) ? result : [result]) as ({ rows?: unknown[] } | undefined)[];
      queries.push({ sql, rows: Math.max(0, ...results.map((r) => r?.rows?.length ?? 0)) });
    };
    const spy = vi.spyOn(pg.Client.prototype, 'query').mockImplementation(function (this: pg.Client, ...args) {
      const sql = String(typeof args[0] === 'string' ? args[0] : (args[0] as { text?: string })?.text);
      const callback = args.at(-1);
      if (typeof callback === 'function') {
        return original.call(this, ...args.slice(0, -1), (error: unknown, result: unknown) => {
          if (!error) record(sql, result);
          callback(error, result);
        });
      }
      return (original.apply(this, args) as Promise<unknown>).then((result) => {
        record(sql, result);
        return result;
      });
    } as Query as never);
    await fn();
    spy.mockRestore();
    return queries;
  }

  /** An install mixed and inflated, with `notes` more notes in its log (written straight to the table). */
  async function installWithLog(notes: number) {
    await signInAs(w.foreman);
    const id = await startInstall({ ...w, repair: await freshRepair() });
    await postAll(id, cleanInstall(w).slice(0, 10));
    const base = T0 + 40 * 60_000;
    await InstallEvent.bulkCreate(
      Array.from({ length: notes }, (_, i) => ({
        companyId: w.company.id,
        installId: id,
        clientEventId: randomUUID(),
        type: 'note' as const,
        deviceTime: new Date(base + i * 1000),
        receivedAt: new Date(),
        userId: w.foreman.id,
        payload: { text: `reading ${i}` },
      })),
    );
    // The bulk insert went around the tap: derive the row again, as for a seeded one.
    await Install.update({ derivedAt: null }, { where: { id } });
    await ensureDerived(w.foreman, settingsOf(w.company.get({ plain: true })));
    return id;
  }

  it('sends the same queries and reads the same rows at 10 events as at 1,000, never the log', async () => {
    const short = await installWithLog(0);
    const long = await installWithLog(990);
    expect((await Install.findByPk(long))!.eventCount).toBe(1000);
    const tapAt = (min: number) => body('pressure_reading', min, { pressureKpa: 101 });
    const cost = async (id: string, min: number) =>
      measured(async () => expect((await postEvent(id, tapAt(min))).status).toBe(201));

    const [a, b] = [await cost(short, 60), await cost(long, 60)];
    const shape = (qs: typeof a) => qs.map((q) => q.rows);
    expect(a.length, a.map((q) => q.sql).join('\n')).toBe(b.length);
    expect(shape(a)).toEqual(shape(b));
    // Two round trips (lib/data/tap-in-order.ts): BEGIN, user, crews and install, its lock and the replay check; then
    // the row's update, the insert with the live stream's NOTIFY, and COMMIT (prepared statements, planned once).
    expect(a).toHaveLength(2);
    expect(a[0].sql).toMatch(
      /BEGIN;\s*EXECUTE setline_user_install\([^)]*\);\s*EXECUTE setline_tap_install[^;]*;\s*EXECUTE setline_tap_replay/,
    );
    expect(a[1].sql).toMatch(/EXECUTE setline_tap_update_\d+\([^;]*;\s*EXECUTE setline_tap_insert\([^;]*;\s*COMMIT$/);
    for (const q of b) if (/FROM "?install_events/.test(q.sql)) expect(q.rows, q.sql).toBeLessThanOrEqual(1);
    await expectStoredMatchesLog(long, 'long log after a tap');

    // A correction may read the log (corrections are rare) and still leaves the row right.
    const inflate = await InstallEvent.findOne({ where: { installId: long, type: 'bladder_inflated' } });
    const fix = await measured(async () =>
      expect(
        (
          await postEvent(
            long,
            body(
              'correction',
              61,
              { reason: 'Gauge misread', payload: { pressureKpa: 190 } },
              { correctsEventId: inflate!.id },
            ),
          )
        ).status,
      ).toBe(201),
    );
    expect(Math.max(...fix.map((q) => q.rows))).toBeGreaterThanOrEqual(1000);
    await expectStoredMatchesLog(long, 'long log after a correction');
    expect((await compare(long)).stored.kindsNow).toContain('pressure-out-of-range');
  });
});
