import { expect, test } from '@playwright/test';
import { expectSignedInAs, signIn } from './helpers';

// The demo accounts from the README, each with the home its role lands on.
const ACCOUNTS = [
  { email: 'admin@demo.test', home: '/admin', name: 'Avery Lindqvist', heading: 'Bramblewick Drainworks' },
  { email: 'office@demo.test', home: '/jobs', name: 'Priya Okafor-Hale', heading: 'Jobs' },
  { email: 'foreman@demo.test', home: '/today', name: 'Mateo Varga', heading: "Today's work" },
  { email: 'tech@demo.test', home: '/today', name: 'Jun Castellanos', heading: "Today's work" },
  { email: 'office@second.test', home: '/jobs', name: 'Ines Vollrath', heading: 'Jobs' },
  { email: 'foreman@second.test', home: '/today', name: 'Bram Oosterhuis', heading: "Today's work" },
];

for (const account of ACCOUNTS) {
  test(`${account.email} signs in and lands on ${account.home}`, async ({ page }) => {
    await signIn(page, account.email);
    await expect(page).toHaveURL(account.home);
    await expect(page.getByRole('heading', { level: 1 })).toHaveText(account.heading);
    await expectSignedInAs(page, account.name);
  });
}

test('a wrong password shows the message and stays on the sign-in page', async ({ page }) => {
  await signIn(page, 'office@demo.test', 'not-the-password');
  await expect(page.getByRole('main').getByRole('alert')).toHaveText(
    'That e-mail and password do not match an active account.',
  );
  await expect(page).toHaveURL(/\/sign-in/);
});

test('an unknown e-mail gets exactly the same message', async ({ page }) => {
  await signIn(page, 'nobody@demo.test', 'whatever');
  await expect(page.getByRole('main').getByRole('alert')).toHaveText(
    'That e-mail and password do not match an active account.',
  );
});

test('a signed-out visit to a desk page goes to /sign-in', async ({ page }) => {
  await page.goto('/jobs');
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=%2Fjobs/);
  await expect(page.getByRole('button', { name: 'Sign in' })).toBeVisible();
});

test('after sign-in the visitor returns to the page they asked for', async ({ page }) => {
  await page.goto('/jobs?status=scheduled');
  await page.getByLabel('E-mail').fill('office@demo.test');
  await page.getByLabel('Password').fill('setline-demo');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page).toHaveURL('/jobs?status=scheduled');
});

test('sign-out ends the session', async ({ page }) => {
  await signIn(page, 'office@demo.test');
  await expect(page).toHaveURL('/jobs');
  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect(page).toHaveURL(/\/sign-in/);
  await page.goto('/jobs');
  await expect(page).toHaveURL(/\/sign-in/);
  const api = await page.request.get('/api/jobs');
  expect(api.status()).toBe(401);
});

test('a field role cannot open desk pages, and the API keeps the companies apart', async ({ page }) => {
  await signIn(page, 'tech@demo.test');
  await expect(page).toHaveURL('/today');
  await page.goto('/jobs');
  await expect(page).toHaveURL('/forbidden');
  const mine = await page.request.get('/api/jobs?pageSize=100');
  expect(mine.status()).toBe(200);
  const { items } = await mine.json();
  // A technician reads only their crew's jobs, all of their own company.
  expect(items.length).toBeGreaterThan(0);
  expect(items.length).toBeLessThan(15);
  expect(new Set(items.map((j: { companyId: string }) => j.companyId)).size).toBe(1);
  expect(new Set(items.map((j: { crew: { name: string } | null }) => j.crew?.name))).toEqual(new Set(['North crew']));
});

test("the second company's office sees none of the first company's jobs", async ({ page }) => {
  await signIn(page, 'office@demo.test');
  await expect(page).toHaveURL('/jobs');
  const first = (await (await page.request.get('/api/jobs?pageSize=1')).json()).items[0];
  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect(page).toHaveURL(/\/sign-in/);
  await signIn(page, 'office@second.test');
  await expect(page).toHaveURL('/jobs');
  expect((await page.request.get(`/api/jobs/${first.id}`)).status()).toBe(404);
  const { total } = await (await page.request.get('/api/jobs')).json();
  expect(total).toBe(2);
});
