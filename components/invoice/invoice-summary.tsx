import { Badge } from '@/components/ui/badge';
import { label } from '@/lib/domain/vocabulary';
import { bpToPercent, formatMoney } from '@/lib/invoice/money';
import type { InvoiceDetail } from '@/lib/data/invoices';

/** The invoice as both the office and the customer read it: lines, subtotal, tax, total, due date, status. */
export function InvoiceSummary({ invoice }: { invoice: InvoiceDetail }) {
  const money = (cents: number) => formatMoney(cents, invoice.currency);
  const tone = invoice.status === 'paid' ? 'safe' : invoice.status === 'issued' ? 'brand' : 'neutral';
  return (
    <div className="space-y-2 text-sm">
      <p className="flex flex-wrap items-center gap-2">
        <span className="font-semibold">Invoice {invoice.number}</span>
        <Badge tone={tone}>{label(invoice.status)}</Badge>
        <span className="text-slate-600">Due {invoice.dueOn}</span>
        {invoice.paidAt && (
          <span className="text-safe-700">Paid {new Date(invoice.paidAt).toISOString().slice(0, 10)}</span>
        )}
      </p>
      <table className="min-w-full">
        <thead className="text-left text-xs uppercase text-slate-600">
          <tr>
            <th className="py-1 pr-2">Description</th>
            <th className="py-1 pr-2 text-right">Qty</th>
            <th className="py-1 pr-2 text-right">Unit price</th>
            <th className="py-1 text-right">Amount</th>
          </tr>
        </thead>
        <tbody className="divide-y divide-slate-100">
          {invoice.lines.map((line) => (
            <tr key={line.id}>
              <td className="py-1 pr-2">{line.description}</td>
              <td className="py-1 pr-2 text-right tabular-nums">{line.quantity}</td>
              <td className="py-1 pr-2 text-right tabular-nums">{money(line.unitPriceCents)}</td>
              <td className="py-1 text-right tabular-nums">{money(line.amountCents)}</td>
            </tr>
          ))}
        </tbody>
        <tfoot className="tabular-nums">
          <tr>
            <td colSpan={3} className="pt-2 text-right">
              Subtotal
            </td>
            <td className="pt-2 text-right">{money(invoice.subtotalCents)}</td>
          </tr>
          <tr>
            <td colSpan={3} className="text-right">
              Tax ({bpToPercent(invoice.taxRateBp)} %)
            </td>
            <td className="text-right">{money(invoice.taxCents)}</td>
          </tr>
          <tr className="font-semibold">
            <td colSpan={3} className="text-right">
              Total
            </td>
            <td className="text-right" data-testid="invoice-total">
              {money(invoice.totalCents)}
            </td>
          </tr>
        </tfoot>
      </table>
    </div>
  );
}
