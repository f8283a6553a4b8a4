import { expect, test, type Page } from '@playwright/test';
import { signIn } from './helpers';

// The seed has two installs awaiting review: a late inflate on job …-0007 (North crew, whose
// foreman is foreman@demo.test) and an early deflate on …-0008 (South crew).

// The badge is not drawn at all when nothing waits.
const queueCount = async (page: Page) => {
  const badge = page.getByTestId('nav-count-review');
  return (await badge.count()) === 0 ? 0 : Number((await badge.innerText()).replace(/\D/g, ''));
};

test('the office sends a late-inflate install back and the crew reads the comment on Today', async ({ browser }) => {
  test.slow(); // two people, two sessions, one after the other
  const office = await (await browser.newContext()).newPage();
  await signIn(office, 'office@demo.test');
  await expect(office).toHaveURL('/jobs');
  await expect(office.getByTestId('nav-count-review')).toBeVisible();
  const waiting = await queueCount(office);
  expect(waiting).toBeGreaterThanOrEqual(1); // closeout.spec may already have approved …-0008

  await office.getByRole('link', { name: /^Review/ }).click();
  await expect(office).toHaveURL('/reviews');
  await expect(office.getByRole('heading', { level: 1 })).toHaveText('Review');
  // Worst first: the late inflate carries a critical flag.
  const late = office.getByRole('row').filter({ hasText: '-0007' });
  await expect(late.locator('[data-kind="late-inflate"]')).toHaveAttribute('data-severity', 'critical');

  const jobNumber = (await late.getByRole('link').innerText()).trim();
  await late.getByRole('link').click();
  await expect(office).toHaveURL(/\/reviews\/[0-9a-f-]{36}$/);
  await expect(office.getByRole('heading', { level: 1 })).toContainText(`Job ${jobNumber}`);
  await expect(office.getByTestId('flag-list').locator('[data-kind="late-inflate"]')).toContainText(
    'after the inflate-by time',
  );
  const chart = office.getByTestId('timeline-chart');
  await expect(chart.getByRole('img', { name: /Install timeline/ })).toBeVisible();
  await expect(chart.locator('[data-lane="working"] [data-tone="missed"]').first()).toBeAttached();
  await expect(chart).toContainText(/Inflated \d+ min late/);
  await expect(office.getByTestId('event-timeline').locator('tr[data-type="bladder_inflated"]')).toContainText('psi');

  // Sending back needs words for the crew.
  await office.getByRole('button', { name: 'Send back' }).click();
  await expect(office.getByText('Tell the crew what to fix')).toBeVisible();
  const comment = 'Inflated after the working window: redo the patch and send the gauge photo.';
  await office.getByLabel('Comment for the crew').fill(comment);
  await office.getByRole('button', { name: 'Send back' }).click();
  await expect(office.getByText('This install is sent back: there is nothing to decide now.')).toBeVisible();
  await expect(office.getByRole('region', { name: 'Decision' })).toContainText(comment);
  await expect(office.getByRole('button', { name: 'Approve' })).toHaveCount(0);
  await expect.poll(() => queueCount(office)).toBe(waiting - 1);

  const crew = await (await browser.newContext()).newPage();
  await signIn(crew, 'foreman@demo.test');
  await expect(crew).toHaveURL('/today');
  const job = crew.getByTestId(`job-${jobNumber}`);
  await expect(job.getByTestId('review-comment')).toHaveText(`Office: ${comment}`);
  await expect(job).toContainText('Sent back');
  await job.getByRole('link', { name: /Install: Sent back/ }).click();
  await expect(crew.getByTestId('step-done')).toContainText('Sent back by the office');

  // The foreman answers and resubmits: the install goes back to the office's queue.
  await crew.getByRole('button', { name: 'Sign off again — resubmit for review' }).click();
  await expect(crew.getByTestId('step-done')).toContainText('Signed off. The office will review it.', {
    timeout: 20_000,
  });
  await office.reload();
  await expect.poll(() => queueCount(office)).toBe(waiting);
});

test('a field user cannot open the review pages', async ({ page }) => {
  await signIn(page, 'foreman@demo.test');
  await expect(page).toHaveURL('/today');
  await page.goto('/reviews');
  await expect(page).toHaveURL(/\/forbidden/);
});
