import AxeBuilder from '@axe-core/playwright';
import { expect, test } from '@playwright/test';
import { hydrated, signIn } from './helpers';

// The figures themselves are checked against hand-worked values in tests/integration/insights*.test.ts; here the
// page: pickers, charts drawn in the browser beside their tables, the CSV download, and an accessibility scan.
test.describe('insights', () => {
  test('the office reads a period, narrows it to a crew and downloads the CSV', async ({ page }) => {
    await signIn(page, 'office@demo.test');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Insights' }).click();
    await expect(page).toHaveURL(/\/insights/);
    await expect(page.getByRole('heading', { name: 'Insights', level: 1 })).toBeVisible();
    await expect(page.getByTestId('insights-summary')).toContainText(
      /\d+ installs mixed from \d{4}-\d{2}-\d{2} to \d{4}-\d{2}-\d{2} by all crews/,
    );
    // recharts draws each chart in a wrapper once its chunk has loaded: five sections, five charts (its legend
    // icons are SVGs of the same class, so the wrappers are counted).
    await expect(page.locator('.recharts-wrapper')).toHaveCount(5, { timeout: 20_000 });
    for (const section of ['weekly', 'flags', 'margin', 'hold', 'pressure']) {
      await expect(page.getByTestId(`insights-${section}`).getByRole('img').first()).toBeVisible();
    }

    await hydrated(page);
    await page.getByLabel('Crew', { exact: true }).selectOption({ label: 'North crew' });
    await page.getByRole('button', { name: 'Show' }).click();
    await expect(page).toHaveURL(/crewId=/);
    await expect(page.getByTestId('insights-summary')).toContainText('by North crew');

    const href = await page.getByTestId('insights-csv').getAttribute('href');
    expect(href).toMatch(/format=csv/);
    const csv = await page.request.get(href!);
    expect(csv.status()).toBe(200);
    expect(csv.headers()['content-disposition']).toMatch(/^attachment; filename="insights-/);
    const text = await csv.text();
    expect(text.replace(/^\uFEFF/, '').split('\r\n')[0]).toMatch(
      /^Week starting,Installs \(resin mixed\),Flagged,Late inflate,/,
    );
    expect(text).toContain('Whole period');
  });

  test('a reversed period is refused with a message, and the default period is shown', async ({ page }) => {
    await signIn(page, 'admin@demo.test');
    // The sign-in form posts itself and then navigates: wait for the session before going elsewhere.
    await expect(page).not.toHaveURL(/\/sign-in/);
    await page.goto('/insights?from=2026-05-01&to=2026-01-01');
    await expect(page.getByRole('main').getByRole('alert')).toContainText('The period ends before it starts');
    await expect(page.getByTestId('insights-summary')).toBeVisible();
  });

  test('has no accessibility violations (axe, WCAG 2.1 A/AA)', async ({ page }) => {
    await signIn(page, 'office@demo.test');
    await expect(page).not.toHaveURL(/\/sign-in/);
    await page.goto('/insights');
    await expect(page.locator('.recharts-wrapper')).toHaveCount(5, { timeout: 20_000 });
    const results = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
    expect(results.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`)).toEqual([]);
  });
});
