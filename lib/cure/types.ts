import type { LibMessage } from '@/lib/i18n/message';
import type { UnitSystem } from '@/lib/units';

/**
 * How strongly a resin's times shorten with warmth.
 * - `doublingC`: every `doublingC` degrees warmer halves the time (the trade's rule of thumb).
 * - `activationEnergyKJ`: Arrhenius, rate ∝ exp(−Ea/RT) with Ea in kJ/mol.
 */
export type CureSensitivity = { doublingC: number } | { activationEnergyKJ: number };

/** The clock data of a resin system, as its data sheet gives them at one reference temperature. */
export interface ResinClockSpec {
  /** Temperature at which the three times below were measured, °C. */
  refTempC: number;
  /** Working time of the mixed resin at refTempC, minutes. */
  potLifeMin: number;
  /** Inflate → earliest deflate at refTempC, minutes. */
  holdMin: number;
  /** Inflate → return to service at refTempC, minutes. */
  fullCureMin: number;
  /** Lowest and highest pipe temperature the resin is rated to cure at, °C. */
  minTempC: number;
  maxTempC: number;
  sensitivity: CureSensitivity;
}

/** What a cure plan and an install record may both know past the mix: the packer's times, the prep, the margins. */
export interface CureDetails {
  inflatedAt?: Date | null;
  deflatedAt?: Date | null;
  /** Length of the dry pull of the packer to the damage, seconds; stands for the loaded pull. */
  dryRunSeconds?: number | null;
  /** Wet-out and loading time after mixing, minutes (default 0). */
  prepMinutes?: number | null;
  /** Share of the working window held back, 0–0.9 (default 0.2). */
  safetyMargin?: number | null;
  /**
   * Extra share of the hold kept inflated, 0–1 (default 0; a company setting): deflate after
   * hold × (1 + holdReserve). A record that deflated inside it gets a warning.
   */
  holdReserve?: number | null;
  /**
   * Hold time from the resin maker's sheet for this pipe temperature, minutes. Used only when the
   * pipe is outside the resin's rated range (the foreman went on after the NO-GO); then the
   * deflate-after countdown runs to it, since the resin's own times no longer apply.
   */
  makerHoldMin?: number | null;
}

export interface CurePlanInput extends CureDetails {
  mixedAt: Date;
  /** Temperature of the resin at the bucket, °C; with `airTempC` it sets the working window. */
  mixTempC: number;
  /** Air at the mixing place, °C; the warmer of this and `mixTempC` sets the working window. */
  airTempC?: number | null;
  /** Temperature inside the host pipe, °C; sets hold and full cure. */
  pipeTempC: number;
  /** Units used in the words of `reasons` (default 'metric'); the numbers returned stay SI. */
  unitSystem?: UnitSystem;
}

export interface CurePlan {
  /** Pot life corrected to the mixing temperature, minutes. */
  workingWindowMin: number;
  /** The working window less the safety margin, minutes. */
  safeWorkingWindowMin: number;
  /** The temperature that set the working window: the warmer of resin and air, °C. */
  windowTempC: number;
  /** mixedAt + workingWindowMin: the packer must be inflated by then. */
  inflateBy: Date;
  /** mixedAt + working window × (1 − safetyMargin): the time to plan against. */
  safeInflateBy: Date;
  /** Hold corrected to the pipe temperature, minutes; null when the pipe is outside the resin's rated range. */
  holdMin: number | null;
  /** Full cure corrected to the pipe temperature, minutes; null when the pipe is outside the rated range. */
  fullCureMin: number | null;
  /** The company's hold reserve used, as a fraction. */
  holdReserve: number;
  /** The hold the crew keeps: (hold or the maker's hold) × (1 + holdReserve), minutes; null when unknown. */
  keepInflatedMin: number | null;
  /** Where the hold counted down comes from: the resin's data, the maker's sheet (override), or nowhere. */
  holdSource: 'resin' | 'maker' | null;
  /** Hold from the maker's sheet, minutes, when `holdSource` is 'maker'. */
  makerHoldMin?: number;
  /** Minutes from mixing until the patch is on the packer, as counted. */
  prepMinutes: number;
  /** Preparation plus dry-run time, minutes; absent without a dry run. */
  neededMin?: number;
  /** What was counted for GO / NO-GO, in words. */
  counted: string;
  /** `counted` as a catalogue message, for a screen in the reader's language. */
  countedDetail: LibMessage;
  deflateAfter?: Date;
  returnToService?: Date;
  go: boolean;
  /** Why not, in words, with what would help; empty when go. */
  reasons: string[];
  /** `reasons` as catalogue messages, one each, for a screen in the reader's language. */
  reasonDetails: LibMessage[];
}

export type FlagKind =
  | 'late-inflate'
  | 'early-deflate'
  | 'cold-cure'
  | 'hot-cure'
  | 'no-dry-run'
  | 'slow-dry-run'
  | 'pressure-out-of-range'
  | 'expired-resin';

export type FlagSeverity = 'critical' | 'warning';

export interface QualityFlag {
  kind: FlagKind;
  severity: FlagSeverity;
  message: string;
  /** `message` as catalogue messages (its sentences, in order), for a screen in the reader's language. */
  details?: LibMessage[];
}

export interface PackerPressureRating {
  minPressureKpa: number;
  maxPressureKpa: number;
}

/**
 * A running or finished install, as far as it is known. Every field but `resin` may be
 * missing (or null, as a database row gives it); a flag is raised only from what is known.
 */
export interface InstallRecord extends CureDetails {
  resin: ResinClockSpec;
  mixedAt?: Date | null;
  mixTempC?: number | null;
  /** Air at the mixing place; the warmer of this and `mixTempC` sets the working window. */
  airTempC?: number | null;
  pipeTempC?: number | null;
  /** Pressures logged while inflated, kPa. */
  pressuresKpa?: number[] | null;
  packer?: PackerPressureRating | null;
  /** Last day the resin kit may be used: a Date or a calendar date "YYYY-MM-DD". */
  resinKitExpiresOn?: Date | string | null;
  /** The present moment, for a running install; without it no "overdue" flag is raised. */
  now?: Date | null;
  unitSystem?: UnitSystem;
}
