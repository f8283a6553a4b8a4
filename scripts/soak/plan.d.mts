// Types of plan.mjs for the unit test that checks the soak's taps against the server's ordering rules.
export type SoakTablet = { name: string; kitId: string; packerId: string; checklist: { id: string }[] };
export function installTaps(
  tablet: SoakTablet,
  repair: { planned_patch_length_mm: number },
  readings: number,
): [string, Record<string, unknown>][];
export const FIXED_TAPS: number;
export function splitTaps(total: number, perInstall: number): number[];
