'use client';

import Link from 'next/link';
import { useState } from 'react';
import type { CurePlan } from '@/lib/cure';
import { formatInZone } from '@/lib/time/dates';
import type { InstallState } from '@/lib/install/state';
import { formatDuration, formatPressure, formatTemperature, type UnitSystem } from '@/lib/units';
import { Callout, PrimaryAction } from './field-ui';

type ChainLink = { id: string; status: string; inspectionResult: string | null } | null;

/**
 * A signed-off install reads as a record: when each step happened (in the company's zone), what the
 * clock allowed, the inspection — and no countdown runs on. A failed or sent-back patch offers a redo.
 */
export function InstallRecord({ state, plan, timeZone, unitSystem, chain, canRedo, redoing, redoError, onRedo }: {
  state: InstallState;
  plan: CurePlan | null;
  timeZone: string;
  unitSystem: UnitSystem;
  chain: { replaces: ChainLink; replacedBy: ChainLink };
  canRedo: boolean;
  redoing: boolean;
  redoError: string | null;
  onRedo: () => void;
}) {
  const [confirm, setConfirm] = useState(false);
  const at = (d: Date | null | undefined) => (d ? formatInZone(d, timeZone) : '—');
  const rows: [string, string][] = [
    ['Resin mixed', at(state.mixedAt)],
    ['Patch loaded', at(state.patchLoadedAt)],
    ['Packer in position', at(state.inPositionAt)],
    ['Bladder inflated', at(state.inflatedAt)],
    ['Bladder deflated', at(state.deflatedAt)],
    ['Inflate by (working time)', at(plan && state.mixedAt ? plan.inflateBy : null)],
    ['Deflate after', at(plan?.deflateAfter)],
    ['Return to service', plan?.returnToService ? at(plan.returnToService) : plan && plan.fullCureMin === null ? "per the resin maker's sheet" : '—'],
    ['Signed off', at(state.signedOffAt)],
  ];
  const held = state.inflatedAt && state.deflatedAt ? formatDuration((state.deflatedAt.getTime() - state.inflatedAt.getTime()) / 1000) : null;
  const c = state.conditions;
  const failed = state.inspection?.result === 'fail';
  return (
    <section className="space-y-4 rounded-xl bg-white p-5 ring-1 ring-slate-200" data-testid="install-record">
      <h2 className="text-2xl font-bold">Install record</h2>
      <dl className="grid gap-x-6 gap-y-2 text-lg sm:grid-cols-2">
        {rows.map(([name, value]) => (
          <div key={name} className="flex justify-between gap-3 border-b border-slate-100 py-1">
            <dt className="text-slate-600">{name}</dt>
            <dd className="font-semibold tabular-nums">{value}</dd>
          </div>
        ))}
        {held && (
          <div className="flex justify-between gap-3 border-b border-slate-100 py-1">
            <dt className="text-slate-600">Held inflated</dt>
            <dd className="font-semibold tabular-nums">{held}</dd>
          </div>
        )}
        {c && (
          <div className="flex justify-between gap-3 border-b border-slate-100 py-1">
            <dt className="text-slate-600">Resin / air / pipe</dt>
            <dd className="font-semibold">
              {formatTemperature(c.mixTempC, unitSystem)} / {c.airTempC === null ? '—' : formatTemperature(c.airTempC, unitSystem)} / {formatTemperature(c.pipeTempC, unitSystem)}
            </dd>
          </div>
        )}
        {state.inflatePressureKpa !== null && (
          <div className="flex justify-between gap-3 border-b border-slate-100 py-1">
            <dt className="text-slate-600">Inflate pressure</dt>
            <dd className="font-semibold">{formatPressure(state.inflatePressureKpa, unitSystem)}</dd>
          </div>
        )}
      </dl>
      {plan?.holdSource === 'maker' && (
        <p className="text-base text-slate-700">
          The hold counted was the resin maker&apos;s {formatDuration((plan.makerHoldMin ?? 0) * 60)}, entered by the foreman: the pipe was outside the resin&apos;s rated range.
        </p>
      )}
      {state.inspection && (
        <Callout tone={failed ? 'missed' : 'safe'}>
          <p className="font-bold" data-testid="record-inspection">Inspection: {failed ? 'failed' : 'passed'} ({at(state.inspection.at)})</p>
          {state.inspection.notes && <p>{state.inspection.notes}</p>}
        </Callout>
      )}
      {chain.replaces && (
        <p className="text-base">
          This patch redoes <Link className="font-semibold text-brand-700 underline" href={`/installs/${chain.replaces.id}`}>an earlier install</Link>
          {chain.replaces.inspectionResult === 'fail' ? ' whose inspection failed' : chain.replaces.status === 'sent_back' ? ' the office sent back' : ''}.
        </p>
      )}
      {chain.replacedBy ? (
        <p className="text-base font-semibold" data-testid="replaced-by">
          Redone: <Link className="text-brand-700 underline" href={`/installs/${chain.replacedBy.id}`}>open the new install</Link>. This record is kept.
        </p>
      ) : canRedo ? (
        <div className="space-y-3">
          {confirm ? (
            <>
              <Callout tone="near">A new install starts on the same repair, linked to this one; both are kept. Cut out or prepare the failed patch as your practice requires before the new one.</Callout>
              <PrimaryAction disabled={redoing} onClick={onRedo}>{redoing ? 'Starting…' : 'Start the redo'}</PrimaryAction>
              <button type="button" onClick={() => setConfirm(false)} className="w-full py-3 text-lg underline">Not now</button>
            </>
          ) : (
            <PrimaryAction variant="secondary" onClick={() => setConfirm(true)}>Redo this patch</PrimaryAction>
          )}
          {redoError && <p role="alert" className="text-base font-medium text-missed-700">{redoError}</p>}
        </div>
      ) : null}
    </section>
  );
}

/** A redo is offered after a failed inspection or a send-back. */
export const mayOfferRedo = (state: InstallState, status: string) => state.inspection?.result === 'fail' || status === 'sent_back';

