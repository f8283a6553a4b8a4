'use client';

import { useTranslations } from 'next-intl';
import { useRouter } from 'next/navigation';
import { useCloseEditSection } from '@/components/desk/edit-section';
import { Button } from '@/components/ui/button';
import { cn } from '@/lib/ui/cn';

/** What a form says after a save: a failure (a plain string, or ok: false) is an alert, a success a status. */
export type FormMessage = string | { ok: boolean; text: string } | undefined;

/**
 * The foot of every desk form: the message of the last save, the submit button (its pending label while the
 * request runs, the catalogue's "Saving…" unless told) and, with `cancel`, a Cancel button that closes the EditSection around the
 * form, or goes back on a page of its own. `className` places both in the form's grid (two columns unless told).
 */
export function FormActions({
  form,
  message,
  submitLabel,
  pendingLabel,
  cancel,
  cancelLabel,
  className = 'md:col-span-2',
}: {
  form: { formState: { isSubmitting: boolean } };
  message?: FormMessage;
  submitLabel: string;
  /** What the submit button says while the request runs; null: it keeps its label. */
  pendingLabel?: string | null;
  cancel?: boolean;
  cancelLabel?: string;
  className?: string;
}) {
  const t = useTranslations('common');
  const submitting = form.formState.isSubmitting;
  const pending = pendingLabel === undefined ? t('saving') : pendingLabel;
  const router = useRouter();
  const closeEdit = useCloseEditSection();
  const { ok, text } = typeof message === 'string' ? { ok: false, text: message } : (message ?? { ok: false });
  return (
    <>
      {text && (
        <p
          role={ok ? 'status' : 'alert'}
          className={cn('text-sm font-medium', className, ok ? 'text-safe-700' : 'text-missed-700')}
        >
          {text}
        </p>
      )}
      <div className={cn('flex gap-2', className)}>
        <Button type="submit" disabled={submitting}>
          {submitting && pending ? pending : submitLabel}
        </Button>
        {cancel && (
          <Button type="button" variant="secondary" onClick={() => (closeEdit ? closeEdit() : router.back())}>
            {cancelLabel ?? t('cancel')}
          </Button>
        )}
      </div>
    </>
  );
}
