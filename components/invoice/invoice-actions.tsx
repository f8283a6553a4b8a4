'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { submitJson } from '@/lib/client/submit-json';

/** Issue a draft to the customer, or void it; the server decides what the status allows. */
export function InvoiceActions({ invoiceId, status }: { invoiceId: string; status: string }) {
  const router = useRouter();
  const [message, setMessage] = useState<string>();
  const [busy, setBusy] = useState(false);
  const act = async (action: 'issue' | 'void') => {
    const reason = action === 'void' ? window.prompt('Why is this invoice void? (kept in the history)') : null;
    if (action === 'void' && reason === null) return;
    setBusy(true);
    const result = await submitJson(`/api/invoices/${invoiceId}/status`, 'POST', { action, reason });
    setBusy(false);
    if (!result.ok) return setMessage(result.error.message);
    router.refresh();
  };
  return (
    <div className="flex items-center gap-2">
      {status === 'draft' && (
        <Button type="button" onClick={() => act('issue')} disabled={busy}>
          Issue invoice
        </Button>
      )}
      {(status === 'draft' || status === 'issued') && (
        <Button type="button" variant="secondary" onClick={() => act('void')} disabled={busy}>
          Void
        </Button>
      )}
      {message && (
        <span role="alert" className="text-sm text-missed-700">
          {message}
        </span>
      )}
    </div>
  );
}
