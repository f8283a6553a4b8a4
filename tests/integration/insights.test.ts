import Papa from 'papaparse';
import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { GET as insightsRoute } from '@/app/api/insights/route';
import { dayInZone } from '@/lib/time/dates';
import { Install } from '@/models';
import { makeInstallWorld, makeWorld, type InstallWorld, type World } from './helpers/world';
import { signInAs, signOut } from './helpers/session';
import { call } from './helpers/call';

// Fixtures: installs whose derived columns are set by hand, as the tap would have derived them from these events
// (company zone America/Denver; from 2026-11-01 02:00 local the zone is MST = UTC−7, so every instant below is
// local + 7 h). The packer of makeInstallWorld is rated 70–150 kPa. Planned hold = deflate-after − inflated.
//
//   A crew   mixed 11-02 08:00 (15:00Z); inflate-by +30 min, inflated +20 → margin +10; kept 105 of 99 planned;
//            max 120 kPa (80 % of 150); no flags
//   B crew   mixed 11-03 23:30 (11-04 06:30Z: still the 3rd locally); inflate-by +30, inflated +36 → margin −6;
//            kept 99 of 99; max 160 kPa (106.7 %); late-inflate + pressure-out-of-range
//   C other  mixed 11-10 09:00 (16:00Z); inflate-by +25, inflated +21 → margin +4; kept 60 of 99 (39 short);
//            max 100 kPa (66.7 %); early-deflate
//   D crew   mixed 11-15 23:59 (11-16 06:59Z: the last local day of the period); never inflated, its inflate-by
//            long gone: late-inflate counted from the deadline (no flag stored by a tap)
//   E crew   mixed 11-16 00:30 local (07:30Z) — after the period
//   F crew   mixed 11-01 23:00 local (11-02 06:00Z) — before the period, though its UTC day is in it
//   G crew   never mixed — not counted
//   and one install of another company inside the period.
const MIN = 60_000;
const at = (iso: string) => new Date(iso);
const plus = (t: Date, minutes: number) => new Date(t.getTime() + minutes * MIN);

