import { expect, test } from '@playwright/test';
import { signIn } from './helpers';

// End of a job: the office approves the seeded early-deflate install (job …-0008, the job's only
// install, so the job becomes approved), invoices the job, sends the repair report; the customer opens
// the link from the e-mail with no account, reads the report and pays through the payment fake; the
// office then sees the invoice paid. Needs the service fakes started by scripts/test.sh.
const MAIL = process.env.MAIL_WEB_URL;

test('approve, invoice, report by e-mail, the customer pays from the link, the office sees it paid', async ({
  browser,
}) => {
  test.skip(!MAIL || !process.env.STRIPE_API_URL, 'needs the service fakes: run through scripts/test.sh');
  test.setTimeout(240_000);
  const office = await (await browser.newContext()).newPage();
  await signIn(office, 'office@demo.test');
  await expect(office).toHaveURL('/jobs', { timeout: 30_000 }); // may be the run's first sign-in, on a cold server

  // Approve the install awaiting review on …-0008.
  await office.goto('/reviews');
  const row = office.getByRole('row').filter({ hasText: '-0008' });
  const jobNumber = (await row.getByRole('link').innerText()).trim();
  await row.getByRole('link').click();
  await expect(office.getByRole('heading', { level: 1 })).toContainText(`Job ${jobNumber}`);
  await office
    .getByLabel('Comment for the crew')
    .fill('Deflate reason accepted: flow came back early, patch inspected sound.');
  await office.getByRole('button', { name: 'Approve' }).click();
  await expect(office.getByRole('region', { name: 'Decision' })).toContainText('Approved');

  // The job page: draft the invoice from its repair, issue it.
  const jobs = await (await office.request.get(`/api/jobs?q=${encodeURIComponent(jobNumber)}`)).json();
  const job = jobs.items.find((j: { number: string }) => j.number === jobNumber);
  await office.goto(`/jobs/${job.id}`);
  await expect(office.getByRole('heading', { level: 1 })).toContainText('Approved');
  const invoice = office.getByRole('region', { name: 'Invoice' });
  await expect(invoice.getByLabel('Line 1 description')).toHaveValue(/Point repair 1/);
  await invoice.getByLabel('Line 1 unit price').fill('1850');
  await invoice.getByRole('button', { name: 'Add line' }).click();
  await invoice.getByLabel('Line 2 description').fill('Mobilisation and traffic control');
  await invoice.getByLabel('Line 2 unit price').fill('250.00');
  await invoice.getByLabel('Tax rate (%)').fill('8.25');
  await invoice.getByRole('button', { name: 'Create invoice' }).click();
  // 1 850.00 + 250.00 = 2 100.00; tax 8.25 % = 173.25; total 2 273.25 (hand-computed).
  await expect(invoice.getByTestId('invoice-total')).toHaveText('$2,273.25');
  await invoice.getByRole('button', { name: 'Issue invoice' }).click();
  await expect(invoice).toContainText('Issued');

  // Send the report to a fresh address.
  const to = `pay-${Date.now()}@example.test`;
  const report = office.getByRole('region', { name: 'Repair report' });
  await report.getByRole('button', { name: 'Send repair report' }).click();
  await report.getByLabel('Send to').fill(to);
  await report.getByRole('button', { name: 'Send now' }).click();
  await expect(
    report.getByRole('table', { name: 'Report send log' }).getByRole('row').filter({ hasText: to }),
  ).toContainText('Sent', { timeout: 60_000 });

  // The customer: the link from the e-mail the local mailbox received.
  let text = '';
  await expect
    .poll(
      async () => {
        const all = await (await office.request.get(`${MAIL}/messages`)).json();
        text = all.find((m: { to: string }) => m.to.includes(to))?.text ?? '';
        return text.length > 0;
      },
      { timeout: 20_000 },
    )
    .toBe(true);
  const link = /https?:\/\/\S+\/r\/[\w-]+\.[\w-]+/.exec(text)?.[0];
  expect(link, 'the report link in the e-mail').toBeTruthy();
  const customer = await (await browser.newContext()).newPage();
  await customer.goto(link!);
  await expect(customer.getByRole('heading', { level: 1 })).toHaveText(`Repair report · Job ${jobNumber}`);
  const bill = customer.getByRole('region', { name: 'Invoice' });
  await expect(bill.getByTestId('invoice-total')).toHaveText('$2,273.25');
  await bill.getByRole('button', { name: 'Pay $2,273.25 now' }).click();
  // The payment provider's hosted page (the local fake), then back to the report.
  await expect(customer.getByRole('heading', { name: 'Local test payment' })).toBeVisible();
  await customer.getByRole('button', { name: 'Pay $2,273.25' }).click();
  await expect(customer).toHaveURL(/\/r\/[\w.-]+\?paid=1$/);
  await expect(customer.getByRole('region', { name: 'Invoice' })).toContainText('Paid — thank you.');

  // The office sees it paid.
  await office.reload();
  await expect(office.getByRole('region', { name: 'Invoice' })).toContainText('Paid');
  await office.goto('/invoices?status=paid');
  await expect(office.getByRole('row').filter({ hasText: `INV-${jobNumber}` })).toContainText('$2,273.25');

  // A second payment arrives for the paid invoice (a checkout made outside the app, paid late): the office
  // sees a payment problem on the invoice, in the list and in the job's history.
  const paidInvoice = (
    await (await office.request.get(`/api/invoices?q=${encodeURIComponent(jobNumber)}&status=paid`)).json()
  ).items[0];
  const stray = await (
    await office.request.post(`${process.env.STRIPE_API_URL}/v1/checkout/sessions`, {
      headers: { authorization: `Bearer ${process.env.STRIPE_SECRET_KEY}` },
      form: {
        mode: 'payment',
        'metadata[invoiceId]': paidInvoice.id,
        'metadata[companyId]': paidInvoice.companyId,
        success_url: new URL('/r/back/x?paid=1', office.url()).href,
        'line_items[0][quantity]': '1',
        'line_items[0][price_data][currency]': 'usd',
        'line_items[0][price_data][unit_amount]': '227325',
        'line_items[0][price_data][product_data][name]': 'Invoice',
      },
    })
  ).json();
  await office.request.post(stray.url, { maxRedirects: 0 });
  await office.goto(`/jobs/${job.id}`);
  await expect(office.getByRole('region', { name: 'Invoice' }).getByTestId('payment-alert')).toContainText(
    'A second payment of $2,273.25',
  );
  await expect(office.getByRole('region', { name: 'History' })).toContainText('payment_mismatch');
  await office.goto('/invoices?status=paid');
  await expect(office.getByRole('row').filter({ hasText: `INV-${jobNumber}` })).toContainText('Payment problem');

  // The office revokes the customer links: the link from the e-mail now answers like any bad link.
  await office.goto(`/jobs/${job.id}`);
  office.once('dialog', (dialog) => dialog.accept());
  await report.getByRole('button', { name: 'Revoke customer links' }).click();
  await expect(report.getByRole('status').filter({ hasText: 'Customer links revoked.' })).toBeVisible();
  await customer.goto(link!);
  await expect(
    customer.getByText('This link is not valid or has expired — ask the company that sent it for a new one.'),
  ).toBeVisible();
  expect((await customer.request.get(`${link}/pdf`)).status()).toBe(404);
});
