import {
  CureInputError,
  flagsFor,
  planCure,
  type CurePlan,
  type PackerPressureRating,
  type QualityFlag,
  type ResinClockSpec,
} from '@/lib/cure';
import { formatInZone } from '@/lib/time/dates';
import { localiseSentence } from '@/lib/review/flags';
import type { UnitSystem } from '@/lib/units';
import type { InstallState } from '@/lib/install/state';

export type InstallClockInput = {
  state: InstallState;
  /** The resin of the recorded kit; null before conditions are recorded. */
  resin: ResinClockSpec | null;
  packer: PackerPressureRating | null;
  resinKitExpiresOn: string | null;
  safetyMargin: number;
  /** The company's hold reserve, a fraction (0 when not given). */
  holdReserve?: number;
  /** The company's IANA zone: every instant in flags and reasons is written in it (UTC ISO without it). */
  timeZone?: string;
  unitSystem: UnitSystem;
  /**
   * The present moment. Null for what holds whatever the time (the state stored on the install's row): then a
   * plan is made only from a recorded mix, and no flag that only time passing raises (overdue inflate, a kit
   * expiring before a mix that has not happened) is raised.
   */
  now: Date | null;
};

/** The plan; `preview` when the resin is not mixed yet and the clock is started at `now`. */
export type InstallPlan = CurePlan & { preview: boolean };

export type InstallClock = {
  plan: InstallPlan | null;
  flags: QualityFlag[];
  /** Why the clock could not be worked out from what is recorded; null when it could. */
  problem: string | null;
};

/**
 * The cure plan and quality flags of an install as far as it is recorded. Before mixing the plan
 * starts the clock now, so the crew sees GO/NO-GO while there is still time to choose.
 * Never throws on a half-recorded install: what cannot be computed is left out.
 */
export function installClock(input: InstallClockInput): InstallClock {
  const { state, resin, now } = input;
  if (!resin) return { plan: null, flags: [], problem: null };
  try {
    const conditions = state.conditions;
    const startsAt = state.mixedAt ?? now;
    const plan: InstallPlan | null =
      conditions && startsAt
        ? {
            ...planCure(resin, {
              mixedAt: startsAt,
              mixTempC: conditions.mixTempC,
              airTempC: conditions.airTempC,
              pipeTempC: conditions.pipeTempC,
              inflatedAt: state.mixedAt ? state.inflatedAt : null,
              deflatedAt: state.mixedAt && state.inflatedAt ? state.deflatedAt : null,
              dryRunSeconds: state.dryRunSeconds,
              prepMinutes: conditions.prepMinutes,
              safetyMargin: input.safetyMargin,
              holdReserve: input.holdReserve ?? 0,
              makerHoldMin: state.goDecision?.makerHoldMin,
              unitSystem: input.unitSystem,
            }),
            preview: state.mixedAt === null,
          }
        : null;
    const flags = flagsFor({
      resin,
      mixedAt: state.mixedAt,
      mixTempC: conditions?.mixTempC,
      airTempC: conditions?.airTempC,
      pipeTempC: conditions?.pipeTempC,
      inflatedAt: state.inflatedAt,
      deflatedAt: state.deflatedAt,
      dryRunSeconds: state.dryRunSeconds,
      prepMinutes: conditions?.prepMinutes,
      safetyMargin: input.safetyMargin,
      holdReserve: input.holdReserve ?? 0,
      makerHoldMin: state.goDecision?.makerHoldMin,
      pressuresKpa: state.pressuresKpa,
      packer: input.packer,
      resinKitExpiresOn: input.resinKitExpiresOn,
      now,
      unitSystem: input.unitSystem,
    });
    const zone = input.timeZone;
    if (!zone) return { plan, flags, problem: null };
    // Crews and the office read times in the company's zone, never as a raw UTC instant.
    const local = (text: string) => localiseSentence(text, (at) => formatInZone(at, zone));
    return {
      plan: plan && { ...plan, reasons: plan.reasons.map(local), counted: local(plan.counted) },
      flags: flags.map((flag) => ({ ...flag, message: local(flag.message) })),
      problem: null,
    };
  } catch (error) {
    if (error instanceof CureInputError) return { plan: null, flags: [], problem: error.message };
    throw error;
  }
}
