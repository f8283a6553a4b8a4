import { expect, test, type Page } from '@playwright/test';
import { signIn } from './helpers';
import { newInstall, outboxEntries, prepareToMix, serverView, tap, waitForSync } from './install-helpers';

// The tablet keeps going: a tap the server refuses is parked on the screen and the next ones still
// sync; a tap waits on the tablet for the user who made it, whoever signs in meanwhile.

type Event = { clientEventId: string; type: string; userId: string };

// Two tablets, sign-outs and sign-ins: slow on a busy machine.
test.describe.configure({ timeout: 180_000 });
// Offline emulation does not reach a service worker's own fetches: with it blocked, "no signal" means no signal.
test.use({ serviceWorkers: 'block' });

test('a refused tap is parked as needing attention while the next taps sync', async ({ browser }) => {
  const foremanContext = await browser.newContext();
  const techContext = await browser.newContext();
  const foreman = await foremanContext.newPage();
  const tech = await techContext.newPage();
  await signIn(foreman, 'foreman@demo.test');
  await signIn(tech, 'tech@demo.test');
  await expect(tech).toHaveURL('/today', { timeout: 30_000 });
  const id = await newInstall(foreman, '-0003', 0);
  await foreman.goto(`/installs/${id}`);
  await prepareToMix(foreman, async () => foreman.waitForTimeout(1500));
  await waitForSync(foreman);
  await tech.goto(`/installs/${id}`);
  await expect(tech.getByTestId('step-mix')).toBeVisible({ timeout: 30_000 });

  // The technician's tablet loses its signal; meanwhile the foreman mixes on his.
  await techContext.setOffline(true);
  await tap(foreman, 'Resin mixed');
  await waitForSync(foreman);
  // Seconds apart, as at a manhole: each tablet's clock is corrected from the server's Date header, which
  // counts whole seconds, so taps less than a second apart on two tablets may be stamped in either order.
  await tech.waitForTimeout(2500);
  await tap(tech, 'Resin mixed');
  await tap(tech, 'Patch loaded');
  await expect(tech.getByTestId('sync-status')).toHaveText(/^2 taps saved on this tablet/, { timeout: 30_000 });

  await techContext.setOffline(false);
  // The second "mixed" cannot have happened (422): parked with the server's reason; "loaded" goes through.
  const parked = tech.getByTestId('outbox-parked-entry');
  await expect(parked).toHaveCount(1, { timeout: 30_000 });
  await expect(parked).toContainText(/resin mixed: .*already mixed/i);
  await expect(tech.getByTestId('outbox-parked')).toContainText('Needs attention');
  await waitForSync(tech);
  await expect(parked).toHaveCount(1);

  const view = await serverView(foreman, id);
  const types = view.events.map((e: Event) => e.type);
  expect(types.filter((t: string) => t === 'resin_mixed')).toHaveLength(1);
  expect(types.at(-1)).toBe('patch_loaded');
  const techId = view.events.find((e: Event) => e.type === 'patch_loaded').userId;
  expect(view.events.find((e: Event) => e.type === 'resin_mixed').userId).not.toBe(techId);

  // Kept on the tablet: still there after a reload, and never sent again.
  await tech.reload();
  await expect(tech.getByTestId('outbox-parked-entry')).toHaveCount(1);
  await tech.waitForTimeout(6000);
  expect((await serverView(foreman, id)).events).toHaveLength(view.events.length);
  await foremanContext.close();
  await techContext.close();
});

test('a tap waits on the tablet for the user who made it, not whoever signs in next', async ({ page, context }) => {
  await signIn(page, 'foreman@demo.test');
  await expect(page).toHaveURL('/today', { timeout: 30_000 });
  const id = await newInstall(page, '-0003', 0);
  await page.goto(`/installs/${id}`);
  await expect(page.getByTestId('step-safety')).toBeVisible();
  await context.setOffline(true);
  await tap(page, 'Understood — start');
  await expect(page.getByTestId('sync-status')).toHaveText(/^1 tap saved on this tablet/);
  // The queue shows the tap at once, before its first sending has failed; a page closed with that request still
  // open may let it out, with the foreman's cookie, when the signal returns. Close once the attempt has failed.
  await expect
    .poll(async () => (await outboxEntries(page, id)).map((e) => [e.status, e.attempts > 0]), { timeout: 30_000 })
    .toEqual([['pending', true]]);
  await page.close();
  // The foreman's session ends while the tablet has no signal (any page of his would rightly send his tap the
  // moment the signal returns); the technician then signs in on the same tablet.
  await context.clearCookies();
  await context.setOffline(false);
  const second = await context.newPage();
  await signIn(second, 'tech@demo.test');
  await expect(second).toHaveURL('/today', { timeout: 30_000 });
  await second.goto(`/installs/${id}`);
  await expect(second.getByTestId('outbox-waiting')).toHaveText('1 tap waiting for Mateo Varga to sign in', {
    timeout: 30_000,
  });
  await expect(second.getByTestId('sync-status')).toHaveText('All taps synced');
  await second.waitForTimeout(6000);
  expect((await serverView(second, id)).events).toEqual([]);

  // Back under the foreman's own session it goes out, in his name.
  await signOutAccepting(second);
  await signIn(second, 'foreman@demo.test');
  await expect(second).toHaveURL('/today', { timeout: 30_000 });
  await second.goto(`/installs/${id}`);
  await expect(second.getByTestId('outbox-waiting')).toHaveCount(0, { timeout: 20_000 });
  await expect
    .poll(async () => (await serverView(second, id)).events.map((e: Event) => e.type), { timeout: 20_000 })
    .toEqual(['safety_acknowledged']);
});

async function signOutAccepting(page: Page) {
  page.once('dialog', (dialog) => void dialog.accept());
  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect(page).toHaveURL(/\/sign-in/, { timeout: 30_000 });
}
