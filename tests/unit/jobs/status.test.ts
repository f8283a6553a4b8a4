import { describe, expect, it } from 'vitest';
import { JOB_STATUSES } from '@/lib/domain/vocabulary';
import { OFFICE_TRANSITIONS, nextJobStatus } from '@/lib/jobs/status';

const crewAndDay = { crewId: 'c', scheduledDate: '2026-12-01', changed: true };
const nothing = { crewId: null, scheduledDate: null, changed: true };

describe('nextJobStatus', () => {
  it('schedules a draft once both crew and day are set, and unschedules when either goes', () => {
    expect(nextJobStatus('draft', undefined, crewAndDay)).toEqual({ ok: true, status: 'scheduled' });
    expect(nextJobStatus('draft', undefined, { ...crewAndDay, scheduledDate: null })).toEqual({
      ok: true,
      status: 'draft',
    });
    expect(nextJobStatus('scheduled', undefined, { ...crewAndDay, crewId: null })).toEqual({
      ok: true,
      status: 'draft',
    });
  });

  it('leaves the status alone when the crew and day were not part of the edit', () => {
    expect(nextJobStatus('draft', undefined, { ...crewAndDay, changed: false })).toEqual({ ok: true, status: 'draft' });
  });

  it('never moves a started or finished job on its own', () => {
    for (const status of ['in_progress', 'awaiting_review', 'sent_back', 'approved', 'closed'] as const) {
      expect(nextJobStatus(status, undefined, nothing)).toEqual({ ok: true, status });
    }
  });

  it('allows only the listed office moves: 409 otherwise, 422 to schedule without crew and day', () => {
    for (const from of JOB_STATUSES) {
      for (const to of JOB_STATUSES) {
        if (from === to) continue;
        const decision = nextJobStatus(from, to, crewAndDay);
        expect(decision.ok).toBe(OFFICE_TRANSITIONS[from].includes(to));
      }
    }
    expect(nextJobStatus('draft', 'scheduled', nothing)).toMatchObject({ ok: false, code: 422 });
    expect(nextJobStatus('closed', 'draft', nothing)).toMatchObject({ ok: false, code: 409 });
  });
});
