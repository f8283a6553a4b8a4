import { expect, test, type Page } from '@playwright/test';
import { signIn } from './helpers';
import {
  acknowledgeAndCheck,
  controlTime,
  mixAndInflate,
  newInstall,
  prepareToMix,
  recordConditions,
  serverView,
  tap,
} from './install-helpers';

// Fake time needs every API answer to pass page.route, which a service worker would bypass.
test.use({ serviceWorkers: 'block' });
// Whole installs tap by tap, then the desk: longer than one step of the default 60 s on a shared 2-core machine.
test.setTimeout(240_000);

/** Every queued tap has reached the server (a longer wait than waitForSync: a whole install queued). */
const allSynced = (page: Page) =>
  expect(page.getByTestId('sync-status')).toHaveText('All taps synced', { timeout: 90_000 });

const RAW_INSTANT = /\d{4}-\d{2}-\d{2}T\d{2}:\d{2}/;

test('a failed patch: the signed-off install reads as a record, then the foreman redoes it and the desk shows the chain', async ({
  page,
  browser,
}) => {
  const time = await controlTime(page);
  await signIn(page, 'foreman@demo.test');
  await expect(page).toHaveURL('/today');
  const oldId = await newInstall(page, '-0006', 0);
  await page.goto(`/installs/${oldId}`);
  await prepareToMix(page, time.advance);
  await mixAndInflate(page, time.advance);
  await time.advance(160);
  await tap(page, 'Bladder deflated');
  await page.getByRole('radio', { name: 'Fail' }).click();
  await page.locator('#inspectionNotes').fill('Lifted at the upstream end');
  await tap(page, 'Record inspection');
  await tap(page, 'Sign off — send for review');
  await expect(page.getByTestId('step-done')).toBeVisible();
  await allSynced(page);

  // The record: times, inspection, no countdown — even two days later.
  const record = page.getByTestId('install-record');
  await expect(record).toBeVisible();
  await expect(page.getByTestId('record-inspection')).toContainText('Inspection: failed');
  await expect(record).toContainText('Bladder inflated');
  await time.advance(48 * 60);
  await expect(page.getByTestId('countdown')).toHaveCount(0);
  await expect(page.getByText(/\+\d+:\d{2}:\d{2} over/)).toHaveCount(0);
  expect(await page.locator('body').innerText()).not.toMatch(RAW_INSTANT);

  // Redo this patch: a new install on the same repair, linked to this one.
  await tap(page, 'Redo this patch');
  await tap(page, 'Start the redo');
  await expect(page).not.toHaveURL(new RegExp(`/installs/${oldId}$`));
  await expect(page.getByTestId('redo-of')).toContainText('whose inspection failed');
  await expect(page.getByTestId('step-safety')).toBeVisible();
  const newId = page.url().split('/').pop()!;
  const fresh = await serverView(page, newId);
  expect(fresh.install.replacesInstallId).toBe(oldId);
  expect(fresh.chain.replaces.id).toBe(oldId);
  const old = await serverView(page, oldId);
  expect(old.chain.replacedBy.id).toBe(newId);

  // The office sees the chain on the review page and the repair page.
  const desk = await browser.newContext();
  const office = await desk.newPage();
  await signIn(office, 'office@demo.test');
  await expect(office).toHaveURL(/\/(jobs|today|schedule|reviews|$)/);
  await office.goto(`/reviews/${oldId}`);
  await expect(office.getByTestId('chain-replaced-by')).toContainText('Redone by');
  await office.goto(`/reviews/${newId}`);
  await expect(office.getByTestId('chain-replaces')).toContainText('(inspection failed)');
  await office.goto(`/repairs/${old.repair.id}`);
  await expect(office.getByTestId('install-attempts')).toContainText('redo of attempt');
  await desk.close();
});

test("a pipe below the resin's range: NO-GO with no clock; the foreman goes on with the maker's hold and the countdown says so", async ({
  page,
}) => {
  const time = await controlTime(page);
  await signIn(page, 'foreman@demo.test');
  await expect(page).toHaveURL('/today');
  const id = await newInstall(page, '-0006', 0);
  await page.goto(`/installs/${id}`);
  await acknowledgeAndCheck(page);
  await tap(page, 'Start dry run');
  await time.advance(3);
  await tap(page, 'Packer back — stop');
  // 30 °F is −1.1 °C, below the demo epoxy's 5 °C minimum (41 °F).
  await recordConditions(page, '30');
  await expect(page.getByTestId('go-verdict')).toHaveText('NO-GO');
  await expect(page.getByTestId('step-go')).toContainText("hold time from the resin maker's sheet");
  await expect(page.getByTestId('plan-hold')).toContainText('No time: outside the rated range');
  // An imperial company reads °F only.
  await expect(page.getByTestId('step-go')).not.toContainText('°C');
  await expect(page.getByTestId('plan-counted')).toContainText('15 min from mixing to patch on the packer');

  await page.locator('#override').fill('Owner needs the line back tonight; maker confirmed by phone');
  const go = page.getByRole('button', { name: 'Go on after NO-GO' });
  await expect(go).toBeDisabled();
  await page.getByLabel(/Hold time from the resin maker's sheet/).fill('180');
  await go.click();
  await mixAndInflate(page, time.advance);
  await expect(page.getByTestId('countdown').first()).toHaveAttribute('aria-label', "Deflate after (maker's hold)");
  await expect(page.getByTestId('hold-note')).toContainText(
    "resin maker's hold of 3:00:00 + the company's 10 % reserve = 3:18:00",
  );
  await expect(page.getByTestId('flags').locator('[data-kind="cold-cure"]')).toBeVisible();
  await allSynced(page);
  const view = await serverView(page, id);
  expect(view.plan.holdMin).toBeNull();
  expect(view.plan.fullCureMin).toBeNull();
  expect(view.plan.holdSource).toBe('maker');
  expect(view.plan.returnToService).toBeUndefined();
  const decision = view.events.find((e: { type: string }) => e.type === 'go_decision');
  expect(decision.payload).toMatchObject({ go: false, makerHoldMin: 180 });
  expect(new Date(view.plan.deflateAfter).getTime() - new Date(view.state.inflatedAt).getTime()).toBe(198 * 60_000);
});
