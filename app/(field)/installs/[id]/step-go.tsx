'use client';

import { useState } from 'react';
import type { CurePlan } from '@/lib/cure';
import { formatDuration } from '@/lib/units';
import { Callout, PrimaryAction, StepCard } from './field-ui';

/** The plan before mixing: GO, or NO-GO with its reasons; going on after a NO-GO needs the foreman's reason. */
export function StepGo({ plan, canOverride, onGo, onOverride, onChangeConditions }: {
  plan: CurePlan;
  canOverride: boolean;
  onGo: () => void;
  onOverride: (reason: string) => void;
  onChangeConditions: () => void;
}) {
  const [reason, setReason] = useState('');
  return (
    <StepCard title="Plan before mixing" testId="step-go">
      <dl className="grid grid-cols-2 gap-3 text-lg">
        <div><dt className="text-slate-600">Working window</dt><dd className="font-bold">{formatDuration(plan.workingWindowMin * 60)}</dd></div>
        <div><dt className="text-slate-600">Plan to inflate within</dt><dd className="font-bold">{formatDuration(plan.safeWorkingWindowMin * 60)}</dd></div>
        <div><dt className="text-slate-600">Hold before deflating</dt><dd className="font-bold">{formatDuration(plan.holdMin * 60)}</dd></div>
        <div><dt className="text-slate-600">Full cure</dt><dd className="font-bold">{formatDuration(plan.fullCureMin * 60)}</dd></div>
      </dl>
      {plan.go ? (
        <>
          <Callout tone="safe"><p className="text-3xl font-extrabold" data-testid="go-verdict">GO</p><p>The pull fits inside the working window with the reserve kept.</p></Callout>
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
              <PrimaryAction variant="danger" disabled={reason.trim().length < 3} onClick={() => onOverride(reason.trim())}>Go on after NO-GO</PrimaryAction>
            </div>
          ) : (
            <p className="text-lg">Only the foreman can decide to go on after a NO-GO.</p>
          )}
        </>
      )}
    </StepCard>
  );
}
