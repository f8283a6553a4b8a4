import { formatDuration, formatTemperature, type UnitSystem } from '@/lib/units';
import { minutesToText } from '@/lib/cure/resin-clock';
import { message, type LibMessage } from '@/lib/i18n/message';
import type { ResinClockSpec } from './types';

// The words shown to a crew; shared by the go/no-go plan and the quality flags so the two
// never say different things about the same fact. Each sentence comes twice: the English text (API, desk,
// logs) and the same sentence as a catalogue key with its values (messages/*.json `lib.cure`), which a screen
// writes in the reader's language; tests/unit/i18n/lib-messages.test.ts holds the English of the two equal.

/** A sentence in English and as a message for the catalogue. */
export type Said = { text: string; detail: LibMessage };

const temp = (c: number) => ({ temperatureC: c });
const pct = (fraction: number) => ({ percent: Math.round(fraction * 100) });

export function noDryRunText(): Said {
  return {
    text: 'No dry run recorded: pull the empty packer to the damage once and time it before mixing; a careful crew does not go without one.',
    detail: message('cure.noDryRun'),
  };
}

export function slowPullText(p: {
  dryRunSeconds: number;
  prepMinutes: number;
  neededMin: number;
  safeWindowMin: number;
  safetyMargin: number;
  mixTempC: number;
  system: UnitSystem;
}): Said {
  const prep = p.prepMinutes > 0 ? ` plus ${minutesToText(p.prepMinutes)} of preparation` : '';
  const text =
    `The dry run (${formatDuration(p.dryRunSeconds)})${prep} needs ${minutesToText(p.neededMin)}, ` +
    `but the safe working window at ${formatTemperature(p.mixTempC, p.system)} is only ${minutesToText(p.safeWindowMin)} ` +
    `(after the ${Math.round(p.safetyMargin * 100)} % safety margin). ` +
    'What would help: mix in a cooler place, choose a slower resin, or shorten the pull (load the packer closer to the damage).';
  const values = {
    dryRun: { seconds: p.dryRunSeconds },
    prep: p.prepMinutes > 0 ? message('cure.plusPrep', { prep: { minutes: p.prepMinutes } }) : '',
    needed: { minutes: p.neededMin },
    temp: temp(p.mixTempC),
    safe: { minutes: p.safeWindowMin },
    pct: pct(p.safetyMargin),
  };
  return { text, detail: message('cure.slowPull', values) };
}

export function coldPipeText(resin: ResinClockSpec, pipeTempC: number, system: UnitSystem): Said {
  return {
    text:
      `The pipe at ${formatTemperature(pipeTempC, system)} is colder than this resin's minimum of ` +
      `${formatTemperature(resin.minTempC, system)}: it may not cure. Use a resin rated for the pipe temperature.`,
    detail: message('cure.coldPipe', { temp: temp(pipeTempC), limit: temp(resin.minTempC) }),
  };
}

export function hotPipeText(resin: ResinClockSpec, pipeTempC: number, system: UnitSystem): Said {
  return {
    text:
      `The pipe at ${formatTemperature(pipeTempC, system)} is warmer than this resin's maximum of ` +
      `${formatTemperature(resin.maxTempC, system)}: it may set before the patch is pressed home. Use a resin rated for the pipe temperature.`,
    detail: message('cure.hotPipe', { temp: temp(pipeTempC), limit: temp(resin.maxTempC) }),
  };
}

/** Working window's temperature, in words: "20 °C (resin 18 °C, air 20 °C)" when both were read. */
function windowTempText(p: { mixTempC: number; airTempC?: number; system: UnitSystem }): Said {
  const t = (c: number) => formatTemperature(c, p.system);
  if (p.airTempC === undefined) {
    return { text: `the resin's ${t(p.mixTempC)}`, detail: message('cure.windowResin', { resin: temp(p.mixTempC) }) };
  }
  const warmer = Math.max(p.mixTempC, p.airTempC);
  return {
    text: `${t(warmer)}, the warmer of resin (${t(p.mixTempC)}) and air (${t(p.airTempC)})`,
    detail: message('cure.windowWarmer', { warmer: temp(warmer), resin: temp(p.mixTempC), air: temp(p.airTempC) }),
  };
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
}): Said {
  const at = windowTempText(p);
  const window: Said = {
    text:
      `the working window of ${minutesToText(p.workingWindowMin)} at ${at.text}, ` +
      `less the ${Math.round(p.safetyMargin * 100)} % reserve, leaves ${minutesToText(p.safeWindowMin)}`,
    detail: message('cure.window', {
      window: { minutes: p.workingWindowMin },
      at: at.detail,
      pct: pct(p.safetyMargin),
      safe: { minutes: p.safeWindowMin },
    }),
  };
  const prep = { minutes: p.prepMinutes };
  if (p.dryRunSeconds === undefined || p.neededMin === undefined) {
    return {
      text: `Counted: ${minutesToText(p.prepMinutes)} from mixing to patch on the packer, no dry run yet; ${window.text}.`,
      detail: message('cure.countedNoDryRun', { prep, window: window.detail }),
    };
  }
  return {
    text:
      `Counted: ${minutesToText(p.prepMinutes)} from mixing to patch on the packer + the dry run's pull of ` +
      `${formatDuration(p.dryRunSeconds)} = ${minutesToText(p.neededMin)}; ${window.text}.`,
    detail: message('cure.counted', {
      prep,
      dryRun: { seconds: p.dryRunSeconds },
      needed: { minutes: p.neededMin },
      window: window.detail,
    }),
  };
}

export function coldMixText(resin: ResinClockSpec, mixTempC: number, system: UnitSystem): Said {
  return {
    text:
      `The resin at ${formatTemperature(mixTempC, system)} is colder than its minimum of ${formatTemperature(resin.minTempC, system)}: ` +
      'it may not mix or wet out properly. Warm the kit as its maker says before mixing.',
    detail: message('cure.coldMix', { temp: temp(mixTempC), limit: temp(resin.minTempC) }),
  };
}

export function hotMixText(resin: ResinClockSpec, tempC: number, system: UnitSystem): Said {
  return {
    text:
      `Mixing at ${formatTemperature(tempC, system)} is warmer than this resin's maximum of ${formatTemperature(resin.maxTempC, system)}: ` +
      'it may set in the bucket. Mix in the shade or cool the kit, or choose a resin rated for the heat.',
    detail: message('cure.hotMix', { temp: temp(tempC), limit: temp(resin.maxTempC) }),
  };
}

export function noClockText(): Said {
  return {
    text:
      "Outside the resin's rated range its published times do not apply: Setline gives no hold or full-cure time. " +
      "Going on needs the hold time from the resin maker's sheet for this temperature.",
    detail: message('cure.noClock'),
  };
}
