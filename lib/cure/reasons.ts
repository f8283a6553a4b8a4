import { formatDuration, formatTemperature, type UnitSystem } from '@/lib/units';
import { minutesToText } from './resin-clock';
import type { ResinClockSpec } from './types';

// The words shown to a crew; shared by the go/no-go plan and the quality flags so the two
// never say different things about the same fact.

export function noDryRunText(): string {
  return 'No dry run recorded: pull the empty packer to the damage once and time it before mixing; a careful crew does not go without one.';
}

export function slowPullText(p: {
  dryRunSeconds: number;
  prepMinutes: number;
  neededMin: number;
  safeWindowMin: number;
  safetyMargin: number;
  mixTempC: number;
  system: UnitSystem;
}): string {
  const prep = p.prepMinutes > 0 ? ` plus ${minutesToText(p.prepMinutes)} of preparation` : '';
  return (
    `The dry run (${formatDuration(p.dryRunSeconds)})${prep} needs ${minutesToText(p.neededMin)}, ` +
    `but the safe working window at ${formatTemperature(p.mixTempC, p.system)} is only ${minutesToText(p.safeWindowMin)} ` +
    `(after the ${Math.round(p.safetyMargin * 100)} % safety margin). ` +
    'What would help: mix in a cooler place, choose a slower resin, or shorten the pull (load the packer closer to the damage).'
  );
}

export function coldPipeText(resin: ResinClockSpec, pipeTempC: number, system: UnitSystem): string {
  return (
    `The pipe at ${formatTemperature(pipeTempC, system)} is colder than this resin's minimum of ` +
    `${formatTemperature(resin.minTempC, system)}: it may not cure. Use a resin rated for the pipe temperature.`
  );
}

export function hotPipeText(resin: ResinClockSpec, pipeTempC: number, system: UnitSystem): string {
  return (
    `The pipe at ${formatTemperature(pipeTempC, system)} is warmer than this resin's maximum of ` +
    `${formatTemperature(resin.maxTempC, system)}: it may set before the patch is pressed home. Use a resin rated for the pipe temperature.`
  );
}

/** Working window's temperature, in words: "20 °C (resin 18 °C, air 20 °C)" when both were read. */
function windowTempText(p: { mixTempC: number; airTempC?: number; system: UnitSystem }): string {
  const t = (c: number) => formatTemperature(c, p.system);
  if (p.airTempC === undefined) return `the resin's ${t(p.mixTempC)}`;
  return `${t(Math.max(p.mixTempC, p.airTempC))}, the warmer of resin (${t(p.mixTempC)}) and air (${t(p.airTempC)})`;
}

/** What the GO / NO-GO counted, term by term, so the crew can check the sum. */
export function countedText(p: {
  prepMinutes: number;
  dryRunSeconds?: number;
  neededMin?: number;
  workingWindowMin: number;
  safeWindowMin: number;
  safetyMargin: number;
  mixTempC: number;
  airTempC?: number;
  system: UnitSystem;
}): string {
  const window =
    `the working window of ${minutesToText(p.workingWindowMin)} at ${windowTempText(p)}, ` +
    `less the ${Math.round(p.safetyMargin * 100)} % reserve, leaves ${minutesToText(p.safeWindowMin)}`;
  if (p.dryRunSeconds === undefined || p.neededMin === undefined) {
    return `Counted: ${minutesToText(p.prepMinutes)} from mixing to patch on the packer, no dry run yet; ${window}.`;
  }
  return (
    `Counted: ${minutesToText(p.prepMinutes)} from mixing to patch on the packer + the dry run's pull of ` +
    `${formatDuration(p.dryRunSeconds)} = ${minutesToText(p.neededMin)}; ${window}.`
  );
}

export function coldMixText(resin: ResinClockSpec, mixTempC: number, system: UnitSystem): string {
  return (
    `The resin at ${formatTemperature(mixTempC, system)} is colder than its minimum of ${formatTemperature(resin.minTempC, system)}: ` +
    'it may not mix or wet out properly. Warm the kit as its maker says before mixing.'
  );
}

export function hotMixText(resin: ResinClockSpec, tempC: number, system: UnitSystem): string {
  return (
    `Mixing at ${formatTemperature(tempC, system)} is warmer than this resin's maximum of ${formatTemperature(resin.maxTempC, system)}: ` +
    'it may set in the bucket. Mix in the shade or cool the kit, or choose a resin rated for the heat.'
  );
}

export function noClockText(): string {
  return (
    "Outside the resin's rated range its published times do not apply: Setline gives no hold or full-cure time. " +
    "Going on needs the hold time from the resin maker's sheet for this temperature."
  );
}
