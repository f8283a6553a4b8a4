import type { PackerPressureRating, ResinClockSpec } from '@/lib/cure';
import type { UnitSystem } from '@/lib/units';
import { installClock } from '@/lib/install/plan-and-flags';
import { toDate, type EffectiveEvent } from './log';
import { applyEvent, emptyFold, nextStep, type FoldCore, type InstallState, type InstallStep } from './state';

// The install's state as its row keeps it between taps (column `derived_fold`, JSON): the step machine's fold
// without the log, a summary of the pressure series, where the log ends, and the resin / packer / kit data the
// flags need. A tap in log order folds its one event into it; anything else re-derives from the whole log.
// Pure, so the stored fold and `deriveInstallState` can be checked against each other.

export type PressureSummary = { count: number; min: number; max: number };

/** What the flags need of the recorded kit and packer, read once when conditions are recorded or corrected. */
export type DeriveMaterials = {
  resin: ResinClockSpec | null;
  packer: PackerPressureRating | null;
  resinKitExpiresOn: string | null;
};

export type StoredFold = {
  v: 1;
  core: Json<FoldCore>;
  pressure: PressureSummary | null;
  /** Device and receive time of the last event in log order: a tap at or after them folds in incrementally. */
  lastAt: string | null;
  lastReceivedAt: string | null;
  materials: DeriveMaterials;
  /** False when the clock could not be worked out (then no time-dependent flag is added in SQL either). */
  clockOk: boolean;
};

/** The company's settings the clock reads. */
export type DeriveSettings = { safetyMargin: number; holdReserve: number; unitSystem: UnitSystem };

/** The derived columns of `installs` (migration 20261203001000), as the tap writes them. */
export type DerivedColumns = {
  step: InstallStep;
  lastDeviceTime: Date | null;
  mixedAt: Date | null;
  inflatedAt: Date | null;
  deflatedAt: Date | null;
  inflateBy: Date | null;
  deflateAfter: Date | null;
  holdPlannedMin: number | null;
  maxPressureKpa: number | null;
  flagKinds: string[];
  worstSeverity: 'critical' | 'warning' | null;
  /** `worstSeverity` as 2 / 1 / 0 (migration 20261203017000), what the review list orders by. */
  severityRank: 0 | 1 | 2;
};

const NO_MATERIALS: DeriveMaterials = { resin: null, packer: null, resinKitExpiresOn: null };

/** The stored fold of a whole derived state (from `deriveInstallState`). */
export function foldOfState(state: InstallState, materials: DeriveMaterials = NO_MATERIALS): StoredFold {
  const { log, pressuresKpa } = state;
  const core = coreOf(state);
  const last = log.at(-1);
  return {
    v: 1,
    core: toJson(core),
    pressure: pressuresKpa.reduce<PressureSummary | null>((sum, kpa) => addPressure(sum, kpa), null),
    lastAt: last ? last.deviceTime.toISOString() : null,
    lastReceivedAt: last?.receivedAt ? last.receivedAt.toISOString() : null,
    materials,
    clockOk: true,
  };
}

/** An install with no event yet. */
export const emptyStoredFold = (): StoredFold => ({
  v: 1,
  core: toJson(emptyFold()),
  pressure: null,
  lastAt: null,
  lastReceivedAt: null,
  materials: NO_MATERIALS,
  clockOk: true,
});

/** True when `event` comes last in log order (device time, then receive time), so it can be folded in alone. */
export function foldsInOrder(fold: StoredFold, event: Pick<EffectiveEvent, 'deviceTime' | 'receivedAt'>): boolean {
  if (fold.lastAt === null) return true;
  const at = toDate(event.deviceTime).getTime();
  const lastAt = Date.parse(fold.lastAt);
  if (at !== lastAt) return at > lastAt;
  const received = event.receivedAt ? toDate(event.receivedAt).getTime() : Number.POSITIVE_INFINITY;
  return fold.lastReceivedAt === null || received >= Date.parse(fold.lastReceivedAt);
}

/** The fold with one more original event (not a correction), which must come last in log order. */
export function foldEvent(
  fold: StoredFold,
  event: Pick<EffectiveEvent, 'type' | 'deviceTime' | 'receivedAt' | 'payload'>,
): StoredFold {
  const core = fromJson(fold.core);
  let pressure = fold.pressure;
  const deviceTime = toDate(event.deviceTime);
  applyEvent(
    core,
    { type: event.type, deviceTime, payload: event.payload ?? {} },
    (kpa) => (pressure = addPressure(pressure, kpa)),
  );
  return {
    ...fold,
    core: toJson(core),
    pressure,
    lastAt: deviceTime.toISOString(),
    lastReceivedAt: event.receivedAt ? toDate(event.receivedAt).toISOString() : null,
  };
}

