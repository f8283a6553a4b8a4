'use client';

import dynamic from 'next/dynamic';
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useLocale, useTranslations } from 'next-intl';
import { useEffect, useMemo, useState } from 'react';
import type { InstallViewResponse } from '@/lib/data/installs';
import { FieldHeading } from '@/components/field/field-heading';
import { useNow } from '@/components/install/countdown';
import { resinClockSpec, type CurePlan, type QualityFlag } from '@/lib/cure';
import { installClock } from '@/lib/install/plan-and-flags';
import { requestNotificationPermission, unlockAudio } from '@/lib/client/alarm';
import { submitJson } from '@/lib/client/submit-json';
import { loadOutbox } from '@/lib/client/load-outbox';
import { useWakeLock } from '@/lib/client/wake-lock';
import { labelIn } from '@/i18n/labels';
import { useLibMessage } from '@/i18n/use-lib-message';
import type { InstallState } from '@/lib/install/state';
import type { OutboxEntry } from '@/lib/client/outbox';
import { groundwaterPressureKpa } from '@/lib/sizing';
import { formatDuration, formatLength } from '@/lib/units';
import { ClockStrip, deadlinesOf } from '@/app/(field)/installs/[id]/countdown-strip';
import { EventLog } from './event-log';
import { StepChecks } from './step-checks';
import { StepHold, StepInflate, StepTap } from '@/app/(field)/installs/[id]/step-cure';
import { StepDryRun } from './step-dry-run';
import { StepDone, StepInspect, StepSignOff } from './step-finish';
import { StepGo } from './step-go';
import { StepSafety } from './step-safety';
import { SyncStatus } from './sync-status';
import { useInstall } from './use-install';

// Loaded when their step comes (the worker keeps their chunks for offline use): the conditions form
// brings a form library and schemas, the record and the evidence panel appear only at the end.
const StepConditions = dynamic(() => import('./step-conditions').then((m) => m.StepConditions));
const InstallRecord = dynamic(() => import('./install-record').then((m) => m.InstallRecord));
const EvidencePanel = dynamic(() => import('@/components/evidence/evidence-panel').then((m) => m.EvidencePanel));

type Viewer = { id: string; name: string; role: string };

/** Inspection images are taken once the bladder is down: while inspecting, before and after sign-off. */
const AFTER_DEFLATE = ['inspect', 'sign_off', 'done'];

