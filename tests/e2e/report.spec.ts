import { expect, test } from '@playwright/test';
import { signIn } from './helpers';

// The demo's jobs each have one install; "Joint separation at the crossing" is already approved
// (there is no awaiting-review install on a job whose other installs are approved to approve first).
const JOB_TITLE = 'Joint separation at the crossing';
const MAIL = process.env.MAIL_WEB_URL;

test('the office sends the repair report; the customer opens the link from the e-mail without an account', async ({
  page,
  browser,
}) => {
  test.skip(!MAIL, 'needs the service fakes (MAIL_WEB_URL): run through scripts/test.sh');
  // Sign-in, a queued send, a PDF render and two page loads: more than the default minute on a busy machine.
  test.setTimeout(180_000);
  const to = `e2e-${Date.now()}@example.test`;
  await signIn(page, 'office@demo.test');
  await expect(page).toHaveURL('/jobs');
  const list = await (await page.request.get(`/api/jobs?q=${encodeURIComponent(JOB_TITLE)}`)).json();
  const job = list.items.find((j: { title: string }) => j.title === JOB_TITLE);
  expect(job, 'the demo job').toBeTruthy();

  await page.goto(`/jobs/${job.id}`);
  const panel = page.getByRole('region', { name: 'Repair report' });
  await panel.getByRole('button', { name: 'Send repair report' }).click();
  await panel.getByLabel('Send to').fill(to);
  await panel.getByLabel('Message (optional)').fill('Here is the report for the crossing.');
  await panel.getByRole('button', { name: 'Send now' }).click();
  await expect(panel.getByRole('status')).toHaveText('Report queued: it goes out in a moment.');
  const row = panel.getByRole('table', { name: 'Report send log' }).getByRole('row').filter({ hasText: to });
  await expect(row).toContainText('Sent', { timeout: 30_000 });
  await expect(page.getByRole('heading', { level: 1 })).toContainText('Report sent');

  // The e-mail as the local mailbox received it.
  let message: { id: string; to: string; text: string; attachments: { filename: string }[] } | undefined;
  await expect
    .poll(
      async () => {
        const all = await (await page.request.get(`${MAIL}/messages`)).json();
        message = all.find((m: { to: string }) => m.to.includes(to));
        return Boolean(message);
      },
      { timeout: 15_000 },
    )
    .toBe(true);
  expect(message!.attachments.map((a) => a.filename)).toEqual([`repair-report-${job.number}.pdf`]);
  const link = /https?:\/\/\S+\/r\/[\w-]+\.[\w-]+/.exec(message!.text)?.[0];
  expect(link, 'the report link in the e-mail').toBeTruthy();

  // A fresh browser with no session opens it.
  const customer = await browser.newContext();
  const visitor = await customer.newPage();
  await visitor.goto(link!, { waitUntil: 'domcontentloaded' });
  await expect(visitor).toHaveURL(link!);
  await expect(visitor.getByRole('heading', { level: 1 })).toHaveText(`Repair report · Job ${job.number}`);
  await expect(visitor.getByText('Ridgeback Road at Cole Street', { exact: false })).toBeVisible();
  await expect(visitor.getByRole('heading', { name: 'Cautions' })).toBeVisible();
  await expect(visitor.getByRole('img', { name: /Install timeline/ })).toBeVisible();
  const pdfHref = await visitor.getByRole('link', { name: 'Download PDF' }).getAttribute('href');
  const pdf = await visitor.request.get(pdfHref!);
  expect(pdf.status()).toBe(200);
  expect(pdf.headers()['content-type']).toBe('application/pdf');

  // One changed character in the signature: refused, and nothing about the job shown.
  const tampered = link!.replace(/.$/, (c) => (c === 'A' ? 'B' : 'A'));
  const refused = await visitor.goto(tampered, { waitUntil: 'domcontentloaded' });
  expect(refused?.status()).toBe(404);
  await expect(
    visitor.getByText('This link is not valid or has expired — ask the company that sent it for a new one.'),
  ).toBeVisible();
  await expect(visitor.getByText(job.number)).toHaveCount(0);
  await customer.close();
});
