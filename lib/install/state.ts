import type { InstallEventType } from '@/lib/domain/vocabulary';
import { refusal, type Refusal } from '@/lib/i18n/refusals';
import { applyCorrection, sortEvents, toDate, type EffectiveEvent, type InstallEventInput } from './log';

// The install's step machine: what has happened (from the stored events, corrections applied)
// and what the crew should do next. Pure, so the tablet can run it on queued taps too.

export const INSTALL_STEPS = [
  'safety',
  'checks',
  'dry_run',
  'conditions',
  'mix',
  'load',
  'position',
  'inflate',
  'hold',
  'inspect',
  'sign_off',
  'done',
] as const;
export type InstallStep = (typeof INSTALL_STEPS)[number];

export type InstallConditions = {
  /** The resin at the bucket, °C. */
  mixTempC: number;
  /** Air at the mixing place, °C (not recorded by older tablets). */
  airTempC: number | null;
  /** Minutes from mixing until the patch is on the packer (not recorded by older tablets). */
  prepMinutes: number | null;
  pipeTempC: number;
  resinKitId: string;
  packerId: string;
  patchLengthMm: number;
};

export type InstallState = {
  step: InstallStep;
  safetyAcknowledged: boolean;
  checksDone: boolean;
  dryRunStartedAt: Date | null;
  dryRunSeconds: number | null;
  conditions: InstallConditions | null;
  /** `makerHoldMin`: the hold from the resin maker's sheet the foreman entered when going on outside the rated range. */
  goDecision: { go: boolean; overrideReason: string | null; makerHoldMin: number | null; at: Date } | null;
  mixedAt: Date | null;
  patchLoadedAt: Date | null;
  inPositionAt: Date | null;
  inflatedAt: Date | null;
  inflatePressureKpa: number | null;
  /** Every pressure logged while inflated, the inflate pressure first, kPa. */
  pressuresKpa: number[];
  deflatedAt: Date | null;
  inspection: { result: 'pass' | 'fail'; notes: string | null; at: Date } | null;
  signedOffAt: Date | null;
  /** Device time of the earliest event. */
  startedAt: Date | null;
  /** The original events with their corrections applied, in device-time order (no corrections). */
  log: EffectiveEvent[];
  /** Ids (server and device) of the correction events, so a correction of a correction can be named. */
  correctionIds: string[];
};

/** An event about to be recorded, as orderProblem needs it. */
export type NewEvent = {
  type: InstallEventType;
  deviceTime: Date | string;
  payload?: Record<string, unknown> | null;
  correctsEventId?: string | null;
};

export type { EffectiveEvent, InstallEventInput } from './log';

/** The state of an install from all of its events, in any order. */
export function deriveInstallState(events: readonly InstallEventInput[]): InstallState {
  const originals = new Map<string, EffectiveEvent>();
  const byDeviceId = new Map<string, string>();
  const corrections: InstallEventInput[] = [];
  for (const event of events) {
    if (event.type === 'correction') {
      corrections.push(event);
      continue;
    }
    originals.set(event.id, {
      id: event.id,
      clientEventId: event.clientEventId ?? null,
      type: event.type,
      deviceTime: toDate(event.deviceTime),
      receivedAt: event.receivedAt == null ? null : toDate(event.receivedAt),
      payload: { ...(event.payload ?? {}) },
      corrected: false,
    });
    if (event.clientEventId) byDeviceId.set(event.clientEventId, event.id);
  }
  // Corrections apply in their own order, so a later one wins over an earlier one.
  for (const correction of sortEvents(corrections)) {
    const ref = correction.correctsEventId;
    const targetId = ref == null ? undefined : originals.has(ref) ? ref : byDeviceId.get(ref);
    const target = targetId === undefined ? undefined : originals.get(targetId);
    if (target) originals.set(target.id, applyCorrection(target, correction.payload ?? {}));
  }
  const correctionIds = corrections.flatMap((c) => (c.clientEventId ? [c.id, c.clientEventId] : [c.id]));
  return foldLog([...originals.values()], correctionIds);
}

