import { addDays, format } from 'date-fns';
import { invoiceOfJob } from '@/lib/data/invoices';
import { label } from '@/lib/domain/vocabulary';
import { formatLength, type UnitSystem } from '@/lib/units';
import type { SessionUser } from '@/lib/auth/session';
import { InvoiceActions } from './invoice-actions';
import { InvoiceForm } from './invoice-form';
import { InvoiceSummary } from './invoice-summary';
import { PaymentAlert } from './payment-alert';
import { cardClass } from '@/components/ui/card';
import { cn } from '@/lib/ui/cn';

type RepairLine = {
  id: string;
  position: number;
  defectType: string;
  distanceMm: number;
  plannedPatchLengthMm: number | null;
  status: string;
  segment?: { label: string } | null;
};

/** The job page's invoice section: the live invoice with its actions, or a form to draft one from the repairs. */
export async function InvoicePanel({
  user,
  job,
  unitSystem,
  timeZone,
}: {
  user: SessionUser;
  job: { id: string; number: string; status: string; repairs?: RepairLine[] };
  unitSystem: UnitSystem;
  timeZone?: string;
}) {
  const invoice = await invoiceOfJob(user.companyId, job.id);
  const repairs = (job.repairs ?? []).filter((repair) => repair.status !== 'cancelled');
  return (
    <section aria-labelledby="invoice-heading" className={cn(cardClass, 'space-y-3')}>
      <h2 id="invoice-heading" className="text-lg font-semibold">
        Invoice
      </h2>
      {invoice ? (
        <>
          {invoice.paymentAlert && (
            <PaymentAlert text={invoice.paymentAlert} at={invoice.paymentAlertAt} timeZone={timeZone} />
          )}
          <InvoiceSummary invoice={invoice} />
          <InvoiceActions invoiceId={invoice.id} status={invoice.status} />
        </>
      ) : job.status === 'cancelled' ? (
        <p className="text-sm text-slate-500">A cancelled job is not invoiced.</p>
      ) : (
        <InvoiceForm
          defaults={{
            jobId: job.id,
            currency: unitSystem === 'metric' ? 'eur' : 'usd',
            taxRatePct: '0',
            dueOn: format(addDays(new Date(), 30), 'yyyy-MM-dd'),
            lines: repairs.map((repair) => ({
              repairId: repair.id,
              description:
                `Point repair ${repair.position}: ${label(repair.defectType).toLowerCase()} at ` +
                `${formatLength(repair.distanceMm, unitSystem, 'long')}${repair.segment ? ` in ${repair.segment.label}` : ''}` +
                (repair.plannedPatchLengthMm ? `, ${formatLength(repair.plannedPatchLengthMm, unitSystem)} patch` : ''),
              quantity: '1',
              unitPrice: '',
            })),
          }}
        />
      )}
    </section>
  );
}