describe('GET /api/insights', () => {
  let w: InstallWorld;
  let other: World;
  const url = (query: string) => `/api/insights?${query}`;
  const PERIOD = 'from=2026-11-02&to=2026-11-15';

  beforeAll(async () => {
    w = await makeInstallWorld('Insights');
    other = await makeWorld('InsightsOther');
    const base = {
      companyId: w.company.id,
      repairId: w.repair.id,
      jobId: w.job.id,
      packerId: w.packer.id,
      derivedAt: new Date(),
    };
    const done = (
      mixed: Date,
      inflateByMin: number,
      inflatedMin: number,
      keptMin: number,
      pressure: number,
      flags: string[],
    ) => {
      const inflated = plus(mixed, inflatedMin);
      return {
        mixedAt: mixed,
        inflateBy: plus(mixed, inflateByMin),
        inflatedAt: inflated,
        deflatedAt: plus(inflated, keptMin),
        deflateAfter: plus(inflated, 99),
        holdPlannedMin: 90,
        maxPressureKpa: pressure,
        flagKinds: flags,
        worstSeverity: flags.length ? ('critical' as const) : null,
        status: 'awaiting_review' as const,
      };
    };
    await Install.bulkCreate([
      { ...base, crewId: w.crew.id, ...done(at('2026-11-02T15:00:00Z'), 30, 20, 105, 120, []) },
      {
        ...base,
        crewId: w.crew.id,
        ...done(at('2026-11-04T06:30:00Z'), 30, 36, 99, 160, ['late-inflate', 'pressure-out-of-range']),
      },
      { ...base, crewId: w.otherCrew.id, ...done(at('2026-11-10T16:00:00Z'), 25, 21, 60, 100, ['early-deflate']) },
      {
        ...base,
        crewId: w.crew.id,
        mixedAt: at('2026-11-16T06:59:00Z'),
        inflateBy: at('2026-11-16T07:29:00Z'),
        status: 'in_progress',
      },
      { ...base, crewId: w.crew.id, ...done(at('2026-11-16T07:30:00Z'), 30, 10, 100, 100, ['early-deflate']) },
      { ...base, crewId: w.crew.id, ...done(at('2026-11-02T06:00:00Z'), 30, 40, 100, 100, ['late-inflate']) },
      { ...base, crewId: w.crew.id },
    ]);
    await Install.create({
      companyId: other.company.id,
      repairId: other.repair.id,
      jobId: other.job.id,
      crewId: other.crew.id,
      // Filled by hand like the rows above: marked derived, or the lazy derivation would rebuild it from no events.
      derivedAt: new Date(),
      ...done(at('2026-11-05T16:00:00Z'), 30, 50, 10, 300, ['late-inflate', 'early-deflate']),
    });
  });
  beforeEach(() => signOut());

  it('aggregates the period over the company-zone days, all crews', async () => {
    await signInAs(w.office);
    const { status, body } = await call(insightsRoute, url(PERIOD));
    expect(status).toBe(200);
    expect(body).toMatchObject({
      period: { from: '2026-11-02', to: '2026-11-15' },
      crew: null,
      installs: 4,
      flagged: 3,
      byFlag: { 'late-inflate': 2, 'pressure-out-of-range': 1, 'early-deflate': 1 },
      medianInflateMarginMin: 4, // of +10, −6, +4 (D is not inflated)
      worstInflateMarginMin: -6,
      hold: { measured: 3, short: 1, medianKeptMin: 99, medianPlannedMin: 99, worstShortfallMin: -39 },
      pressure: { measured: 3, aboveMax: 1, belowMin: 0, medianPctOfMax: 80 },
    });
    expect(Object.keys(body.byFlag)).toHaveLength(3);
    expect(body.marginBins).toEqual([
      { bin: 'late', installs: 1 },
      { bin: '0-5', installs: 1 },
      { bin: '5-10', installs: 0 },
      { bin: '10-20', installs: 1 },
      { bin: '20+', installs: 0 },
    ]);
    expect(body.pressure.bins).toEqual([
      { bin: '<50%', installs: 0 },
      { bin: '50-75%', installs: 1 },
      { bin: '75-90%', installs: 1 },
      { bin: '90-100%', installs: 0 },
      { bin: '>100%', installs: 1 },
    ]);
    // ISO weeks (Monday) in the company's zone: B (the 3rd, local) belongs to the week of the 2nd.
    expect(body.weekly).toEqual([
      {
        weekStart: '2026-11-02',
        installs: 2,
        flagged: 1,
        byFlag: { 'late-inflate': 1, 'pressure-out-of-range': 1 },
        medianInflateMarginMin: 2,
        worstInflateMarginMin: -6,
        medianHoldKeptMin: 102,
        medianHoldPlannedMin: 99,
      },
      {
        weekStart: '2026-11-09',
        installs: 2,
        flagged: 2,
        byFlag: { 'early-deflate': 1, 'late-inflate': 1 },
        medianInflateMarginMin: 4,
        worstInflateMarginMin: 4,
        medianHoldKeptMin: 60,
        medianHoldPlannedMin: 99,
      },
    ]);
    expect(body.byCrew).toEqual(
      expect.arrayContaining([
        { crewId: w.crew.id, crewName: w.crew.name, installs: 3, flagged: 2, medianInflateMarginMin: 2 },
        { crewId: w.otherCrew.id, crewName: w.otherCrew.name, installs: 1, flagged: 1, medianInflateMarginMin: 4 },
      ]),
    );
  });

  it('narrows to one crew, and shows empty weeks of the period as zero', async () => {
    await signInAs(w.admin);
    const { status, body } = await call(insightsRoute, url(`from=2026-10-26&to=2026-11-15&crewId=${w.crew.id}`));
    expect(status).toBe(200);
    expect(body).toMatchObject({
      crew: { id: w.crew.id, name: w.crew.name },
      installs: 4,
      flagged: 3, // F, A, B, D: A is clean
      byFlag: { 'late-inflate': 3, 'pressure-out-of-range': 1 },
      medianInflateMarginMin: -6,
      worstInflateMarginMin: -10,
    });
    // F (11-01 local, late by 10 min) is now inside; the week of 10-26 holds it.
    expect(body.weekly.map((week: { weekStart: string; installs: number }) => [week.weekStart, week.installs])).toEqual(
      [
        ['2026-10-26', 1],
        ['2026-11-02', 2],
        ['2026-11-09', 1],
      ],
    );
  });

  it('counts a running install as a late inflate only once its inflate-by time has passed', async () => {
    const now = Date.now();
    const running = (mixedAgoMin: number) => ({
      companyId: w.company.id,
      repairId: w.repair.id,
      jobId: w.job.id,
      crewId: w.otherCrew.id,
      status: 'in_progress' as const,
      mixedAt: new Date(now - mixedAgoMin * MIN),
      inflateBy: new Date(now + (30 - mixedAgoMin) * MIN),
      derivedAt: new Date(),
    });
    await Install.bulkCreate([running(5), running(40)]); // inflate-by in 25 min; inflate-by 10 min ago
    await signInAs(w.office);
    const today = dayInZone(new Date(now), w.company.timeZone);
    const from = dayInZone(new Date(now), w.company.timeZone, -1);
    const { body } = await call(insightsRoute, url(`from=${from}&to=${today}&crewId=${w.otherCrew.id}`));
    expect(body).toMatchObject({
      installs: 2,
      flagged: 1,
      byFlag: { 'late-inflate': 1 },
      medianInflateMarginMin: null,
    });
  });

  it('answers an empty period with zeros and nulls', async () => {
    await signInAs(w.office);
    const { body } = await call(insightsRoute, url('from=2025-01-06&to=2025-01-12'));
    expect(body).toMatchObject({
      installs: 0,
      flagged: 0,
      byFlag: {},
      medianInflateMarginMin: null,
      worstInflateMarginMin: null,
    });
    expect(body.weekly).toEqual([
      {
        weekStart: '2025-01-06',
        installs: 0,
        flagged: 0,
        byFlag: {},
        medianInflateMarginMin: null,
        worstInflateMarginMin: null,
        medianHoldKeptMin: null,
        medianHoldPlannedMin: null,
      },
    ]);
  });

  it('refuses bad periods with 400 and field messages', async () => {
    await signInAs(w.office);
    for (const query of [
      'from=2026-02-30&to=2026-03-01',
      'from=2026-11-15&to=2026-11-02',
      'from=2024-11-01&to=2026-11-02',
      'from=yesterday',
      `${PERIOD}&crewId=not-a-uuid`,
      `${PERIOD}&colour=red`,
      'to=2026-11-02&from=2020-01-01',
    ]) {
      const { status, body } = await call(insightsRoute, url(query));
      expect(status, query).toBe(400);
      expect(body.error.message, query).toMatch(/Invalid input/);
    }
    expect((await call(insightsRoute, url('from=2024-11-03&to=2026-11-02'))).status).toBe(200); // 730 days, inside two years
  });

  it("is for the office: field roles 403, signed out 401, another company's crew 404 and its installs never counted", async () => {
    expect((await call(insightsRoute, url(PERIOD))).status).toBe(401);
    await signInAs(w.foreman);
    expect((await call(insightsRoute, url(PERIOD))).status).toBe(403);
    await signInAs(w.technician);
    expect((await call(insightsRoute, url(PERIOD))).status).toBe(403);
    await signInAs(other.office);
    expect((await call(insightsRoute, url(`${PERIOD}&crewId=${w.crew.id}`))).status).toBe(404);
    const mine = await call(insightsRoute, url(PERIOD));
    expect(mine.body).toMatchObject({
      installs: 1,
      byFlag: { 'late-inflate': 1, 'early-deflate': 1 },
      worstInflateMarginMin: -20,
    });
  });

  it('exports the weekly table as a CSV attachment', async () => {
    await signInAs(w.office);
    const response = await insightsRoute(new Request(`http://localhost${url(`${PERIOD}&format=csv`)}`));
    expect(response.status).toBe(200);
    expect(response.headers.get('content-type')).toMatch(/^text\/csv/);
    expect(response.headers.get('content-disposition')).toMatch(
      /^attachment; filename="insights-2026-11-02-to-2026-11-15-/,
    );
    const parsed = Papa.parse<Record<string, string>>((await response.text()).replace(/^\uFEFF/, ''), { header: true });
    expect(parsed.data.map((row) => row['Week starting'])).toEqual(['2026-11-02', '2026-11-09', 'Whole period']);
    expect(parsed.data.map((row) => row['Late inflate'])).toEqual(['1', '1', '2']);
    expect(parsed.data[2]).toMatchObject({
      'Installs (resin mixed)': '4',
      Flagged: '3',
      'Worst margin at inflation (min)': '-6',
    });
  });
});
