'use client';

import { useState } from 'react';
import type { CurePlan } from '@/lib/cure';
import { formatDuration } from '@/lib/units';
import { Callout, FieldInput, PrimaryAction, StepCard } from './field-ui';

/**
 * The plan before mixing: GO, or NO-GO with its reasons; going on after a NO-GO needs the foreman's
 * reason, and outside the resin's rated range also the hold time from the resin maker's sheet.
 */
export function StepGo({ plan, canOverride, onGo, onOverride, onChangeConditions }: {
  plan: CurePlan;
  canOverride: boolean;
  onGo: () => void;
  onOverride: (reason: string, makerHoldMin: number | null) => void;
  onChangeConditions: () => void;
}) {
  const [reason, setReason] = useState('');
  const [makerHold, setMakerHold] = useState('');
  const needsMakerHold = plan.holdMin === null;
  const makerHoldMin = Number(makerHold.replace(',', '.'));
  const makerHoldOk = !needsMakerHold || (makerHold.trim() !== '' && Number.isFinite(makerHoldMin) && makerHoldMin > 0 && makerHoldMin <= 7 * 24 * 60);
  const reservePct = Math.round(plan.holdReserve * 100);
  return (
    <StepCard title="Plan before mixing" testId="step-go">
      <dl className="grid grid-cols-2 gap-3 text-lg">
        <div><dt className="text-slate-600">Working window</dt><dd className="font-bold">{formatDuration(plan.workingWindowMin * 60)}</dd></div>
        <div>
          <dt className="text-slate-600">Inflate within (window less the reserve)</dt>
          <dd className="font-bold">{formatDuration(plan.safeWorkingWindowMin * 60)}</dd>
        </div>
        <div data-testid="plan-hold">
          <dt className="text-slate-600">Hold before deflating</dt>
          <dd className="font-bold">
            {plan.holdMin === null ? 'No time: outside the rated range' : formatDuration(plan.holdMin * 60)}
          </dd>
          {plan.keepInflatedMin !== null && plan.holdSource === 'resin' && reservePct > 0 && (
            <dd className="text-base text-slate-700">Keep inflated {formatDuration(plan.keepInflatedMin * 60)} (hold + {reservePct} % reserve)</dd>
          )}
        </div>
        <div><dt className="text-slate-600">Full cure</dt><dd className="font-bold">{plan.fullCureMin === null ? 'No time: outside the rated range' : formatDuration(plan.fullCureMin * 60)}</dd></div>
      </dl>
      <p className="text-base text-slate-700" data-testid="plan-counted">{plan.counted}</p>
      {plan.go ? (
        <>
          <Callout tone="safe">
            <p className="text-3xl font-extrabold" data-testid="go-verdict">GO</p>
            <p>Preparation and the pull together fit inside the working window with the reserve kept.</p>
          </Callout>
          <PrimaryAction onClick={onGo}>Ready to mix</PrimaryAction>
        </>
      ) : (
        <>
          <Callout tone="missed">
            <p className="text-3xl font-extrabold" data-testid="go-verdict">NO-GO</p>
            <ul className="mt-2 list-disc space-y-1 pl-6">{plan.reasons.map((r) => <li key={r}>{r}</li>)}</ul>
          </Callout>
          <button type="button" onClick={onChangeConditions} className="w-full py-3 text-lg font-semibold text-brand-700 underline">Change conditions or materials</button>
          {canOverride ? (
            <div className="space-y-3 rounded-lg bg-slate-50 p-3">
              <label htmlFor="override" className="block text-lg font-semibold">Foreman: go on anyway because…</label>
              <textarea id="override" rows={2} value={reason} onChange={(e) => setReason(e.target.value)} className="w-full rounded-md border-2 border-slate-400 p-2 text-lg" />
              {needsMakerHold && (
                <FieldInput
                  id="makerHold"
                  label="Hold time from the resin maker's sheet for this temperature (min)"
                  hint="Setline has no hold time outside the resin's rated range: the countdown will run to this figure, and the record says so."
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
                Go on after NO-GO
              </PrimaryAction>
            </div>
          ) : (
            <p className="text-lg">Only the foreman can decide to go on after a NO-GO.</p>
          )}
        </>
      )}
    </StepCard>
  );
}
