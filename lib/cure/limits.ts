// Limits and constants of the resin clock.

// Project limits, not from a standard: the clock models ambient-cure resins in buried pipes;
// a reading outside −20…60 °C is almost surely a typo or °F typed as °C.
export const MIN_TEMP_C = -20;
export const MAX_TEMP_C = 60;

// Project choice: share of the working window held back for the unexpected (a snag in the pull).
export const DEFAULT_SAFETY_MARGIN = 0.2;
// Project limit: a margin above 0.9 leaves no window at all to plan against.
export const MAX_SAFETY_MARGIN = 0.9;

// Project limit: a hold reserve above 1 (keeping the bladder up twice the hold) is surely a typo.
export const MAX_HOLD_RESERVE = 1;

// Project choice: preparation is 0 min unless the crew enters it, so nothing unknown is assumed;
// wet-out and loading time should be entered when they happen after mixing.
export const DEFAULT_PREP_MINUTES = 0;

// Common practice (no published source): working, hold and cure times roughly halve for
// every 10 °C (18 °F) warmer.
export const RULE_OF_THUMB_DOUBLING_C = 10;

// Molar gas constant, J/(mol·K): CODATA 2018, exact since the 2019 SI redefinition (R = N_A·k).
export const GAS_CONSTANT = 8.314462618;

// 0 °C = 273.15 K, exact (NIST SP 811 §4.2.1.1).
export const KELVIN_OFFSET = 273.15;

// ECMAScript Date range: ±8.64e15 ms from the epoch; past it a Date is invalid.
export const MAX_DATE_MS = 8.64e15;
