'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { submitJson } from '@/lib/client/submit-json';
import { label, type JobStatus } from '@/lib/domain/vocabulary';
import { OFFICE_TRANSITIONS } from '@/lib/jobs/status';
import { InlineActions } from '@/components/desk/inline-actions';

// Scheduling is done by giving the job a crew and a day, not by a button here.
const VERBS: Partial<Record<JobStatus, string>> = {
  cancelled: 'Cancel job',
  closed: 'Close job',
  draft: 'Back to draft',
};

/** The office's status moves for this job (cancel, close, reopen), each confirmed and sent as a PATCH. */
export function JobStatusActions({ jobId, status }: { jobId: string; status: JobStatus }) {
  const router = useRouter();
  const [message, setMessage] = useState<string>();
  const [busy, setBusy] = useState(false);
  const moves = OFFICE_TRANSITIONS[status].filter((to) => VERBS[to]);
  const move = async (to: JobStatus) => {
    if (!window.confirm(`${VERBS[to]}? The job becomes ${label(to).toLowerCase()}.`)) return;
    setBusy(true);
    const result = await submitJson(`/api/jobs/${jobId}`, 'PATCH', { status: to });
    setBusy(false);
    if (!result.ok) return setMessage(result.error.message);
    setMessage(undefined);
    router.refresh();
  };
  return (
    <InlineActions message={message}>
      {moves.map((to) => (
        <Button key={to} type="button" variant="secondary" disabled={busy} onClick={() => move(to)}>
          {VERBS[to]}
        </Button>
      ))}
    </InlineActions>
  );
}
