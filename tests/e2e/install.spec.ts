import { expect, test } from '@playwright/test';
import { signIn } from './helpers';
import {
  acknowledgeAndCheck,
  controlTime,
  mixAndInflate,
  newInstall,
  outboxEntries,
  prepareToMix,
  recordConditions,
  serverView,
  tap,
  waitForSync,
} from './install-helpers';

// Fake time needs every API answer to pass page.route, which a service worker would bypass.
test.describe('the timed install', () => {
  test.use({ serviceWorkers: 'block' });

  test('a technician runs a whole install, honours the hold, and no flag is raised', async ({ page }) => {
    const time = await controlTime(page);
    await signIn(page, 'tech@demo.test');
    await expect(page).toHaveURL('/today');
    const id = await newInstall(page, '-0002', 0);
    await page.goto(`/installs/${id}`);
    await prepareToMix(page, time.advance);
    await mixAndInflate(page, time.advance);
    // The company's default 10 % hold reserve is named on the countdown.
    await expect(page.getByTestId('countdown').first()).toHaveAttribute('aria-label', 'Deflate after (hold + 10 %)');
    // At 57 °F (13.9 °C) the 90 min hold of the demo resin stretches to about 2 h 17 min, 2 h 31 min with the reserve.
    await time.advance(160);
    await tap(page, 'Bladder deflated');
    await expect(page.getByTestId('step-inspect')).toBeVisible();
    await page.getByRole('radio', { name: 'Pass' }).click();
    await tap(page, 'Record inspection');
    await expect(page.getByTestId('step-sign-off')).toContainText('The foreman signs the install off');
    await waitForSync(page);
    const view = await serverView(page, id);
    expect(view.flags).toEqual([]);
    expect(view.state.step).toBe('sign_off');
    expect(view.events.map((e: { type: string }) => e.type)).toEqual([
      'safety_acknowledged',
      'checks_done',
      'dry_run_started',
      'dry_run_finished',
      'conditions_recorded',
      'go_decision',
      'resin_mixed',
      'patch_loaded',
      'packer_in_position',
      'bladder_inflated',
      'bladder_deflated',
      'inspection_recorded',
    ]);
    await expect(page.getByTestId('flags')).toHaveCount(0);
  });

  test('deflating before the hold is up asks why and raises the flag', async ({ page }) => {
    const time = await controlTime(page);
    await signIn(page, 'foreman@demo.test');
    const id = await newInstall(page, '-0002', 1);
    await page.goto(`/installs/${id}`);
    await prepareToMix(page, time.advance);
    await mixAndInflate(page, time.advance);
    await time.advance(40);
    await tap(page, 'Bladder deflated');
    await page.getByPlaceholder('Reason').fill('Upstream flow backing up');
    await tap(page, 'Deflate early — record it');
    await expect(page.getByTestId('flags').locator('[data-kind="early-deflate"]')).toBeVisible();
    await waitForSync(page);
    const view = await serverView(page, id);
    expect(view.flags.map((f: { kind: string }) => f.kind)).toEqual(['early-deflate']);
    expect(view.flags[0].severity).toBe('critical');
  });
});

test('two tablets on one install show the same countdown', async ({ browser }) => {
  const first = await browser.newContext();
  const second = await browser.newContext();
  const a = await first.newPage();
  const b = await second.newPage();
  await signIn(a, 'foreman@demo.test');
  await signIn(b, 'tech@demo.test');
  await expect(b).toHaveURL('/today');
  const id = await newInstall(a, '-0003', 0);
  await a.goto(`/installs/${id}`);
  await b.goto(`/installs/${id}`);
  await prepareToMix(a, async () => a.waitForTimeout(1500));
  await tap(a, 'Resin mixed');
  // The second tablet learns of the mix on its next revalidation (every 5 s).
  await expect(b.getByTestId('countdown').first()).toBeVisible({ timeout: 15_000 });
  const read = async (page: typeof a) =>
    toSeconds(await page.getByTestId('countdown').first().getByRole('timer').innerText());
  const [onA, onB] = await Promise.all([read(a), read(b)]);
  expect(Math.abs(onA - onB)).toBeLessThanOrEqual(3);
  await first.close();
  await second.close();
});

test('with no signal, five taps are kept through a reload and reach the server when it returns', async ({
  page,
  context,
}) => {
  await signIn(page, 'foreman@demo.test');
  const id = await newInstall(page, '-0003', 0);
  await page.goto(`/installs/${id}`);
  // Let the service worker take control and keep a copy of this page before the signal goes.
  await page.evaluate(async () => navigator.serviceWorker.ready);
  await page.reload();
  await expect(page.getByTestId('step-safety')).toBeVisible();
  await expect.poll(() => page.evaluate(() => !!navigator.serviceWorker.controller)).toBe(true);

  await context.setOffline(true);
  await acknowledgeAndCheck(page);
  await tap(page, 'Start dry run');
  await page.waitForTimeout(1200);
  await tap(page, 'Packer back — stop');
  await recordConditions(page);
  await expect(page.getByTestId('sync-status')).toHaveText(/^5 taps saved on this tablet/);
  const queued = await outboxEntries(page, id);
  expect(queued).toHaveLength(5);

  await page.reload();
  await expect(page.getByTestId('sync-status')).toHaveText(/^5 taps saved on this tablet/);
  await expect(page.getByTestId('step-go')).toBeVisible();

  await context.setOffline(false);
  await expect(page.getByTestId('sync-status')).toHaveText('All taps synced', { timeout: 30_000 });
  const view = await serverView(page, id);
  const stored = view.events.map((e: { clientEventId: string; type: string; deviceTime: string }) => [
    e.clientEventId,
    e.type,
    new Date(e.deviceTime).toISOString(),
  ]);
  expect(stored).toEqual(queued.map((e) => [e.clientEventId, e.type, new Date(e.deviceTime).toISOString()]));
});

function toSeconds(text: string): number {
  const match = /(\d+):(\d{2}):(\d{2})/.exec(text);
  if (!match) throw new Error(`no h:mm:ss in "${text}"`);
  return Number(match[1]) * 3600 + Number(match[2]) * 60 + Number(match[3]);
}
