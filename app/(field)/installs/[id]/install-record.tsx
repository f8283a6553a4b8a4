'use client';

import Link from 'next/link';
import { useLocale, useTranslations } from 'next-intl';
import { useState } from 'react';
import type { CurePlan } from '@/lib/cure';
import { formatDateTimeIn } from '@/lib/time/dates-locale';
import type { InstallState } from '@/lib/install/state';
import { formatDuration, formatPressure, formatTemperature, type UnitSystem } from '@/lib/units';
import { Callout, PrimaryAction } from './field-ui';

type ChainLink = { id: string; status: string; inspectionResult: string | null } | null;

/**
 * A signed-off install reads as a record: when each step happened (in the company's zone), what the
 * clock allowed, the inspection — and no countdown runs on. A failed or sent-back patch offers a redo.
 */
export function InstallRecord({
  state,
  plan,
  timeZone,
  unitSystem,
  chain,
  canRedo,
  redoing,
  redoError,
  onRedo,
}: {
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
  const t = useTranslations('install.record');
  const tw = useTranslations('install');
  const locale = useLocale();
  const [confirm, setConfirm] = useState(false);
  const at = (d: Date | null | undefined) => (d ? formatDateTimeIn(d, timeZone, locale) : '—');
  const rows: [string, string][] = [
    [t('mixed'), at(state.mixedAt)],
    [t('loaded'), at(state.patchLoadedAt)],
    [t('inPosition'), at(state.inPositionAt)],
    [t('inflated'), at(state.inflatedAt)],
    [t('deflated'), at(state.deflatedAt)],
    [t('inflateBy'), at(plan && state.mixedAt ? plan.inflateBy : null)],
    [t('deflateAfter'), at(plan?.deflateAfter)],
    [
      t('returnToService'),
      plan?.returnToService ? at(plan.returnToService) : plan && plan.fullCureMin === null ? t('perMakerSheet') : '—',
    ],
    [t('signedOff'), at(state.signedOffAt)],
  ];
  const held =
    state.inflatedAt && state.deflatedAt
      ? formatDuration((state.deflatedAt.getTime() - state.inflatedAt.getTime()) / 1000)
      : null;
  const c = state.conditions;
  const failed = state.inspection?.result === 'fail';
  return (
    <section className="space-y-4 rounded-xl bg-white p-5 ring-1 ring-slate-200" data-testid="install-record">
      <h2 className="text-2xl font-bold">{t('title')}</h2>
      <dl className="grid gap-x-6 gap-y-2 text-lg sm:grid-cols-2">
        {rows.map(([name, value]) => (
          <div key={name} className="flex justify-between gap-3 border-b border-slate-100 py-1">
            <dt className="text-slate-600">{name}</dt>
            <dd className="font-semibold tabular-nums">{value}</dd>
          </div>
        ))}
        {held && (
          <div className="flex justify-between gap-3 border-b border-slate-100 py-1">
            <dt className="text-slate-600">{t('held')}</dt>
            <dd className="font-semibold tabular-nums">{held}</dd>
          </div>
        )}
        {c && (
          <div className="flex justify-between gap-3 border-b border-slate-100 py-1">
            <dt className="text-slate-600">{t('temperatures')}</dt>
            <dd className="font-semibold">
              {formatTemperature(c.mixTempC, unitSystem, { locale })} /{' '}
              {c.airTempC === null ? '—' : formatTemperature(c.airTempC, unitSystem, { locale })} /{' '}
              {formatTemperature(c.pipeTempC, unitSystem, { locale })}
            </dd>
          </div>
        )}
        {state.inflatePressureKpa !== null && (
          <div className="flex justify-between gap-3 border-b border-slate-100 py-1">
            <dt className="text-slate-600">{t('pressure')}</dt>
            <dd className="font-semibold">{formatPressure(state.inflatePressureKpa, unitSystem, { locale })}</dd>
          </div>
        )}
      </dl>
      {plan?.holdSource === 'maker' && (
        <p className="text-base text-slate-700">
          {t('makerHold', { hold: formatDuration((plan.makerHoldMin ?? 0) * 60) })}
        </p>
      )}
      {state.inspection && (
        <Callout tone={failed ? 'missed' : 'safe'}>
          <p className="font-bold" data-testid="record-inspection">
            {failed
              ? t('inspectionFailed', { at: at(state.inspection.at) })
              : t('inspectionPassed', { at: at(state.inspection.at) })}
          </p>
          {state.inspection.notes && <p>{state.inspection.notes}</p>}
        </Callout>
      )}
      {chain.replaces && (
        <p className="text-base">
          {t.rich('redoes', {
            link: (chunks) => (
              <Link className="font-semibold text-brand-700 underline" href={`/installs/${chain.replaces?.id}`}>
                {chunks}
              </Link>
            ),
            why:
              chain.replaces.inspectionResult === 'fail'
                ? tw('whyFailed')
                : chain.replaces.status === 'sent_back'
                  ? tw('whySentBack')
                  : '',
          })}
        </p>
      )}
      {chain.replacedBy ? (
        <p className="text-base font-semibold" data-testid="replaced-by">
          {t.rich('redone', {
            link: (chunks) => (
              <Link className="text-brand-700 underline" href={`/installs/${chain.replacedBy?.id}`}>
                {chunks}
              </Link>
            ),
          })}
        </p>
      ) : canRedo ? (
        <div className="space-y-3">
          {confirm ? (
            <>
              <Callout tone="near">{t('redoConfirm')}</Callout>
              <PrimaryAction disabled={redoing} onClick={onRedo}>
                {redoing ? t('starting') : t('startRedo')}
              </PrimaryAction>
              <button type="button" onClick={() => setConfirm(false)} className="w-full py-3 text-lg underline">
                {t('notNow')}
              </button>
            </>
          ) : (
            <PrimaryAction variant="secondary" onClick={() => setConfirm(true)}>
              {t('redo')}
            </PrimaryAction>
          )}
          {redoError && (
            <p role="alert" className="text-base font-medium text-missed-700">
              {redoError}
            </p>
          )}
        </div>
      ) : null}
    </section>
  );
}