/**
 * The state `orderProblem` and the row's summary read, from the stored fold. Its `log` is empty and its pressure
 * series is only the lowest and highest reading: enough for every check but a correction's (which reads the log).
 */
export function stateOfFold(fold: StoredFold): InstallState {
  const core = fromJson(fold.core);
  const pressuresKpa = fold.pressure ? [fold.pressure.min, fold.pressure.max] : [];
  return { step: nextStep(core), ...core, pressuresKpa, log: [], correctionIds: [] };
}

/**
 * The derived columns of the fold, and the fold as stored beside them. Flags are those that hold whatever the
 * time (`installClock` with no present moment); the two that time passing raises are added in SQL against now()
 * (`lib/data/install-derive.ts`). The lowest and highest pressure raise the same pressure flag as the series.
 */
export function deriveRow(fold: StoredFold, settings: DeriveSettings): { columns: DerivedColumns; fold: StoredFold } {
  const state = stateOfFold(fold);
  const { materials } = fold;
  const { plan, flags, problem } = installClock({
    state,
    resin: materials.resin,
    packer: materials.packer,
    resinKitExpiresOn: materials.resinKitExpiresOn,
    safetyMargin: settings.safetyMargin,
    holdReserve: settings.holdReserve,
    unitSystem: settings.unitSystem,
    now: null,
  });
  const mixedPlan = plan && !plan.preview ? plan : null;
  const critical = flags.some((f) => f.severity === 'critical');
  const columns: DerivedColumns = {
    step: state.step,
    lastDeviceTime: fold.lastAt ? new Date(fold.lastAt) : null,
    mixedAt: state.mixedAt,
    inflatedAt: state.inflatedAt,
    deflatedAt: state.deflatedAt,
    inflateBy: mixedPlan?.inflateBy ?? null,
    deflateAfter: mixedPlan?.deflateAfter ?? null,
    holdPlannedMin: mixedPlan?.keepInflatedMin ?? null,
    maxPressureKpa: fold.pressure?.max ?? null,
    flagKinds: flags.map((f) => f.kind),
    worstSeverity: critical ? 'critical' : flags.length ? 'warning' : null,
    severityRank: critical ? 2 : flags.length ? 1 : 0,
  };
  return { columns, fold: { ...fold, clockOk: materials.resin !== null && problem === null } };
}

/** The fold's part of a state: every key of `emptyFold()`, nothing else. */
export function coreOf(state: FoldCore): FoldCore {
  const core = emptyFold();
  for (const key of Object.keys(core) as (keyof FoldCore)[]) (core as Record<string, unknown>)[key] = state[key];
  return core;
}

function addPressure(sum: PressureSummary | null, kpa: number): PressureSummary {
  if (!sum) return { count: 1, min: kpa, max: kpa };
  return { count: sum.count + 1, min: Math.min(sum.min, kpa), max: Math.max(sum.max, kpa) };
}

// Dates travel as ISO strings in the JSON column.
type Json<T> = {
  [K in keyof T]: T[K] extends Date
    ? string
    : T[K] extends Date | null
      ? string | null
      : T[K] extends object | null
        ? Json<T[K]>
        : T[K];
};

const DATE_KEYS = [
  'dryRunStartedAt',
  'mixedAt',
  'patchLoadedAt',
  'inPositionAt',
  'inflatedAt',
  'deflatedAt',
  'signedOffAt',
  'startedAt',
] as const;

function toJson(core: FoldCore): Json<FoldCore> {
  return JSON.parse(JSON.stringify(core)) as Json<FoldCore>;
}

function fromJson(json: Json<FoldCore>): FoldCore {
  const core = { ...emptyFold(), ...(json as unknown as FoldCore) };
  for (const key of DATE_KEYS) {
    const value = json[key];
    core[key] = value == null ? null : new Date(value);
  }
  if (json.goDecision) core.goDecision = { ...json.goDecision, at: new Date(json.goDecision.at) };
  if (json.inspection) core.inspection = { ...json.inspection, at: new Date(json.inspection.at) };
  if (json.conditions) core.conditions = { ...json.conditions };
  return core;
}
