import { z } from 'zod';
import { INSTALL_STATUSES, REVIEW_DECISIONS } from '@/lib/domain/vocabulary';
import { listQuerySchema } from './list';

/**
 * `severity` orders by the worst flag of each install: ascending (`sort=severity`, the default) puts
 * the worst first, `sort=-severity` the clean ones first; ties go oldest-finished first.
 */
export const INSTALL_SORT_KEYS = ['severity', 'finishedAt', 'createdAt'] as const;
export type InstallSortKey = (typeof INSTALL_SORT_KEYS)[number];

export const installListQuerySchema = listQuerySchema(INSTALL_SORT_KEYS, { sort: 'severity' }).and(
  z.object({
    status: z.enum(INSTALL_STATUSES, { error: `Status is one of: ${INSTALL_STATUSES.join(', ')}` }).optional(),
  }),
);
export type InstallListQuery = z.infer<typeof installListQuerySchema>;

/** The office's decision; the form and POST /api/installs/:id/review use this same schema. */
export const reviewDecisionSchema = z
  .object({
    decision: z.enum(REVIEW_DECISIONS, { error: 'Choose approve or send back' }),
    comment: z
      .string()
      .trim()
      .max(2000, 'At most 2000 characters')
      .nullish()
      .transform((value) => value || null),
  })
  .strict()
  .superRefine((input, ctx) => {
    if (input.decision === 'sent_back' && (input.comment ?? '').length < 3) {
      ctx.addIssue({ code: 'custom', path: ['comment'], message: 'Tell the crew what to fix (a few words at least)' });
    }
  });
export type ReviewDecisionInput = z.input<typeof reviewDecisionSchema>;
export type ReviewDecision = z.output<typeof reviewDecisionSchema>;
