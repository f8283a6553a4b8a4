import { expect, test } from '@playwright/test';
import { signIn } from './helpers';

// Works on a user this spec creates itself, so the demo accounts other specs sign in with stay untouched.
test('an admin creates a user, deactivates them, and their open session is refused at once', async ({ browser }) => {
  const stamp = Date.now().toString(36);
  const name = `Jo Example ${stamp}`;
  const email = `jo.${stamp}@demo.test`;
  const password = 'a-long-enough-passphrase';
  const adminContext = await browser.newContext();
  const userContext = await browser.newContext();
  const admin = await adminContext.newPage();
  const person = await userContext.newPage();

  await signIn(admin, 'admin@demo.test');
  await expect(admin).toHaveURL('/admin', { timeout: 30_000 }); // the run's first sign-in may meet a cold server
  await admin.getByRole('link', { name: /^Users/ }).click();
  await expect(admin.getByRole('heading', { level: 1 })).toHaveText('Users');
  await admin.getByRole('link', { name: 'New user' }).click();
  await admin.getByLabel('Name').fill(name);
  await admin.getByLabel('E-mail').fill(email.toUpperCase());
  await admin.getByLabel('Role').selectOption('technician');
  await admin.getByLabel('Initial password').fill('short');
  await admin.getByRole('button', { name: 'Create user' }).click();
  await expect(admin.getByText('At least 12 characters')).toBeVisible();
  await admin.getByLabel('Initial password').fill(password);
  await admin.getByRole('button', { name: 'Create user' }).click();
  await expect(admin).toHaveURL(/\/admin\/users$/);

  // The new person signs in (the e-mail was stored lowercased) and works in another browser.
  await signIn(person, email, password);
  await expect(person).toHaveURL('/today');
  expect((await person.request.get('/api/jobs')).status()).toBe(200);

  await admin.goto(`/admin/users?q=${encodeURIComponent(email)}`);
  await admin.getByRole('button', { name: `Deactivate ${name}` }).click();
  await expect(admin.getByRole('status')).toHaveText(`${name} is deactivated and signed out.`);
  await expect(admin.getByRole('button', { name: `Reactivate ${name}` })).toBeVisible();

  // Their next request is refused: the API answers 401 and a page sends them to sign in.
  expect((await person.request.get('/api/jobs')).status()).toBe(401);
  await person.goto('/today');
  await expect(person).toHaveURL(/\/sign-in/);
  await signIn(person, email, password);
  await expect(person.getByRole('main').getByRole('alert')).toHaveText(
    'That e-mail and password do not match an active account.',
  );

  await adminContext.close();
  await userContext.close();
});

test('an admin resets a password: the old session ends and only the new password works', async ({ browser }) => {
  const stamp = Date.now().toString(36);
  const name = `Sam Sample ${stamp}`;
  const email = `sam.${stamp}@demo.test`;
  const adminContext = await browser.newContext();
  const userContext = await browser.newContext();
  const admin = await adminContext.newPage();
  const person = await userContext.newPage();

  await signIn(admin, 'admin@demo.test');
  await expect(admin).toHaveURL('/admin');
  const made = await admin.request.post('/api/users', {
    data: { name, email, role: 'foreman', password: 'first-password-123' },
  });
  expect(made.status()).toBe(201);
  await signIn(person, email, 'first-password-123');
  await expect(person).toHaveURL('/today');

  await admin.goto(`/admin/users?q=${encodeURIComponent(email)}`);
  await admin.getByRole('button', { name: `Reset password ${name}` }).click();
  await admin.getByLabel(`New password for ${name}`).fill('second-password-456');
  await admin.getByRole('button', { name: 'Save password', exact: true }).click();
  await expect(admin.getByRole('status')).toHaveText(`New password set; ${name} is signed out everywhere.`);

  expect((await person.request.get('/api/jobs')).status()).toBe(401);
  await signIn(person, email, 'first-password-123');
  await expect(person.getByRole('main').getByRole('alert')).toBeVisible();
  await signIn(person, email, 'second-password-456');
  await expect(person).toHaveURL('/today');

  await adminContext.close();
  await userContext.close();
});

test('the settings index links every section; the office gets the 403 page and 403 answers', async ({ page }) => {
  await signIn(page, 'admin@demo.test');
  await expect(page).toHaveURL('/admin');
  const settings = page.getByRole('navigation', { name: 'Settings' });
  for (const [title, href] of [
    ['Company', '/admin/company'],
    ['Users', '/admin/users'],
    ['Crews', '/admin/crews'],
    ['Resin systems', '/admin/resin-systems'],
    ['Resin kits', '/admin/resin-kits'],
    ['Packers', '/admin/packers'],
    ['Check-list templates', '/admin/checklists'],
  ]) {
    await expect(settings.getByRole('link', { name: new RegExp(`^${title}`) })).toHaveAttribute('href', href);
  }
  await settings.getByRole('link', { name: /^Company/ }).click();
  await expect(page.getByLabel('Time zone')).toHaveValue('America/Denver');
  await settings.page().goto('/admin/crews');
  await expect(page.getByRole('link', { name: 'North crew' })).toBeVisible();
  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect(page).toHaveURL(/\/sign-in/);

  await signIn(page, 'office@demo.test');
  await expect(page).toHaveURL('/jobs');
  for (const path of ['/admin', '/admin/users', '/admin/company', '/admin/crews']) {
    await page.goto(path);
    await expect(page).toHaveURL('/forbidden');
  }
  expect((await page.request.get('/api/users')).status()).toBe(403);
  expect((await page.request.patch('/api/company', { data: { name: 'Nope' } })).status()).toBe(403);
  expect((await page.request.get('/api/company')).status()).toBe(200);
});
