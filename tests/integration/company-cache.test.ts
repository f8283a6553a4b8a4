import { beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { GET as insightsRoute } from '@/app/api/insights/route';
import { cachedForCompany } from '@/lib/data/company-cache';
import { GET as installsRoute } from '@/app/api/installs/route';
import { Install } from '@/models';
import { makeInstallWorld, type InstallWorld } from './helpers/world';
import { signInAs, signOut } from './helpers/session';
import { call } from './helpers/call';

// The company cache serves a result again only while the company's installs are the same, and for its ttl at most.
const TTL = 15_000;
const PERIOD = 'from=2026-11-02&to=2026-11-15';
const mixedIn = (w: InstallWorld, iso: string) => ({
  companyId: w.company.id,
  repairId: w.repair.id,
  jobId: w.job.id,
  crewId: w.crew.id,
  mixedAt: new Date(iso),
  derivedAt: new Date(),
});

describe('company cache (insights, the list by severity)', () => {
  let w: InstallWorld;
  beforeAll(async () => {
    w = await makeInstallWorld('InsightsCache');
  });
  beforeEach(() => signOut());

  it('computes once while nothing changes, again when an install row is written or the ttl runs out', async () => {
    let runs = 0;
    const compute = async () => ++runs;
    const key = `k-${Date.now()}`;
    const t0 = Date.now();
    expect(await cachedForCompany(w.company.id, key, TTL, compute, t0)).toBe(1);
    expect(await cachedForCompany(w.company.id, key, TTL, compute, t0 + 1000)).toBe(1);
    // Another key or another company is its own entry.
    expect(await cachedForCompany(w.company.id, `${key}-b`, TTL, compute, t0 + 1000)).toBe(2);
    // An install written since (its updated_at is the company's latest) makes the entry stale.
    await Install.create(mixedIn(w, '2026-11-03T15:00:00Z'));
    expect(await cachedForCompany(w.company.id, key, TTL, compute, t0 + 2000)).toBe(3);
    expect(await cachedForCompany(w.company.id, key, TTL, compute, t0 + 2000 + TTL - 1)).toBe(3);
    expect(await cachedForCompany(w.company.id, key, TTL, compute, t0 + 2000 + TTL)).toBe(4);
  });

  it('keeps no failure: the next call computes again', async () => {
    const key = `fail-${Date.now()}`;
    await expect(
      cachedForCompany(w.company.id, key, TTL, async () => {
        throw new Error('database went away');
      }),
    ).rejects.toThrow('database went away');
    expect(await cachedForCompany(w.company.id, key, TTL, async () => 'fresh')).toBe('fresh');
  });

  it('concurrent misses share one computation', async () => {
    let runs = 0;
    const key = `shared-${Date.now()}`;
    const slow = () => new Promise<number>((resolve) => setTimeout(() => resolve(++runs), 50));
    const answers = await Promise.all(Array.from({ length: 5 }, () => cachedForCompany(w.company.id, key, TTL, slow)));
    // The first caller whose version read returns stores its pending computation before any other's returns.
    expect(answers).toEqual([1, 1, 1, 1, 1]);
    expect(runs).toBe(1);
  });

  it('GET /api/insights shows an install mixed after the first answer at once', async () => {
    await signInAs(w.office);
    const first = await call(insightsRoute, `/api/insights?${PERIOD}`);
    expect(first.status).toBe(200);
    const before = first.body.installs as number;
    await Install.create(mixedIn(w, '2026-11-04T15:00:00Z'));
    const second = await call(insightsRoute, `/api/insights?${PERIOD}`);
    expect(second.body.installs).toBe(before + 1);
  });

  it('the list by severity shows a review decision at once', async () => {
    const install = await Install.create({ ...mixedIn(w, '2026-11-05T15:00:00Z'), status: 'awaiting_review' });
    await signInAs(w.office);
    const url = '/api/installs?sort=severity&status=awaiting_review&pageSize=100';
    const ids = (body: { items: { id: string }[] }) => body.items.map((item) => item.id);
    expect(ids((await call(installsRoute, url)).body)).toContain(install.id);
    await install.update({ status: 'approved' });
    expect(ids((await call(installsRoute, url)).body)).not.toContain(install.id);
  });
});
