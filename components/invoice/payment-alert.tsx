import { formatInZone } from '@/lib/time/dates';

/** The office's alert for a payment that did not match its invoice (a second payment, a wrong amount or currency). */
export function PaymentAlert({
  text,
  at,
  timeZone = 'UTC',
}: {
  text: string;
  at: Date | string | null;
  timeZone?: string;
}) {
  return (
    <div
      role="alert"
      className="rounded-md border-l-4 border-missed-600 bg-missed-100 p-3 text-sm text-missed-700"
      data-testid="payment-alert"
    >
      <p className="font-semibold">Payment problem</p>
      <p>{text}</p>
      {at && <p className="text-xs">Received {formatInZone(new Date(at), timeZone)}</p>}
    </div>
  );
}
