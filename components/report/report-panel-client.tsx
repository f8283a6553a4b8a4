'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useEffect, useRef, useState, type ReactNode } from 'react';
import { useForm } from 'react-hook-form';
import useSWR from 'swr';
import { FormField, errorProps } from '@/components/desk/form-field';
import { Input, Textarea } from '@/components/ui/input';
import type { ReportSendsResponse } from '@/lib/data/report-sends';
import { Badge } from '@/components/ui/badge';
import { Button, buttonVariants } from '@/components/ui/button';
import { fetchJson } from '@/lib/client/fetch-json';
import { applyServerErrors, submitJson } from '@/lib/client/submit-json';
import { sendReportSchema, type SendReportInput } from '@/lib/validation/report';
import { cardClass } from '@/components/ui/card';

const TONES: Record<string, 'near' | 'safe' | 'missed'> = {
  queued: 'near',
  sending: 'near',
  sent: 'safe',
  failed: 'missed',
};
const STATUS_TEXT: Record<string, string> = { queued: 'Queued', sending: 'Sending', sent: 'Sent', failed: 'Failed' };

export function ReportPanelClient({
  jobId,
  customerEmail,
  blockedReason,
  linksSlot,
}: {
  jobId: string;
  customerEmail: string | null;
  blockedReason: string | null;
  linksSlot?: ReactNode;
}) {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [notice, setNotice] = useState<string | null>(null);
  const url = `/api/jobs/${jobId}/report-sends`;
  const { data, mutate } = useSWR<ReportSendsResponse>(url, (u: string) => fetchJson<ReportSendsResponse>(u), {
    // Poll while the worker still has something of ours to do.
    refreshInterval: (latest) =>
      latest?.items.some((s) => s.status === 'queued' || s.status === 'sending') ? 2000 : 0,
  });
  const form = useForm<SendReportInput>({
    resolver: zodResolver(sendReportSchema),
    defaultValues: { to: customerEmail ?? '', message: '' },
  });
  const { errors, isSubmitting } = form.formState;

  // The job's status moves to "reported" when a send goes out: refresh the page's badge then.
  const sentCount = data?.items.filter((s) => s.status === 'sent').length ?? 0;
  const seen = useRef<number | null>(null);
  useEffect(() => {
    if (seen.current !== null && sentCount > seen.current) router.refresh();
    seen.current = sentCount;
  }, [sentCount, router]);

  async function onSubmit(values: SendReportInput) {
    setNotice(null);
    const result = await submitJson(`/api/jobs/${jobId}/report`, 'POST', values);
    if (!result.ok) {
      setNotice(applyServerErrors(result.error, form.setError));
      return;
    }
    setNotice('Report queued: it goes out in a moment.');
    setOpen(false);
    await mutate();
  }

  return (
    <section aria-labelledby="report-heading" className={cardClass} data-section="repair-report">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 id="report-heading" className="text-lg font-semibold">
          Repair report
        </h2>
        <div className="flex gap-2">
          <a
            href={`/api/jobs/${jobId}/report`}
            target="_blank"
            rel="noreferrer"
            className={buttonVariants({ variant: 'secondary' })}
          >
            Preview PDF
          </a>
          <Button
            type="button"
            onClick={() => setOpen((v) => !v)}
            disabled={blockedReason !== null}
            aria-expanded={open}
            aria-controls="report-send-form"
          >
            Send repair report
          </Button>
        </div>
      </div>
      {blockedReason && <p className="mt-2 text-sm text-slate-600">{blockedReason}</p>}
      {linksSlot && <div className="mt-2">{linksSlot}</div>}
      <p role="status" className="mt-2 text-sm text-slate-700">
        {notice}
      </p>
      {open && (
        <form
          id="report-send-form"
          onSubmit={form.handleSubmit(onSubmit)}
          className="mt-3 grid max-w-xl gap-3"
          noValidate
        >
          <FormField
            id="report-to"
            label="Send to"
            error={errors.to?.message}
            hint={customerEmail ? 'The customer’s e-mail unless you change it.' : 'The customer has no e-mail on file.'}
          >
            <Input type="email" {...errorProps('report-to', errors.to?.message)} {...form.register('to')} />
          </FormField>
          <FormField id="report-message" label="Message (optional)" error={errors.message?.message}>
            <Textarea {...errorProps('report-message', errors.message?.message)} {...form.register('message')} />
          </FormField>
          <div>
            <Button type="submit" disabled={isSubmitting}>
              {isSubmitting ? 'Queuing…' : 'Send now'}
            </Button>
          </div>
        </form>
      )}
      <table className="mt-4 min-w-full text-sm" aria-label="Report send log">
        <thead className="bg-slate-100 text-left text-xs uppercase text-slate-600">
          <tr>
            <th className="px-3 py-2">Requested</th>
            <th className="px-3 py-2">To</th>
            <th className="px-3 py-2">By</th>
            <th className="px-3 py-2">Status</th>
            <th className="px-3 py-2">Tries</th>
            <th className="px-3 py-2">Last error</th>
          </tr>
        </thead>
        <tbody className="divide-y divide-slate-100">
          {(data?.items ?? []).map((send) => (
            <tr key={send.id}>
              <td className="px-3 py-2">{new Date(send.createdAt).toLocaleString()}</td>
              <td className="px-3 py-2">{send.toAddress}</td>
              <td className="px-3 py-2">{send.sentByName ?? '—'}</td>
              <td className="px-3 py-2">
                <Badge tone={TONES[send.status]}>{STATUS_TEXT[send.status] ?? send.status}</Badge>
              </td>
              <td className="px-3 py-2">{send.attempts}</td>
              <td className="px-3 py-2 text-missed-700">{send.lastError ?? ''}</td>
            </tr>
          ))}
          {data && data.items.length === 0 && (
            <tr>
              <td colSpan={6} className="px-3 py-2 text-slate-500">
                Not sent yet.
              </td>
            </tr>
          )}
        </tbody>
      </table>
    </section>
  );
}
