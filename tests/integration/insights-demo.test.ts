import { randomUUID } from 'node:crypto';
import { createRequire } from 'node:module';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';
import { GET as insightsRoute } from '@/app/api/insights/route';
import { resinClockSpec } from '@/lib/cure';
import { sequelize } from '@/lib/data/db';
import { dayInZone } from '@/lib/time/dates';
import { installClock } from '@/lib/install/plan-and-flags';
import { deriveInstallState } from '@/lib/install/state';
import { worstSeverity } from '@/lib/review/flags';
import { Company, Crew, Install, InstallEvent, Packer, ResinKit, ResinSystem, User } from '@/models';
import { signInAs } from './helpers/session';
import { call } from './helpers/call';

// The insights of the demo contractor checked against figures worked out by hand from the demo builder's events
// (scripts/demo/build.cjs `installEvents`): resin mixed 16 min after the install starts; inflated at
// window + 6 min for the 'late-inflate' shape, else at min(0.6 × window, 16) min; the inflate-by time is mix +
// window (lib/cure planCure), so the margin is −6 min for the late one and window − min(0.6 × window, 16) otherwise.
// The crew keeps hold × 1.1 + 8 min, the 'early-deflate' shape only hold × 0.6; the plan is hold × (1 + the company's
// 10 % hold reserve). Window and hold move with temperature: the doubling rule (time × 2^((ref − T)/10 °C)) for the
// standard epoxy, Arrhenius (time × exp(Ea/R · (1/T − 1/Tref)), R = 8.314462618 J/(mol·K), CODATA 2018) for the
// cold-weather one. Readings are 103 and 101 kPa, inside every demo packer's rating (50–150 … 70–200 kPa).
//
// DEPENDS on the derived columns of `installs` being filled for seeded rows (the tap path's derivation): the
// seeding path's, else its backfill, else (on a branch without either) a stand-in made of the app's own fold.
const require = createRequire(import.meta.url);
const { buildCompany, insertCompany } = require('../../scripts/demo/build.cjs');
const mainSpec = require('../../scripts/demo/scenario-main.cjs');

type Resin = {
  ref_temp_c: number;
  pot_life_min: number;
  hold_min: number;
  sensitivity_kind: string;
  doubling_c: number | null;
  activation_energy_kj: number | null;
};
type JobSpec = {
  crew: number;
  day: number;
  install?: { shape?: string; mix_temp_c: number; pipe_temp_c: number; resin?: number };
  repairs: unknown[];
};

const factor = (resin: Resin, tempC: number) =>
  resin.sensitivity_kind === 'doubling'
    ? 2 ** ((resin.ref_temp_c - tempC) / resin.doubling_c!)
    : Math.exp(
        ((resin.activation_energy_kj! * 1000) / 8.314462618) * (1 / (tempC + 273.15) - 1 / (resin.ref_temp_c + 273.15)),
      );
const median = (values: number[]) => {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
};
const mondayOf = (day: string) => {
  const date = new Date(`${day}T00:00:00Z`);
  return new Date(date.getTime() - ((date.getUTCDay() + 6) % 7) * 86_400_000).toISOString().slice(0, 10);
};

/** One row per demo install (a job's every repair has one; only the first carries the job's shape). */
function expectedInstalls(timeZone: string, now: Date) {
  return (mainSpec.jobs as JobSpec[]).flatMap((job) => {
    if (!job.install) return [];
    const resin: Resin = mainSpec.resin_systems[job.install.resin ?? 0];
    return job.repairs.map((_, position) => {
      const shape = position === 0 ? (job.install!.shape ?? 'clean') : 'clean';
      const window = resin.pot_life_min * factor(resin, job.install!.mix_temp_c);
      const hold = resin.hold_min * factor(resin, job.install!.pipe_temp_c);
      return {
        crew: job.crew,
        week: mondayOf(dayInZone(now, timeZone, job.day)),
        margin: shape === 'late-inflate' ? -6 : window - Math.min(0.6 * window, 16),
        kept: shape === 'early-deflate' ? 0.6 * hold : 1.1 * hold + 8,
        planned: 1.1 * hold,
        flags: shape === 'clean' ? [] : [shape],
      };
    });
  });
}

