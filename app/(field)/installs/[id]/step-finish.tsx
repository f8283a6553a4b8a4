'use client';

import { useTranslations } from 'next-intl';
import { useState } from 'react';
import { Callout, FieldInput, PrimaryAction, StepCard } from './field-ui';

/** Post-repair inspection: pass or fail, with notes. */
export function StepInspect({ onRecord }: { onRecord: (result: 'pass' | 'fail', notes: string) => void }) {
  const t = useTranslations('install.finish');
  const [result, setResult] = useState<'pass' | 'fail' | null>(null);
  const [notes, setNotes] = useState('');
  return (
    <StepCard title={t('inspectTitle')} testId="step-inspect">
      <p className="text-lg text-slate-700">{t('inspectHint')}</p>
      <div className="grid grid-cols-2 gap-3" role="radiogroup" aria-label={t('result')}>
        {(['pass', 'fail'] as const).map((value) => (
          <button
            key={value}
            type="button"
            role="radio"
            aria-checked={result === value}
            onClick={() => setResult(value)}
            className={`min-h-[4rem] rounded-lg text-2xl font-bold ring-2 ${
              result === value
                ? value === 'pass'
                  ? 'bg-safe-600 text-white ' + 'ring-safe-700'
                  : 'bg-missed-600 text-white ring-missed-700'
                : 'bg-white ring-slate-300'
            }`}
          >
            {t(value)}
          </button>
        ))}
      </div>
      <label htmlFor="inspectionNotes" className="block text-lg font-semibold">
        {t('notes')}
      </label>
      <textarea
        id="inspectionNotes"
        rows={3}
        value={notes}
        onChange={(e) => setNotes(e.target.value)}
        className="w-full rounded-md border-2 border-slate-400 p-2 text-lg"
      />
      <PrimaryAction
        disabled={!result || (result === 'fail' && notes.trim().length < 3)}
        onClick={() => result && onRecord(result, notes.trim())}
      >
        {t('record')}
      </PrimaryAction>
    </StepCard>
  );
}

/** The foreman's sign-off sends the install to the office for review. */
export function StepSignOff({
  canSign,
  defaultName,
  onSign,
}: {
  canSign: boolean;
  defaultName: string;
  onSign: (name: string) => void;
}) {
  const t = useTranslations('install.finish');
  const [name, setName] = useState(defaultName);
  if (!canSign) {
    return (
      <StepCard title={t('signOffTitle')} testId="step-sign-off">
        <Callout tone="neutral">{t('foremanSigns')}</Callout>
      </StepCard>
    );
  }
  return (
    <StepCard title={t('signOffTitle')} testId="step-sign-off">
      <FieldInput id="signName" label={t('foremanName')} value={name} onChange={(e) => setName(e.target.value)} />
      <PrimaryAction disabled={name.trim().length < 2} onClick={() => onSign(name.trim())}>
        {t('signOff')}
      </PrimaryAction>
    </StepCard>
  );
}

/**
 * The end of the install. When the office sends it back, the foreman can add what was asked (notes,
 * corrections, images, a new inspection) and sign off again to resubmit it for review.
 */
export function StepDone({
  status,
  canSign = false,
  defaultName = '',
  onResubmit,
}: {
  status: string;
  canSign?: boolean;
  defaultName?: string;
  onResubmit?: (name: string) => void;
}) {
  const t = useTranslations('install.finish');
  const [name, setName] = useState(defaultName);
  if (status === 'sent_back') {
    return (
      <StepCard title={t('doneTitle')} testId="step-done">
        <Callout tone="near">{t('sentBack')}</Callout>
        {canSign && onResubmit ? (
          <>
            <p className="text-lg text-slate-700">{t('addWhatAsked')}</p>
            <FieldInput
              id="resubmitName"
              label={t('foremanName')}
              value={name}
              onChange={(e) => setName(e.target.value)}
            />
            <PrimaryAction disabled={name.trim().length < 2} onClick={() => onResubmit(name.trim())}>
              {t('resubmit')}
            </PrimaryAction>
          </>
        ) : (
          <p className="text-lg text-slate-700">{t('foremanResubmits')}</p>
        )}
      </StepCard>
    );
  }
  return (
    <StepCard title={t('doneTitle')} testId="step-done">
      <Callout tone="safe">{status === 'approved' ? t('approved') : t('signedOff')}</Callout>
    </StepCard>
  );
}
