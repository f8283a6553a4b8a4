import { expect, test } from '@playwright/test';
import { signIn } from './helpers';

// Demo data: North crew (4 jobs a day) and South crew (3 a day), jobs booked relative to today, one draft.
test('the office books the draft job on a crew day from the board, unassigns it, then moves a week', async ({
  page,
}) => {
  await signIn(page, 'office@demo.test');
  await expect(page).toHaveURL('/jobs');
  await page.goto('/schedule');
  await expect(page.getByRole('heading', { level: 1 })).toHaveText('Schedule');
  const board = page.getByRole('table');
  await expect(board.getByRole('rowheader', { name: 'North crew' })).toBeVisible();
  await expect(board.getByRole('rowheader', { name: 'South crew' })).toBeVisible();
  const headers = await board.getByRole('columnheader').allInnerTexts();
  expect(headers.slice(1).map((h) => h.slice(0, 3))).toEqual(['Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat', 'Sun']);
  await expect(board.locator('th[aria-current="date"]')).toHaveCount(1);

  const unscheduled = page.getByRole('complementary', { name: /Unscheduled jobs/ });
  const draft = page.getByLabel('Job', { exact: true }).locator('option', { hasText: 'Draft' }).first();
  const number = (await draft.innerText()).split(' · ')[0];
  await expect(unscheduled.getByRole('link', { name: number })).toBeVisible();

  const form = page.getByRole('region', { name: 'Schedule a job' });
  await form.getByLabel('Job', { exact: true }).selectOption(await draft.getAttribute('value'));
  await form.getByLabel('Crew', { exact: true }).selectOption({ label: 'South crew (3 jobs a day)' });
  // The day starts on today (in the company's zone), which is in the week shown.
  await expect(form.getByLabel('Day', { exact: true })).toHaveValue(/^\d{4}-\d{2}-\d{2}$/);
  await form.getByRole('button', { name: 'Schedule', exact: true }).click();
  await expect(form.getByText(`Job ${number} is booked for South crew`)).toBeVisible();

  const southRow = board.getByRole('row').filter({ has: page.getByRole('rowheader', { name: 'South crew' }) });
  await expect(southRow.getByRole('link', { name: number })).toBeVisible();
  await expect(unscheduled.getByRole('link', { name: number })).toHaveCount(0);

  // Unassign puts it back on the side list.
  await southRow.getByRole('button', { name: `Unassign ${number}` }).click();
  await expect(unscheduled.getByRole('link', { name: number })).toBeVisible();

  const firstHeader = headers[1];
  await page.getByRole('link', { name: 'Next week' }).click();
  await expect(page).toHaveURL(/\/schedule\?week=\d{4}-\d{2}-\d{2}/);
  await expect(board.getByRole('columnheader').nth(1)).not.toHaveText(firstHeader);
  await expect(board.locator('th[aria-current="date"]')).toHaveCount(0);
  await page.getByRole('link', { name: 'This week' }).click();
  await expect(board.getByRole('columnheader').nth(1)).toHaveText(firstHeader);
});

test('a field user cannot open the desk schedule', async ({ page }) => {
  await signIn(page, 'foreman@demo.test');
  await expect(page).toHaveURL('/today');
  await page.goto('/schedule');
  await expect(page).toHaveURL(/\/forbidden/);
});
