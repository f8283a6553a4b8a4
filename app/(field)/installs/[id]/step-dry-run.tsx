'use client';

import { useTranslations } from 'next-intl';
import { formatDuration } from '@/lib/units';
import { PrimaryAction, StepCard } from './field-ui';

/** Stopwatch for the test pull of the bare packer to the damage and back; its time feeds go/no-go. */
export function StepDryRun({
  startedAt,
  now,
  onStart,
  onFinish,
  onSkip,
}: {
  startedAt: Date | null;
  now: Date;
  onStart: () => void;
  onFinish: (seconds: number) => void;
  onSkip: () => void;
}) {
  const t = useTranslations('install.dryRun');
  const elapsed = startedAt ? Math.max(0, Math.round((now.getTime() - startedAt.getTime()) / 1000)) : 0;
  return (
    <StepCard title={t('title')} testId="step-dry-run">
      <p className="text-lg text-slate-700">{t('hint')}</p>
      <p
        className="text-center font-mono text-6xl font-bold tabular-nums"
        aria-live="off"
        data-testid="dry-run-elapsed"
      >
        {formatDuration(elapsed)}
      </p>
      {startedAt ? (
        <PrimaryAction onClick={() => onFinish(Math.max(1, elapsed))}>{t('stop')}</PrimaryAction>
      ) : (
        <>
          <PrimaryAction onClick={onStart}>{t('start')}</PrimaryAction>
          <button type="button" onClick={onSkip} className="w-full py-3 text-base text-slate-600 underline">
            {t('skip')}
          </button>
        </>
      )}
    </StepCard>
  );
}
