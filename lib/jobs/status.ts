import type { JobStatus } from '@/lib/domain/vocabulary';

/**
 * The status changes the office makes by hand. The rest of a job's life (in progress, awaiting review,
 * sent back, approved, report sent) is moved by the crew's installs, the review and the report.
 */
export const OFFICE_TRANSITIONS: Record<JobStatus, readonly JobStatus[]> = {
  draft: ['scheduled', 'cancelled'],
  scheduled: ['draft', 'cancelled'],
  in_progress: [],
  awaiting_review: [],
  sent_back: ['cancelled'],
  approved: ['closed'],
  reported: ['closed'],
  closed: [],
  cancelled: ['draft'],
};

/** Statuses in which the crew and day may still be changed (a sent-back job is redone on another day). */
export const RESCHEDULABLE: readonly JobStatus[] = ['draft', 'scheduled', 'sent_back'];

/** Statuses in which repairs may still be added or changed. */
export const REPAIRS_EDITABLE: readonly JobStatus[] = ['draft', 'scheduled', 'sent_back'];

export type StatusDecision = { ok: true; status: JobStatus } | { ok: false; code: 409 | 422; message: string };

/**
 * The status a job ends up with after an office edit. An explicit `requested` status must be a move the
 * office may make; without one, an edit of the crew or day moves a draft that now has both to scheduled,
 * and a scheduled job that lost either back to draft.
 */
export function nextJobStatus(
  current: JobStatus,
  requested: JobStatus | undefined,
  planned: { crewId: string | null; scheduledDate: string | null; changed: boolean },
): StatusDecision {
  const ready = Boolean(planned.crewId && planned.scheduledDate);
  if (requested && requested !== current) {
    if (!OFFICE_TRANSITIONS[current].includes(requested)) {
      return {
        ok: false,
        code: 409,
        message: `A job that is ${label(current)} cannot be made ${label(requested)} from here.`,
      };
    }
    if (requested === 'scheduled' && !ready) {
      return { ok: false, code: 422, message: 'Pick a crew and a day before scheduling the job.' };
    }
    return { ok: true, status: requested };
  }
  if (!planned.changed) return { ok: true, status: current };
  if (current === 'draft' && ready) return { ok: true, status: 'scheduled' };
  if (current === 'scheduled' && !ready) return { ok: true, status: 'draft' };
  return { ok: true, status: current };
}

const label = (status: JobStatus) => status.replace(/_/g, ' ');
