'use client';

import { useState } from 'react';
import { Callout, FieldInput, PrimaryAction, StepCard } from './field-ui';

/** Post-repair inspection: pass or fail, with notes. */
export function StepInspect({ onRecord }: { onRecord: (result: 'pass' | 'fail', notes: string) => void }) {
  const [result, setResult] = useState<'pass' | 'fail' | null>(null);
  const [notes, setNotes] = useState('');
  return (
    <StepCard title="Inspect the patch" testId="step-inspect">
      <p className="text-lg text-slate-700">Camera the patch: tight to the wall, ends smooth, no wrinkles or lifts, laterals open.</p>
      <div className="grid grid-cols-2 gap-3" role="radiogroup" aria-label="Inspection result">
        {(['pass', 'fail'] as const).map((value) => (
          <button key={value} type="button" role="radio" aria-checked={result === value} onClick={() => setResult(value)}
            className={`min-h-[4rem] rounded-lg text-2xl font-bold ring-2 ${result === value ? (value === 'pass' ? 'bg-safe-600 text-white ring-safe-700' : 'bg-missed-600 text-white ring-missed-700') : 'bg-white ring-slate-300'}`}>
            {value === 'pass' ? 'Pass' : 'Fail'}
          </button>
        ))}
      </div>
      <label htmlFor="inspectionNotes" className="block text-lg font-semibold">Notes</label>
      <textarea id="inspectionNotes" rows={3} value={notes} onChange={(e) => setNotes(e.target.value)} className="w-full rounded-md border-2 border-slate-400 p-2 text-lg" />
      <PrimaryAction disabled={!result || (result === 'fail' && notes.trim().length < 3)} onClick={() => result && onRecord(result, notes.trim())}>Record inspection</PrimaryAction>
    </StepCard>
  );
}

/** The foreman's sign-off sends the install to the office for review. */
export function StepSignOff({ canSign, defaultName, onSign }: { canSign: boolean; defaultName: string; onSign: (name: string) => void }) {
  const [name, setName] = useState(defaultName);
  if (!canSign) {
    return (
      <StepCard title="Sign-off" testId="step-sign-off">
        <Callout tone="neutral">The foreman signs the install off. Everything you recorded is kept.</Callout>
      </StepCard>
    );
  }
  return (
    <StepCard title="Sign-off" testId="step-sign-off">
      <FieldInput id="signName" label="Foreman's name" value={name} onChange={(e) => setName(e.target.value)} />
      <PrimaryAction disabled={name.trim().length < 2} onClick={() => onSign(name.trim())}>Sign off — send for review</PrimaryAction>
    </StepCard>
  );
}

/**
 * The end of the install. When the office sends it back, the foreman can add what was asked (notes,
 * corrections, images, a new inspection) and sign off again to resubmit it for review.
 */
export function StepDone({ status, canSign = false, defaultName = '', onResubmit }: { status: string; canSign?: boolean; defaultName?: string; onResubmit?: (name: string) => void }) {
  const [name, setName] = useState(defaultName);
  if (status === 'sent_back') {
    return (
      <StepCard title="Install finished" testId="step-done">
        <Callout tone="near">Sent back by the office: their comment is on the Today screen. Everything recorded here is kept.</Callout>
        {canSign && onResubmit ? (
          <>
            <p className="text-lg text-slate-700">Add what the office asked for (a note, a correction, inspection images), then sign off again.</p>
            <FieldInput id="resubmitName" label="Foreman's name" value={name} onChange={(e) => setName(e.target.value)} />
            <PrimaryAction disabled={name.trim().length < 2} onClick={() => onResubmit(name.trim())}>Sign off again — resubmit for review</PrimaryAction>
          </>
        ) : (
          <p className="text-lg text-slate-700">The foreman resubmits it once the office&apos;s points are answered.</p>
        )}
      </StepCard>
    );
  }
  return (
    <StepCard title="Install finished" testId="step-done">
      <Callout tone="safe">{status === 'approved' ? 'Approved by the office.' : 'Signed off. The office will review it.'}</Callout>
    </StepCard>
  );
}