/** The timed install at the manhole: one primary action at a time, every step an install event. */
export function InstallScreen({ initial, viewer }: { initial: InstallViewResponse; viewer: Viewer }) {
  const { view, state, local, queued, waiting, rejected, tap } = useInstall(initial.install.id, initial, viewer);
  const now = useNow(1000);
  const [skipDryRun, setSkipDryRun] = useState(false);
  const [editingConditions, setEditingConditions] = useState(false);
  const [redo, setRedo] = useState<{ busy: boolean; error: string | null }>({ busy: false, error: null });
  const router = useRouter();
  const t = useTranslations('install');
  const tl = useTranslations('labels');
  const tf = useTranslations('flags');
  const td = useTranslations('install.deadlines');
  const locale = useLocale();
  const unitSystem = view.company.unitSystem;
  const say = useLibMessage(unitSystem, view.company.timeZone);
  const { plan, flags } = useMemo(() => liveClock(view, state, now), [view, state, now]);
  const clockRunning = !!state.mixedAt && !state.deflatedAt;
  useWakeLock(clockRunning);
  // Only the signed-in user's taps are sent; anyone else's wait on the tablet for them.
  useEffect(() => {
    let stop: (() => void) | undefined;
    let alive = true;
    void loadOutbox().then(({ startOutboxSync }) => {
      if (alive) stop = startOutboxSync({ user: { id: viewer.id, name: viewer.name } });
    });
    return () => {
      alive = false;
      stop?.();
    };
  }, [viewer.id, viewer.name]);

  const kits = view.options.resinKits.map((k) => ({
    id: k.id,
    lot: k.lot,
    expiresOn: k.expiresOn,
    expired: k.expired,
    resinName: k.resinSystem.name,
    prepMinutes: k.resinSystem.prepMinutes ?? null,
  }));
  const packers = view.options.packers.map((p) => ({
    id: p.id,
    name: p.name,
    fits: p.fits,
    reasons: p.reasons,
    reasonDetails: p.reasonDetails,
  }));
  const packer = view.options.packers.find((p) => p.id === state.conditions?.packerId) ?? null;
  const rating = packer
    ? {
        minPressureKpa: packer.minPressureKpa,
        maxPressureKpa: packer.maxPressureKpa,
        groundwaterKpa: groundwaterKpaOf(view.repair.plannedGroundwaterHeadMm),
      }
    : null;
  const canDecide = viewer.role !== 'technician';
  const first = async (fn: () => Promise<void>) => {
    unlockAudio();
    void requestNotificationPermission();
    await fn();
  };

  let step: string = state.step;
  if (step === 'dry_run' && (skipDryRun || state.conditions)) step = state.conditions ? 'mix' : 'conditions';
  if (editingConditions && !state.mixedAt) step = 'conditions';

  const logged = useMemo(() => loggedEvents(view.events, local), [view.events, local]);

  return (
    <div className="space-y-4">
      <FieldHeading
        back={{ href: '/today', label: t('backToToday') }}
        title={t('heading', { position: view.repair.position, number: view.job.number })}
      >
        <p className="text-lg text-slate-700">
          {t('where', {
            address: view.job.site.addressLine,
            defect: labelIn(tl, view.repair.defectType),
            distance: formatLength(view.repair.distanceMm, unitSystem, 'long', { locale }),
            segment: view.repair.segment.label,
          })}
          {view.repair.clockPosition ? t('clockPosition', { position: view.repair.clockPosition }) : ''}
        </p>
      </FieldHeading>
      {view.chain.replaces && !state.signedOffAt && state.inspection?.result !== 'fail' && (
        <p className="rounded-lg bg-slate-100 px-4 py-2 text-lg" data-testid="redo-of">
          {t.rich('redoOf', {
            link: (chunks) => (
              <Link className="font-semibold text-brand-700 underline" href={`/installs/${view.chain.replaces?.id}`}>
                {chunks}
              </Link>
            ),
            why:
              view.chain.replaces.inspectionResult === 'fail'
                ? t('whyFailed')
                : view.chain.replaces.status === 'sent_back'
                  ? t('whySentBack')
                  : '',
          })}
        </p>
      )}
      <SyncStatus queued={queued} waiting={waiting} rejected={rejected} />
      <ClockStrip deadlines={deadlinesOf(state, plan, td)} now={now} timeZone={view.company.timeZone} />
      {flags.length > 0 && (
        <ul className="space-y-2" data-testid="flags">
          {flags.map((flag) => (
            <li
              key={flag.kind}
              data-kind={flag.kind}
              className={`rounded-lg px-4 py-2 text-lg font-semibold ${
                flag.severity === 'critical' ? 'bg-missed-100 text-missed-700' : 'bg-near-100 ' + 'text-near-700'
              }`}
            >
              {flag.details ? say(flag.details) : locale === 'en' || !tf.has(flag.kind) ? flag.message : tf(flag.kind)}
            </li>
          ))}
        </ul>
      )}
      {(state.signedOffAt || state.inspection?.result === 'fail') && (
        <InstallRecord
          state={state}
          plan={plan}
          timeZone={view.company.timeZone}
          unitSystem={unitSystem}
          chain={view.chain}
          canRedo={viewer.role === 'foreman' && mayOfferRedo(state, view.install.status)}
          redoing={redo.busy}
          redoError={redo.error}
          onRedo={() => void startRedo()}
        />
      )}
      {renderStep()}
      {AFTER_DEFLATE.includes(step) && (
        <EvidencePanel
          target={{ installId: view.install.id }}
          size="field"
          title={t('inspectionImages')}
          defaultKind="inspection"
        />
      )}
      <EventLog events={logged} timeZone={view.company.timeZone} />
    </div>
  );

  async function startRedo() {
    setRedo({ busy: true, error: null });
    let result;
    try {
      result = await submitJson<{ install: { id: string } }>(`/api/installs/${view.install.id}/redo`, 'POST', {
        id: crypto.randomUUID(),
      });
    } catch {
      return setRedo({ busy: false, error: t('redoNoSignal') });
    }
    if (!result.ok) return setRedo({ busy: false, error: result.error.message });
    router.push(`/installs/${result.data.install.id}`);
  }

  function renderStep() {
    switch (step) {
      case 'safety':
        return <StepSafety onAcknowledge={() => void first(() => tap('safety_acknowledged'))} />;
      case 'checks':
        return (
          <StepChecks
            items={view.options.checklist?.items ?? [{ id: 'ready', label: t('defaultCheck'), required: true }]}
            onDone={(items) => void tap('checks_done', { items })}
          />
        );
      case 'dry_run':
        return (
          <StepDryRun
            startedAt={state.dryRunStartedAt}
            now={now}
            onStart={() => void tap('dry_run_started')}
            onFinish={(seconds) => void tap('dry_run_finished', { seconds })}
            onSkip={() => setSkipDryRun(true)}
          />
        );
      case 'conditions':
        return (
          <StepConditions
            unitSystem={unitSystem}
            kits={kits}
            packers={packers}
            plannedPatchLengthMm={view.repair.plannedPatchLengthMm}
            initial={state.conditions}
            onSave={(conditions) => {
              setEditingConditions(false);
              void tap('conditions_recorded', conditions);
            }}
          />
        );
      case 'mix':
        if (!state.goDecision && plan) {
          return (
            <StepGo
              plan={plan}
              say={say}
              canOverride={canDecide}
              onGo={() => void tap('go_decision', { go: true })}
              onOverride={(overrideReason, makerHoldMin) =>
                void tap('go_decision', {
                  go: false,
                  overrideReason,
                  ...(makerHoldMin !== null ? { makerHoldMin } : {}),
                })
              }
              onChangeConditions={() => setEditingConditions(true)}
            />
          );
        }
        return (
          <StepTap
            testId="step-mix"
            title={t('mixTitle')}
            hint={t('mixHint')}
            label={t('clock.mixed')}
            onTap={() => void first(() => tap('resin_mixed'))}
          />
        );
      case 'load':
        return (
          <StepTap
            testId="step-load"
            title={t('loadTitle')}
            label={t('clock.loaded')}
            onTap={() => void tap('patch_loaded')}
          />
        );
      case 'position':
        return (
          <StepTap
            testId="step-position"
            title={t('positionTitle')}
            hint={t('positionHint')}
            label={t('clock.inPosition')}
            onTap={() => void tap('packer_in_position')}
          />
        );
      case 'inflate':
        return (
          <StepInflate
            unitSystem={unitSystem}
            rating={rating}
            onInflate={(pressureKpa, confirmedOutOfRange) =>
              void tap('bladder_inflated', { pressureKpa, ...(confirmedOutOfRange ? { confirmedOutOfRange } : {}) })
            }
          />
        );
      case 'hold':
        return (
          <StepHold
            unitSystem={unitSystem}
            rating={rating}
            deflateAfter={plan?.deflateAfter ?? null}
            holdNote={holdNoteOf(plan, t)}
            now={now}
            onPressure={(pressureKpa, confirmedOutOfRange) =>
              void tap('pressure_reading', { pressureKpa, ...(confirmedOutOfRange ? { confirmedOutOfRange } : {}) })
            }
            onDeflate={(early) =>
              void tap('bladder_deflated', early ? { reason: early.reason, confirmedEarly: true } : {})
            }
          />
        );
      case 'inspect':
        return (
          <StepInspect
            onRecord={(result, notes) => void tap('inspection_recorded', { result, ...(notes ? { notes } : {}) })}
          />
        );
      case 'sign_off':
        return (
          <StepSignOff
            canSign={canDecide}
            defaultName={viewer.name}
            onSign={(name) => void tap('signed_off', { name })}
          />
        );
      default:
        return (
          <StepDone
            status={view.install.status}
            canSign={canDecide}
            defaultName={viewer.name}
            onResubmit={(name) => void tap('signed_off', { name })}
          />
        );
    }
  }
}

