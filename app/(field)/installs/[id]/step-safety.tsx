'use client';

import { SAFETY_DEFERRAL, SAFETY_REMINDERS } from '@/lib/install/safety';
import { PrimaryAction, StepCard } from './field-ui';

/** Once per install, before the first step. */
export function StepSafety({ onAcknowledge }: { onAcknowledge: () => void }) {
  return (
    <StepCard title="Before you start" testId="step-safety">
      <ul className="space-y-3">
        {SAFETY_REMINDERS.map((reminder) => (
          <li key={reminder.id} className="rounded-lg bg-slate-50 p-3">
            <p className="font-bold">{reminder.title}</p>
            <p className="text-base text-slate-700">{reminder.text}</p>
          </li>
        ))}
      </ul>
      <p className="text-base text-slate-600">{SAFETY_DEFERRAL}</p>
      <PrimaryAction onClick={onAcknowledge}>Understood — start</PrimaryAction>
    </StepCard>
  );
}
