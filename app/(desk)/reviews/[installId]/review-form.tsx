'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { useSWRConfig } from 'swr';
import { FormField, errorProps } from '@/components/desk/form-field';
import { Textarea } from '@/components/ui/input';
import { Button } from '@/components/ui/button';
import { REVIEW_COUNT_URL } from '@/lib/review/queue';
import { applyServerErrors, submitJson } from '@/lib/client/submit-json';
import { reviewDecisionSchema, type ReviewDecision, type ReviewDecisionInput } from '@/lib/validation/reviews';

/** Approve, or send back with a comment the crew reads on their Today screen; the server checks the same schema. */
export function ReviewForm({ installId }: { installId: string }) {
  const router = useRouter();
  const { mutate } = useSWRConfig();
  const [message, setMessage] = useState<{ tone: 'ok' | 'error'; text: string }>();
  const {
    register,
    handleSubmit,
    setValue,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<ReviewDecisionInput, unknown, ReviewDecision>({
    resolver: zodResolver(reviewDecisionSchema),
    defaultValues: { decision: 'approved', comment: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    setMessage(undefined);
    const result = await submitJson(`/api/installs/${installId}/review`, 'POST', values);
    if (!result.ok) return setMessage({ tone: 'error', text: applyServerErrors(result.error, setError) });
    setMessage({ tone: 'ok', text: values.decision === 'approved' ? 'Approved.' : 'Sent back to the crew.' });
    void mutate(REVIEW_COUNT_URL);
    router.refresh();
  });
  const decide = (decision: ReviewDecision['decision']) => {
    setValue('decision', decision);
    void onSubmit();
  };

  return (
    <form onSubmit={(e) => e.preventDefault()} noValidate className="max-w-2xl space-y-3">
      <input type="hidden" {...register('decision')} />
      <FormField
        id="comment"
        label="Comment for the crew"
        hint="Required to send back; shown to the crew on their Today screen."
        error={errors.comment?.message}
      >
        <Textarea {...register('comment')} {...errorProps('comment', errors.comment?.message)} rows={3} />
      </FormField>
      <div className="flex gap-2">
        <Button type="button" disabled={isSubmitting} onClick={() => decide('approved')}>
          Approve
        </Button>
        <Button type="button" variant="danger" disabled={isSubmitting} onClick={() => decide('sent_back')}>
          Send back
        </Button>
      </div>
      <p
        role="status"
        aria-live="polite"
        className={
          message?.tone === 'error' ? 'text-sm font-medium text-missed-700' : 'text-sm font-medium text-safe-700'
        }
      >
        {message?.text}
      </p>
    </form>
  );
}