describe('insights over the demo contractor', () => {
  let office: User;
  let timeZone: string;
  let derivedBy = '';
  let north: Crew;
  const now = new Date();

  beforeAll(async () => {
    // The demo contractor as the seed writes it, under a name (and e-mails) of its own so it sits beside other tests.
    const tag = randomUUID().slice(0, 8);
    const spec = {
      ...mainSpec,
      company: { ...mainSpec.company, name: `${mainSpec.company.name} ${tag}` },
      users: mainSpec.users.map((u: { email: string }) => ({ ...u, email: u.email.replace('@', `+${tag}@`) })),
      crews: mainSpec.crews.map((c: { members: string[] }) => ({
        ...c,
        members: c.members.map((m) => m.replace('@', `+${tag}@`)),
      })),
    };
    const tables = buildCompany(spec, {
      now,
      passwordHash: '$2b$12$KmJz3YskaqY8OKmQx6oTFeAcu9JZGSd7OaZFf2WtWTl6JKW3RK0sG',
    });
    await sequelize.transaction((transaction) => insertCompany(sequelize.getQueryInterface(), tables, transaction));
    const companyId = tables.companies[0].id as string;
    timeZone = mainSpec.company.time_zone;
    office = (await User.findOne({ where: { companyId, role: 'office' } }))!;
    north = (await Crew.findOne({ where: { companyId, name: 'North crew' } }))!;
    derivedBy = await deriveDemo(companyId);
  });

  it('matches the hand-worked figures: 9 installs, one late inflate, one early deflate, margins, holds, weeks', async () => {
    expect(derivedBy).not.toBe('');
    const from = dayInZone(now, timeZone, -30);
    const to = dayInZone(now, timeZone);
    await signInAs(office);
    const { status, body } = await call(insightsRoute, `/api/insights?from=${from}&to=${to}`);
    expect(status).toBe(200);
    const rows = expectedInstalls(timeZone, now);
    expect(rows).toHaveLength(9);
    expect(body).toMatchObject({ installs: 9, flagged: 2, byFlag: { 'late-inflate': 1, 'early-deflate': 1 } });
    expect(Object.keys(body.byFlag)).toHaveLength(2);
    // By hand: margins −6, 14.0, 14.0, 21.3, 24.0, 26.9, 29.9, 33.2, 40.6 → median 24.0 (the clean 20 °C mix: 40 − 16).
    expect(body.medianInflateMarginMin).toBeCloseTo(median(rows.map((r) => r.margin)), 1);
    expect(body.medianInflateMarginMin).toBeCloseTo(24, 1);
    expect(body.worstInflateMarginMin).toBeCloseTo(-6, 1);
    expect(body.marginBins).toEqual([
      { bin: 'late', installs: 1 },
      { bin: '0-5', installs: 0 },
      { bin: '5-10', installs: 0 },
      { bin: '10-20', installs: 2 },
      { bin: '20+', installs: 6 },
    ]);
    // Early deflate at 16 °C: kept 0.6 × 118.76 = 71.3 of 1.1 × 118.76 = 130.6 planned → 59.4 min short.
    expect(body.hold).toMatchObject({ measured: 9, short: 1 });
    expect(body.hold.worstShortfallMin).toBeCloseTo(-59.4, 1);
    expect(body.hold.medianKeptMin).toBeCloseTo(median(rows.map((r) => r.kept)), 1);
    expect(body.hold.medianPlannedMin).toBeCloseTo(median(rows.map((r) => r.planned)), 1);
    expect(body.pressure).toMatchObject({ measured: 9, aboveMax: 0, belowMin: 0 });
    expect(body.pressure.bins.find((b: { bin: string }) => b.bin === '50-75%').installs).toBe(9); // 103 of 150…200 kPa
    for (const week of body.weekly as { weekStart: string; installs: number; flagged: number }[]) {
      const inWeek = rows.filter((r) => r.week === week.weekStart);
      expect([week.weekStart, week.installs, week.flagged]).toEqual([
        week.weekStart,
        inWeek.length,
        inWeek.filter((r) => r.flags.length).length,
      ]);
    }
    expect(body.weekly.reduce((sum: number, w: { installs: number }) => sum + w.installs, 0)).toBe(9);
  });

  it('narrows to the North crew: five installs, the late inflate its only flag', async () => {
    await signInAs(office);
    const { body } = await call(
      insightsRoute,
      `/api/insights?from=${dayInZone(now, timeZone, -30)}&to=${dayInZone(now, timeZone)}&crewId=${north.id}`,
    );
    const rows = expectedInstalls(timeZone, now).filter((r) => r.crew === 0);
    expect(body).toMatchObject({ installs: rows.length, flagged: 1, byFlag: { 'late-inflate': 1 } });
    expect(rows).toHaveLength(5);
    expect(body.medianInflateMarginMin).toBeCloseTo(median(rows.map((r) => r.margin)), 1);
  });
});

