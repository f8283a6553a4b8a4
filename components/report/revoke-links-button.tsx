'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import type { RevokeReportLinksResponse } from '@/lib/data/report-links';
import { Button } from '@/components/ui/button';
import { submitJson } from '@/lib/client/submit-json';

/** "Revoke customer links": every link of the job's reports sent so far stops opening the report. */
export function RevokeLinksButton({ jobId, live }: { jobId: string; live: number }) {
  const router = useRouter();
  const [message, setMessage] = useState<{ tone: 'ok' | 'error'; text: string }>();
  const [busy, setBusy] = useState(false);
  const revoke = async () => {
    if (
      !window.confirm(
        'Revoke every customer link to this job’s report? They stop working at once; send the report again to give the customer a new one.',
      )
    )
      return;
    setBusy(true);
    const result = await submitJson<RevokeReportLinksResponse>(`/api/jobs/${jobId}/report-links`, 'DELETE');
    setBusy(false);
    if (!result.ok) return setMessage({ tone: 'error', text: result.error.message });
    setMessage({ tone: 'ok', text: 'Customer links revoked.' });
    router.refresh();
  };
  return (
    <span className="inline-flex flex-wrap items-center gap-2">
      <Button type="button" variant="secondary" onClick={revoke} disabled={busy || live === 0}>
        Revoke customer links
      </Button>
      <span className="text-sm text-slate-600">{live === 1 ? '1 link open' : `${live} links open`}</span>
      {message && (
        <span
          role={message.tone === 'error' ? 'alert' : 'status'}
          className={message.tone === 'error' ? 'text-sm text-missed-700' : 'text-sm text-safe-700'}
        >
          {message.text}
        </span>
      )}
    </span>
  );
}
