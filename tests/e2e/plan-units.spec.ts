import { expect, test, type Page } from '@playwright/test';
import { hydrated, signIn } from './helpers';

// Unit symbols as NIST SP 811 writes them, after a number.
const METRIC = /\d\s?(mm|m|kPa|bar|°C|L|kN|MPa)\b/;
const IMPERIAL = /\d\s?(in|ft|psi|°F|US gal|lbf)\b/;

/** Opens the first planned repair of the signed-in company and returns its Plan region. */
async function openPlannedRepair(page: Page) {
  await page.goto('/repairs?status=planned&sort=position');
  await page
    .getByRole('link', { name: /^Repair \d+$/ })
    .first()
    .click();
  await expect(page).toHaveURL(/\/repairs\/[0-9a-f-]{36}$/);
  await hydrated(page, 'section[aria-labelledby="plan-heading"] input');
  return page.getByRole('region', { name: 'Plan' });
}

async function fill(plan: ReturnType<Page['getByRole']>, values: Record<string, string>) {
  for (const [label, value] of Object.entries(values)) await plan.getByLabel(label, { exact: true }).fill(value);
}

test('an imperial company’s plan page reads inches, feet and psi only, and names the checks it ran', async ({
  page,
}) => {
  await signIn(page, 'office@demo.test');
  await expect(page).not.toHaveURL(/sign-in/);
  const plan = await openPlannedRepair(page);
  // Too thin for 10 ft of water, and shorter than the defect plus overlap: every kind of warning shows.
  await fill(plan, { 'Groundwater head': '10', 'Laminate thickness': '0.05', 'Length to check': '6' });
  await expect(plan.getByRole('alert')).toContainText('too thin');
  await expect(plan.getByRole('alert')).toContainText('shorter than the defect');
  await expect(plan).toContainText('Groundwater stands 10.0 ft above the invert');
  const text = await plan.innerText();
  expect(text).not.toMatch(METRIC);
  expect(text).toMatch(IMPERIAL);
  expect(await page.locator('dl').first().innerText()).not.toMatch(METRIC);

  // Thick enough: the badge names the ASTM F1216 X1 checks that ran.
  await fill(plan, { 'Laminate thickness': '0.5', 'Length to check': '' });
  await expect(plan.getByText(/^Thick enough — X1\.1 buckling at 10\.0 ft of water, X1\.4 stiffness$/)).toBeVisible();
  expect(await plan.innerText()).not.toMatch(METRIC);
});

test('a metric company’s plan page reads millimetres, metres and kPa only', async ({ page }) => {
  await signIn(page, 'office@second.test');
  await expect(page).not.toHaveURL(/sign-in/);
  const plan = await openPlannedRepair(page);
  await fill(plan, { 'Groundwater head': '3', 'Laminate thickness': '1', 'Length to check': '150' });
  await expect(plan.getByRole('alert')).toContainText('too thin');
  await expect(plan).toContainText('Groundwater stands 3.00 m above the invert');
  const text = await plan.innerText();
  expect(text).not.toMatch(IMPERIAL);
  expect(text).toMatch(METRIC);
  expect(await page.locator('dl').first().innerText()).not.toMatch(IMPERIAL);

  // No groundwater at all: the floors still run (DR ≤ 100 beside X1.4), in metric.
  await fill(plan, { 'Groundwater head': '0', 'Laminate thickness': '8', 'Length to check': '' });
  await expect(plan.getByText(/^Thick enough — X1\.4 stiffness, DR ≤ 100$/)).toBeVisible();
  expect(await plan.innerText()).not.toMatch(IMPERIAL);
});