/**
 * Fills the derived columns of the demo's installs when the seeding path has not: with the tap path's backfill
 * (`ensureDerived` in lib/data/install-derive.ts) when this branch has it, else with the app's own fold and clock
 * (`deriveInstallState` + `installClock`, as the tap derives them) — a stand-in, said so in the log.
 */
async function deriveDemo(companyId: string) {
  const pending = await Install.count({ where: { companyId, derivedAt: null } });
  if (pending === 0) return 'seeded';
  const company = (await Company.findByPk(companyId))!;
  const backfill = fileURLToPath(new URL('../../lib/data/install-derive.ts', import.meta.url));
  if (existsSync(backfill)) {
    const derive = await import(/* @vite-ignore */ backfill);
    await derive.ensureDerived({ companyId }, derive.settingsOf(company));
    return 'tap backfill';
  }
  console.warn('insights-demo: no tap-path derivation on this branch; deriving with deriveInstallState + installClock');
  for (const install of await Install.findAll({ where: { companyId } })) {
    const events = await InstallEvent.findAll({
      where: { companyId, installId: install.id },
      order: [
        ['deviceTime', 'ASC'],
        ['receivedAt', 'ASC'],
      ],
    });
    const state = deriveInstallState(events.map((e) => e.get({ plain: true })));
    const [resin, packer, kit] = await Promise.all([
      ResinSystem.findByPk(install.resinSystemId!),
      Packer.findByPk(install.packerId!),
      ResinKit.findByPk(install.resinKitId!),
    ]);
    const { plan, flags } = installClock({
      state,
      resin: resinClockSpec(resin!),
      packer: { minPressureKpa: packer!.minPressureKpa, maxPressureKpa: packer!.maxPressureKpa },
      resinKitExpiresOn: kit!.expiresOn,
      safetyMargin: company.workingWindowSafetyMargin,
      holdReserve: company.holdReserve,
      unitSystem: company.unitSystem,
      now: new Date(),
    });
    await install.update({
      mixedAt: state.mixedAt,
      inflatedAt: state.inflatedAt,
      deflatedAt: state.deflatedAt,
      inflateBy: plan?.inflateBy ?? null,
      deflateAfter: plan?.deflateAfter ?? null,
      holdPlannedMin: plan?.keepInflatedMin ?? null,
      maxPressureKpa: state.pressuresKpa.length ? Math.max(...state.pressuresKpa) : null,
      flagKinds: flags.map((f) => f.kind),
      worstSeverity: worstSeverity(flags),
      derivedAt: new Date(),
    });
  }
  return 'test stand-in';
}
