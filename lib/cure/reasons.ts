import { formatDuration, formatTemperature, type UnitSystem } from '@/lib/units';
import { minutesToText } from './clock';
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
