import { randomUUID } from 'node:crypto';
import { expect, type Page } from '@playwright/test';

/** A new install on a repair of the seeded job whose number ends with `suffix`; returns its id. */
export async function newInstall(page: Page, suffix: string, repairIndex = 0): Promise<string> {
  await expect(page).toHaveURL(/\/(today|jobs|admin)/);
  const list = await (await page.request.get(`/api/jobs?pageSize=100&q=${encodeURIComponent(suffix)}`)).json();
  const job = list.items.find((j: { number: string }) => j.number.endsWith(suffix));
  const detail = await (await page.request.get(`/api/jobs/${job.id}`)).json();
  const id = randomUUID();
  const created = await page.request.post('/api/installs', { data: { id, repairId: detail.repairs[repairIndex].id } });
  expect(created.status()).toBe(201);
  return id;
}

/** Room for the longest run of `advance` calls in one test (the full hold is about 2 h 30 min). */
const FAKE_TIME_BEHIND_MS = 4 * 3600_000;

/**
 * Moves time forward for the page: Playwright's fake clock, and the Date header of API answers
 * moved by the same amount, so the tablet's server-clock correction sees a world that moved on.
 */
export async function controlTime(page: Page) {
  // The fake time starts hours in the past, so taps stamped after moving it on are still not ahead
  // of the server's real clock (it refuses device times over 5 minutes ahead).
  let advancedMs = -FAKE_TIME_BEHIND_MS;
  // While the page's clock and the Date header move, answers wait: none may carry a moved-on Date to a page whose
  // clock has not moved yet. Such a sample says the server runs hours ahead, the tablet then stamps its next taps
  // hours in the future and the server refuses them (seen in CI: a deflate and an inspection refused). An answer
  // already on its way with the old Date is harmless: its bounds still hold the true offset.
  let moving: Promise<void> = Promise.resolve();
  await page.clock.install({ time: Date.now() - FAKE_TIME_BEHIND_MS });
  await page.route('**/api/**', async (route) => {
    try {
      const response = await route.fetch();
      await moving;
      await route.fulfill({
        response,
        headers: { ...response.headers(), date: new Date(Date.now() + advancedMs).toUTCString() },
      });
    } catch {
      // The test ended (or the page closed) while a poll was in flight: nothing is waiting for this answer.
      await route.abort().catch(() => undefined);
    }
  });
  return {
    advance: async (minutes: number) => {
      let moved!: () => void;
      moving = new Promise((resolve) => (moved = resolve));
      try {
        await page.clock.fastForward(minutes * 60_000);
        advancedMs += minutes * 60_000;
      } finally {
        moved();
      }
    },
  };
}

export async function tap(page: Page, name: string | RegExp) {
  await page.getByRole('button', { name }).click();
}

/** Safety, checks, a dry run of `dryRunMinutes`, conditions (68 °F / 57 °F, the good kit) and GO. */
export async function prepareToMix(page: Page, advance: (minutes: number) => Promise<void>, dryRunMinutes = 3) {
  await acknowledgeAndCheck(page);
  await tap(page, 'Start dry run');
  await advance(dryRunMinutes);
  await tap(page, 'Packer back — stop');
  await recordConditions(page);
  await expect(page.getByTestId('go-verdict')).toHaveText('GO');
  await tap(page, 'Ready to mix');
}

/** Mixed → loaded → in position → inflated at 15 psi, with a few minutes between each. */
export async function mixAndInflate(page: Page, advance: (minutes: number) => Promise<void>) {
  await tap(page, 'Resin mixed');
  await expect(page.getByTestId('countdown').first()).toBeVisible();
  await advance(5);
  await tap(page, 'Patch loaded');
  await advance(5);
  await tap(page, 'Packer in position');
  await advance(4);
  await page.getByLabel(/Gauge pressure/).fill('15');
  await tap(page, 'Bladder inflated');
  await expect(page.getByTestId('step-hold')).toBeVisible();
}

export async function serverView(page: Page, installId: string) {
  const response = await page.request.get(`/api/installs/${installId}`);
  expect(response.status()).toBe(200);
  return response.json();
}

export async function waitForSync(page: Page) {
  await expect(page.getByTestId('sync-status')).toHaveText('All taps synced', { timeout: 20_000 });
}

export async function acknowledgeAndCheck(page: Page) {
  await tap(page, 'Understood — start');
  await expect(page.getByTestId('step-checks')).toBeVisible();
  for (const box of await page.getByRole('checkbox').all()) await box.check();
  await tap(page, 'Checks done');
  await expect(page.getByTestId('step-dry-run')).toBeVisible();
}

/**
 * Resin and air at 68 °F, 57 °F in the pipe (or `pipeF`), the good kit, the first packer that fits; the
 * minutes from mixing to patch on the packer come from the resin system (15 unless the admin set others).
 */
export async function recordConditions(page: Page, pipeF = '57') {
  await page.getByLabel(/Resin in the bucket/).fill('68');
  await page.getByLabel(/Air at the mixing place/).fill('68');
  await page.getByLabel(/Pipe \/ flow/).fill(pipeF);
  const lot = await page.locator('#resinKitId option', { hasText: 'SAE-2610-014' }).getAttribute('value');
  await page.locator('#resinKitId').selectOption(lot!);
  await tap(page, 'Save conditions');
}

/** An entry of the tablet's outbox (IndexedDB `setline-outbox`, lib/client/outbox-db.ts) as a test reads it. */
export type OutboxRecord = {
  seq: number;
  clientEventId: string;
  type: string;
  deviceTime: string;
  status: 'pending' | 'synced' | 'rejected';
  attempts: number;
  lastError?: string;
};

/** The install's entries in the tablet's outbox, in insertion order. */
export function outboxEntries(page: Page, installId: string): Promise<OutboxRecord[]> {
  return page.evaluate(
    (wanted) =>
      new Promise<OutboxRecord[]>((resolve, reject) => {
        const open = indexedDB.open('setline-outbox');
        open.onerror = () => reject(open.error);
        open.onsuccess = () => {
          const read = open.result.transaction('entries').objectStore('entries').getAll();
          read.onerror = () => reject(read.error);
          read.onsuccess = () => {
            const all = read.result as (OutboxRecord & { installId: string })[];
            resolve(all.filter((e) => e.installId === wanted).sort((a, b) => a.seq - b.seq));
          };
        };
      }),
    installId,
  );
}
