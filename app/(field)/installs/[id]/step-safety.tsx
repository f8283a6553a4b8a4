'use client';

import { useTranslations } from 'next-intl';
import { SAFETY_REMINDERS } from '@/lib/install/safety';
import { PrimaryAction, StepCard } from './field-ui';

/** Once per install, before the first step. */
export function StepSafety({ onAcknowledge }: { onAcknowledge: () => void }) {
  const t = useTranslations('install.safety');
  const ts = useTranslations('safety');
  return (
    <StepCard title={t('title')} testId="step-safety">
      <ul className="space-y-3">
        {SAFETY_REMINDERS.map((reminder) => (
          <li key={reminder.id} className="rounded-lg bg-slate-50 p-3">
            <p className="font-bold">{ts(`${reminder.id}.title`)}</p>
            <p className="text-base text-slate-700">{ts(`${reminder.id}.text`)}</p>
          </li>
        ))}
      </ul>
      <p className="text-base text-slate-600">{ts('deferral')}</p>
      <PrimaryAction onClick={onAcknowledge}>{t('acknowledge')}</PrimaryAction>
    </StepCard>
  );
}
