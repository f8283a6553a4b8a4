import { expect, test } from '@playwright/test';
import { dayIn, hydrated, signIn } from './helpers';

// The office's whole intake in the browser, in the demo company's imperial units and Denver time:
// customer → site (two manholes) → segment → job → repair → plan → schedule for tomorrow; then the
// North crew's foreman sees the job on Today.
test('office takes a job from the first call to tomorrow’s schedule; the foreman sees it on Today', async ({
  browser,
}) => {
  test.setTimeout(240_000);
  const tag = Date.now().toString(36).slice(-5);
  const customerName = `Juniper Court Owners ${tag}`;
  const office = await (await browser.newContext()).newPage();
  await signIn(office, 'office@demo.test');
  await expect(office).toHaveURL('/jobs');

  // Customer.
  await office.goto('/customers/new');
  await hydrated(office);
  await office.getByLabel('Name').fill(customerName);
  await office.getByLabel('Kind').selectOption('property_manager');
  await office.getByLabel(/^E-mail/).fill(`desk-${tag}@example.test`);
  await office.getByRole('button', { name: 'Create customer' }).click();
  await expect(office.getByRole('heading', { level: 1 })).toHaveText(customerName);

  // Site with two manholes.
  await office.getByRole('link', { name: 'New site' }).click();
  await expect(office).toHaveURL(/\/sites\/new\?customerId=/);
  await hydrated(office);
  await office.getByLabel('Site name').fill(`Juniper Court ${tag}`);
  await office.getByLabel('Street address').fill('14 Juniper Court');
  await office.getByLabel('City').fill('Larkfield');
  await office.getByRole('button', { name: 'Create site' }).click();
  await expect(office.getByRole('heading', { level: 1 })).toContainText(`Juniper Court ${tag}`);
  for (const name of ['MH-A', 'MH-B']) {
    await hydrated(office);
    await office.getByLabel('Label').fill(name);
    await office.getByLabel('Kind').selectOption('manhole');
    await office.getByRole('button', { name: 'Add access point' }).click();
    await expect(office.getByRole('cell', { name, exact: true })).toBeVisible();
  }

  // Segment between them, in inches and feet.
  await office.getByRole('link', { name: 'New segment' }).click();
  await hydrated(office);
  await office.getByLabel('Label').fill('MH-A → MH-B');
  await office.getByLabel('From access point').selectOption({ label: 'MH-A' });
  await office.getByLabel('To access point').selectOption({ label: 'MH-B' });
  await office.getByLabel('Material').selectOption('vitrified_clay');
  await office.getByLabel('Nominal size').fill('8');
  await office.getByLabel('Inside diameter').fill('7.9');
  await office.getByLabel('Length').fill('120');
  await office.getByRole('button', { name: 'Create segment' }).click();
  await expect(office).toHaveURL(/\/segments\/[0-9a-f-]{36}$/);

  // Job for the customer's site.
  await office.goto('/jobs/new');
  await hydrated(office);
  await office.getByLabel('Customer').selectOption({ label: customerName });
  await office.getByLabel('Site').selectOption({ index: 1 });
  await office.getByLabel('Title').fill('Fracture at 40 ft');
  await office.getByRole('button', { name: 'Create job' }).click();
  await expect(office).toHaveURL(/\/jobs\/[0-9a-f-]{36}$/);
  const jobNumber = ((await office.getByRole('heading', { level: 1 }).innerText()).match(/\d{4}-\d{4}/) ?? [''])[0];
  expect(jobNumber).toMatch(/^\d{4}-\d{4}$/);

  // Repair on the segment.
  await office.getByRole('link', { name: 'Add repair' }).click();
  await hydrated(office);
  await office.getByLabel('Segment').selectOption({ index: 1 });
  await office.getByLabel('Distance from access point').fill('40');
  await office.getByLabel('Defect type').selectOption('open_fracture');
  await office.getByLabel('Condition grade').selectOption('4');
  await office.getByLabel('Defect length').fill('12');
  await office.getByLabel('Clock position').fill('3');
  await office.getByRole('button', { name: 'Create repair' }).click();
  await expect(office).toHaveURL(/\/repairs\/[0-9a-f-]{36}$/);

  // Plan: 12 in defect + 2 × 12 in overlap (the company's 305 mm) = 36 in patch; the 8 in packer fits 7.9 in.
  const plan = office.getByRole('region', { name: 'Plan' });
  await expect(plan.getByText('Patch length', { exact: true })).toBeVisible();
  await expect(plan).toContainText('36');
  await expect(plan.getByText('8 in packer', { exact: true })).toBeVisible();
  await hydrated(office, 'input[aria-label="Use 8 in packer"]');
  await plan.getByLabel('Use 8 in packer').check();
  await plan.getByRole('button', { name: 'Save plan' }).click();
  await expect(plan.getByRole('status')).toHaveText('Plan saved.');

  // Schedule for tomorrow (company time) on North crew.
  const tomorrow = dayIn('America/Denver', 1);
  await office.goto(`/schedule?week=${tomorrow}`);
  await hydrated(office);
  const form = office.getByRole('region', { name: 'Schedule a job' });
  const option = await form.getByLabel('Job').locator('option', { hasText: jobNumber }).getAttribute('value');
  await form.getByLabel('Job').selectOption(option!);
  await form.getByLabel('Crew').selectOption({ label: 'North crew (4 jobs a day)' });
  await form.getByLabel('Day').fill(tomorrow);
  await form.getByRole('button', { name: 'Schedule' }).click();
  await expect(office.getByRole('row', { name: /North crew/ })).toContainText(jobNumber);

  // The foreman of North crew sees it among tomorrow's work.
  const foreman = await (await browser.newContext()).newPage();
  await signIn(foreman, 'foreman@demo.test');
  await expect(foreman).toHaveURL('/today');
  await expect(foreman.getByTestId(`job-${jobNumber}`)).toContainText('14 Juniper Court');
});
