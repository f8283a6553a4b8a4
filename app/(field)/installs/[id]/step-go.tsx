'use client';

import { useTranslations } from 'next-intl';
import { useState } from 'react';
import type { CurePlan } from '@/lib/cure';
import type { LibMessage } from '@/lib/i18n/message';
import { formatDuration } from '@/lib/units';
import { Callout, FieldInput, PrimaryAction, StepCard } from './field-ui';

/**
 * The plan before mixing: GO, or NO-GO with its reasons; going on after a NO-GO needs the foreman's
 * reason, and outside the resin's rated range also the hold time from the resin maker's sheet.
 */
export function StepGo({
  plan,
  say,
  canOverride,
  onGo,
  onOverride,
  onChangeConditions,
}: {
  plan: CurePlan;
  /** Writes the plan's messages in the reader's language (useLibMessage). */
  say: (message: LibMessage | readonly LibMessage[]) => string;
  canOverride: boolean;
  onGo: () => void;
  onOverride: (reason: string, makerHoldMin: number | null) => void;
  onChangeConditions: () => void;
}) {
  const t = useTranslations('install.go');
  const [reason, setReason] = useState('');
  const [makerHold, setMakerHold] = useState('');
  const needsMakerHold = plan.holdMin === null;
  const makerHoldMin = Number(makerHold.replace(',', '.'));
  const makerHoldOk =
    !needsMakerHold ||
    (makerHold.trim() !== '' && Number.isFinite(makerHoldMin) && makerHoldMin > 0 && makerHoldMin <= 7 * 24 * 60);
  const reservePct = Math.round(plan.holdReserve * 100);
  return (
    <StepCard title={t('title')} testId="step-go">
      <dl className="grid grid-cols-2 gap-3 text-lg">
        <div>
          <dt className="text-slate-600">{t('window')}</dt>
          <dd className="font-bold">{formatDuration(plan.workingWindowMin * 60)}</dd>
        </div>
        <div>
          <dt className="text-slate-600">{t('safeWindow')}</dt>
          <dd className="font-bold">{formatDuration(plan.safeWorkingWindowMin * 60)}</dd>
        </div>
        <div data-testid="plan-hold">
          <dt className="text-slate-600">{t('hold')}</dt>
          <dd className="font-bold">{plan.holdMin === null ? t('noTime') : formatDuration(plan.holdMin * 60)}</dd>
          {plan.keepInflatedMin !== null && plan.holdSource === 'resin' && reservePct > 0 && (
            <dd className="text-base text-slate-700">
              {t('keepInflated', { keep: formatDuration(plan.keepInflatedMin * 60), pct: reservePct })}
            </dd>
          )}
        </div>
        <div>
          <dt className="text-slate-600">{t('fullCure')}</dt>
          <dd className="font-bold">
            {plan.fullCureMin === null ? t('noTime') : formatDuration(plan.fullCureMin * 60)}
          </dd>
        </div>
      </dl>
      <p className="text-base text-slate-700" data-testid="plan-counted">
        {say(plan.countedDetail)}
      </p>
      {plan.go ? (
        <>
          <Callout tone="safe">
            <p className="text-3xl font-extrabold" data-testid="go-verdict">
              {t('go')}
            </p>
            <p>{t('goText')}</p>
          </Callout>
          <PrimaryAction onClick={onGo}>{t('ready')}</PrimaryAction>
        </>
      ) : (
        <>
          <Callout tone="missed">
            <p className="text-3xl font-extrabold" data-testid="go-verdict">
              {t('noGo')}
            </p>
            <ul className="mt-2 list-disc space-y-1 pl-6">
              {plan.reasonDetails.map((r) => (
                <li key={r.key}>{say(r)}</li>
              ))}
            </ul>
          </Callout>
          <button
            type="button"
            onClick={onChangeConditions}
            className="w-full py-3 text-lg font-semibold text-brand-700 underline"
          >
            {t('change')}
          </button>
          {canOverride ? (
            <div className="space-y-3 rounded-lg bg-slate-50 p-3">
              <label htmlFor="override" className="block text-lg font-semibold">
                {t('overrideLabel')}
              </label>
              <textarea
                id="override"
                rows={2}
                value={reason}
                onChange={(e) => setReason(e.target.value)}
                className="w-full rounded-md border-2 border-slate-400 p-2 text-lg"
              />
              {needsMakerHold && (
                <FieldInput
                  id="makerHold"
                  label={t('makerHold')}
                  hint={t('makerHoldHint')}
                  inputMode="decimal"
                  value={makerHold}
                  onChange={(e) => setMakerHold(e.target.value)}
                />
              )}
              <PrimaryAction
                variant="danger"
                disabled={reason.trim().length < 3 || !makerHoldOk}
                onClick={() => onOverride(reason.trim(), needsMakerHold ? makerHoldMin : null)}
              >
                {t('override')}
              </PrimaryAction>
            </div>
          ) : (
            <p className="text-lg">{t('onlyForeman')}</p>
          )}
        </>
      )}
    </StepCard>
  );
}