/**
 * Why this event cannot be recorded now, as a sentence for the crew; null when it can.
 * Only what cannot have happened is refused: the pre-mix steps may come in any order or not at all.
 */
export function orderProblem(
  state: InstallState,
  event: NewEvent,
  options: { reopened?: boolean } = {},
): string | null {
  return orderRefusal(state, event, options)?.text ?? null;
}

/** orderProblem's sentence in English and as a catalogue message (lib/install/refusals.ts). */
export function orderRefusal(
  state: InstallState,
  event: NewEvent,
  { reopened = false }: { reopened?: boolean } = {},
): Refusal | null {
  const at = toDate(event.deviceTime);
  // Sent back by the office (`reopened`): the crew may inspect again, add notes and corrections, and sign off
  // once more to resubmit; the clock events themselves stay as they happened.
  const afterSignOff = reopened ? ['note', 'correction', 'inspection_recorded', 'signed_off'] : ['note', 'correction'];
  if (state.signedOffAt && event.type === 'signed_off' && !reopened) return refusal('alreadySignedOff');
  if (state.signedOffAt && !afterSignOff.includes(event.type)) {
    return reopened ? refusal('sentBack') : refusal('signedOff');
  }
  switch (event.type) {
    case 'safety_acknowledged':
      return state.safetyAcknowledged ? refusal('safetyTwice') : null;
    case 'dry_run_finished':
      return state.dryRunStartedAt ? null : refusal('dryRunNotStarted');
    case 'resin_mixed':
      return state.mixedAt ? refusal('mixedTwice') : null;
    case 'patch_loaded':
      return state.mixedAt ? null : refusal('loadBeforeMix');
    case 'packer_in_position':
      return state.mixedAt ? null : refusal('positionBeforeMix');
    case 'bladder_inflated':
      if (!state.mixedAt) return refusal('inflateBeforeMix');
      if (state.inflatedAt) return refusal('inflatedTwice');
      if (at < state.mixedAt) return refusal('inflatedBeforeMixed');
      return null;
    case 'pressure_reading':
      if (!state.inflatedAt) return refusal('pressureBeforeInflate');
      if (state.deflatedAt) return refusal('pressureAfterDeflate');
      return null;
    case 'bladder_deflated':
      if (!state.inflatedAt) return refusal('deflateBeforeInflate');
      if (state.deflatedAt) return refusal('deflatedTwice');
      if (at < state.inflatedAt) return refusal('deflatedBeforeInflated');
      return null;
    case 'inspection_recorded':
      return state.deflatedAt ? null : refusal('inspectBeforeDeflate');
    case 'signed_off':
      return state.inspection ? null : refusal('signBeforeInspect');
    case 'correction':
      return correctionProblem(state, event);
    default:
      return null;
  }
}

/** The original event a correction names, by its server id or the id the device gave it. */
export function correctionTarget(state: InstallState, ref: string | null | undefined): EffectiveEvent | undefined {
  if (!ref) return undefined;
  return state.log.find((e) => e.id === ref || e.clientEventId === ref);
}

function correctionProblem(state: InstallState, event: NewEvent): Refusal | null {
  const target = correctionTarget(state, event.correctsEventId);
  if (!target) {
    return state.correctionIds.includes(event.correctsEventId ?? '')
      ? refusal('correctOriginal')
      : refusal('correctUnknown');
  }
  // A correction may not leave the clock in an order that cannot have happened.
  const fixed = applyCorrection(target, event.payload ?? {});
  const next = foldLog(
    state.log.map((e) => (e.id === target.id ? fixed : e)),
    state.correctionIds,
  );
  if (next.mixedAt && next.inflatedAt && next.inflatedAt < next.mixedAt) {
    return refusal('correctionInflatesEarly');
  }
  if (next.inflatedAt && next.deflatedAt && next.deflatedAt < next.inflatedAt) {
    return refusal('correctionDeflatesEarly');
  }
  return null;
}

function foldLog(events: EffectiveEvent[], correctionIds: string[]): InstallState {
  const log = sortEvents(events);
  const s = emptyFold();
  const pressuresKpa: number[] = [];
  for (const event of log) applyEvent(s, event, (kpa) => pressuresKpa.push(kpa));
  return { step: nextStep(s), ...s, pressuresKpa, log, correctionIds };
}