/** What the deflate countdown counts, so the crew knows which figure it is trusting. */
function holdNoteOf(plan: CurePlan | null, t: ReturnType<typeof useTranslations<'install'>>): string {
  if (!plan || plan.keepInflatedMin === null) return t('holdUnknown');
  const reserve = plan.holdReserve > 0 ? t('holdReserve', { pct: Math.round(plan.holdReserve * 100) }) : '';
  const keep = formatDuration(plan.keepInflatedMin * 60);
  if (plan.holdSource === 'maker')
    return t('holdMaker', { hold: formatDuration((plan.makerHoldMin ?? 0) * 60), reserve, keep });
  return t('holdResin', { hold: formatDuration((plan.holdMin ?? 0) * 60), reserve, keep });
}

/** Plan and flags recomputed on the tablet by the server's own rule, so they are right offline too. */
function liveClock(
  view: InstallViewResponse,
  state: InstallState,
  now: Date,
): { plan: CurePlan | null; flags: QualityFlag[] } {
  const conditions = state.conditions;
  const kit = conditions ? view.options.resinKits.find((k) => k.id === conditions.resinKitId) : undefined;
  const packer = conditions ? view.options.packers.find((p) => p.id === conditions.packerId) : undefined;
  if (!kit) return { plan: null, flags: [] };
  // Before the resin is mixed nothing can be late yet: the no-dry-run warning waits for the mix.
  const clock = installClock({
    state,
    resin: resinClockSpec(kit.resinSystem),
    packer: packer ? { minPressureKpa: packer.minPressureKpa, maxPressureKpa: packer.maxPressureKpa } : null,
    resinKitExpiresOn: kit.expiresOn,
    safetyMargin: view.company.workingWindowSafetyMargin,
    holdReserve: view.company.holdReserve,
    timeZone: view.company.timeZone,
    unitSystem: view.company.unitSystem,
    now,
  });
  return { plan: clock.plan, flags: state.mixedAt ? clock.flags : [] };
}

// The planned groundwater head as a pressure, so a gauge reading below it can warn (lib/sizing).
const groundwaterKpaOf = (headMm: number | null | undefined) => (headMm ? groundwaterPressureKpa(headMm) : null);

/** A redo is offered after a failed inspection or a send-back (here, not in the record, which loads only when shown). */
const mayOfferRedo = (state: InstallState, status: string) =>
  state.inspection?.result === 'fail' || status === 'sent_back';

/** The server's events and this tablet's taps not yet among them, in device-time order, for the event log. */
function loggedEvents(events: InstallViewResponse['events'], local: OutboxEntry[]) {
  const synced = new Set(events.map((e) => e.clientEventId));
  return [
    ...events.map((e) => ({
      clientEventId: e.clientEventId,
      type: e.type,
      deviceTime: String(e.deviceTime),
      synced: true,
      userName: e.userName,
    })),
    ...local
      .filter((e) => !synced.has(e.clientEventId))
      .map((e) => ({
        clientEventId: e.clientEventId,
        type: e.type,
        deviceTime: e.deviceTime,
        synced: e.status === 'synced',
      })),
  ].sort((a, b) => Date.parse(a.deviceTime) - Date.parse(b.deviceTime));
}
