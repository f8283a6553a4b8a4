import { invoiceOfJob } from '@/lib/data/invoices';
import { formatMoney } from '@/lib/invoice/money';
import { InvoiceSummary } from './invoice-summary';
import { cardClass } from '@/components/ui/card';
import { cn } from '@/lib/ui/cn';

/**
 * The invoice on the customer's report page: only one the office has issued (never a draft or a void one),
 * with "Pay now" while it is open. `justPaid` is the provider sending the customer back after paying.
 */
export async function CustomerInvoice({
  companyId,
  jobId,
  token,
  justPaid,
}: {
  companyId: string;
  jobId: string;
  token: string;
  justPaid: boolean;
}) {
  const invoice = await invoiceOfJob(companyId, jobId);
  if (!invoice || (invoice.status !== 'issued' && invoice.status !== 'paid')) return null;
  return (
    <section aria-labelledby="invoice-heading" className={cn(cardClass, 'space-y-3')}>
      <h2 id="invoice-heading" className="text-lg font-semibold">
        Invoice
      </h2>
      <InvoiceSummary invoice={invoice} />
      {invoice.status === 'paid' ? (
        <p role="status" className="rounded-md bg-safe-100 p-3 text-sm font-medium text-safe-700">
          Paid — thank you.
        </p>
      ) : justPaid ? (
        <p role="status" className="rounded-md bg-near-100 p-3 text-sm text-near-700">
          Your payment is being confirmed. Refresh this page in a moment.
        </p>
      ) : (
        <form method="post" action={`/r/${encodeURIComponent(token)}/pay`}>
          <button
            type="submit"
            className="min-h-touch rounded-md bg-brand-700 px-6 text-lg font-semibold text-white hover:bg-brand-800"
          >
            Pay {formatMoney(invoice.totalCents, invoice.currency)} now
          </button>
          <p className="mt-2 text-xs text-slate-500">
            You will be taken to our payment provider&apos;s secure page and brought back here.
          </p>
        </form>
      )}
    </section>
  );
}