/** What the fold keeps besides the log itself and the pressure series (which a stored summary may replace). */
export type FoldCore = Omit<InstallState, 'step' | 'log' | 'correctionIds' | 'pressuresKpa'>;

export function emptyFold(): FoldCore {
  return {
    safetyAcknowledged: false,
    checksDone: false,
    dryRunStartedAt: null,
    dryRunSeconds: null,
    conditions: null,
    goDecision: null,
    mixedAt: null,
    patchLoadedAt: null,
    inPositionAt: null,
    inflatedAt: null,
    inflatePressureKpa: null,
    deflatedAt: null,
    inspection: null,
    signedOffAt: null,
    startedAt: null,
  };
}

/**
 * Folds one original event (corrections applied) into the state. Events must come in log order (device time,
 * then receive time): the whole-log fold and the stored, one-tap-at-a-time fold both go through here.
 */
export function applyEvent(
  s: FoldCore,
  event: Pick<EffectiveEvent, 'type' | 'deviceTime' | 'payload'>,
  onPressure: (kpa: number) => void,
) {
  const { type, deviceTime: at, payload: p } = event;
  s.startedAt ??= at;
  switch (type) {
    case 'safety_acknowledged':
      s.safetyAcknowledged = true;
      break;
    case 'checks_done':
      s.checksDone = true;
      break;
    case 'dry_run_started':
      s.dryRunStartedAt = at;
      break;
    case 'dry_run_finished':
      s.dryRunSeconds = num(p.seconds);
      break;
    case 'conditions_recorded':
      s.conditions = {
        mixTempC: Number(p.mixTempC),
        airTempC: num(p.airTempC),
        prepMinutes: num(p.prepMinutes),
        pipeTempC: Number(p.pipeTempC),
        resinKitId: String(p.resinKitId),
        packerId: String(p.packerId),
        patchLengthMm: Number(p.patchLengthMm),
      };
      break;
    case 'go_decision':
      s.goDecision = {
        go: p.go === true,
        overrideReason: str(p.overrideReason),
        makerHoldMin: num(p.makerHoldMin),
        at,
      };
      break;
    case 'resin_mixed':
      s.mixedAt ??= at;
      break;
    case 'patch_loaded':
      s.patchLoadedAt ??= at;
      break;
    case 'packer_in_position':
      s.inPositionAt ??= at;
      break;
    case 'bladder_inflated':
      s.inflatedAt ??= at;
      s.inflatePressureKpa ??= num(p.pressureKpa);
      pushPressure(onPressure, p.pressureKpa);
      break;
    case 'pressure_reading':
      pushPressure(onPressure, p.pressureKpa);
      break;
    case 'bladder_deflated':
      s.deflatedAt ??= at;
      break;
    case 'inspection_recorded':
      s.inspection = { result: p.result === 'fail' ? 'fail' : 'pass', notes: str(p.notes), at };
      break;
    case 'signed_off':
      s.signedOffAt ??= at;
      break;
  }
}

/** The furthest step reached after mixing decides; before mixing, the first step not yet done. */
export function nextStep(s: FoldCore): InstallStep {
  if (s.signedOffAt) return 'done';
  if (s.inspection) return 'sign_off';
  if (s.deflatedAt) return 'inspect';
  if (s.inflatedAt) return 'hold';
  if (s.inPositionAt) return 'inflate';
  if (s.patchLoadedAt) return 'position';
  if (s.mixedAt) return 'load';
  if (!s.safetyAcknowledged) return 'safety';
  if (!s.checksDone) return 'checks';
  if (s.dryRunSeconds == null) return 'dry_run';
  if (!s.conditions) return 'conditions';
  return 'mix';
}

const num = (value: unknown) => (typeof value === 'number' && Number.isFinite(value) ? value : null);
const str = (value: unknown) => (typeof value === 'string' && value.length > 0 ? value : null);

function pushPressure(push: (kpa: number) => void, value: unknown) {
  const kpa = num(value);
  if (kpa !== null) push(kpa);
}
