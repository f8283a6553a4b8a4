import { formatPressure, formatTemperature } from '@/lib/units';
import { addMinutes, cureMinutes, workingWindowMinutes } from '@/lib/cure/resin-clock';
import { CureInputError } from './errors';
import { calendarDay } from './expiry';
import { DEFAULT_PREP_MINUTES, DEFAULT_SAFETY_MARGIN } from './limits';
import { noDryRunText, slowPullText, type Said } from './reasons';
import { instant, message } from '@/lib/i18n/message';
import type { InstallRecord, QualityFlag } from './types';
import {
  requireDate,
  requireHoldReserve,
  requireNonNegative,
  requirePositive,
  requireNumber,
  requireSafetyMargin,
  requireTemperature,
  validateEventOrder,
  validatePacker,
  validateResin,
} from './validate';

function timeText(at: Date): string {
  // ISO in UTC: the flag is stored with the install; the page shows it in the company's zone.
  return at.toISOString().replace('.000Z', 'Z');
}

/**
 * The quality flags of a running or finished install, in a fixed order. Each flag is raised
 * only from fields that are known; a missing field never raises a flag except 'no-dry-run'.
 */
export function flagsFor(install: InstallRecord): QualityFlag[] {
  if (typeof install !== 'object' || install === null) throw new CureInputError('flagsFor needs an install.');
  const resin = validateResin(install.resin);
  const { mixedAt, inflatedAt, deflatedAt } = install;
  validateEventOrder(mixedAt, inflatedAt, deflatedAt);
  const now = install.now == null ? undefined : requireDate(install.now, 'Current time');
  const mixTempC = install.mixTempC == null ? undefined : requireTemperature(install.mixTempC, 'Mixing temperature');
  const airTempC = install.airTempC == null ? undefined : requireTemperature(install.airTempC, 'Air temperature');
  // The warmer of resin and air sets the working window (as in planCure).
  const windowTempC =
    mixTempC === undefined ? undefined : airTempC === undefined ? mixTempC : Math.max(mixTempC, airTempC);
  const holdReserve = install.holdReserve == null ? 0 : requireHoldReserve(install.holdReserve);
  const makerHoldMin =
    install.makerHoldMin == null ? undefined : requirePositive(install.makerHoldMin, "Maker's hold time");
  const pipeTempC = install.pipeTempC == null ? undefined : requireTemperature(install.pipeTempC, 'Pipe temperature');
  const dryRunSeconds =
    install.dryRunSeconds == null ? undefined : requireNonNegative(install.dryRunSeconds, 'Dry run time');
  const prepMinutes =
    install.prepMinutes == null ? DEFAULT_PREP_MINUTES : requireNonNegative(install.prepMinutes, 'Preparation time');
  const safetyMargin = install.safetyMargin == null ? DEFAULT_SAFETY_MARGIN : requireSafetyMargin(install.safetyMargin);
  const packer = install.packer == null ? undefined : validatePacker(install.packer);
  const pressures = install.pressuresKpa == null ? [] : install.pressuresKpa;
  if (!Array.isArray(pressures)) throw new CureInputError('Pressures must be a list of kPa readings.');
  pressures.forEach((p, i) => requireNumber(p, `Pressure reading ${i + 1}`));
  const system = install.unitSystem ?? 'metric';

  const flags: QualityFlag[] = [];
  const workingWindowMin = windowTempC === undefined ? undefined : workingWindowMinutes(resin, windowTempC);

  // late-inflate: inflated after inflate-by, or still not inflated when inflate-by has passed.
  if (mixedAt != null && workingWindowMin !== undefined) {
    const inflateBy = addMinutes(mixedAt, workingWindowMin);
    if (inflatedAt != null && inflatedAt.getTime() > inflateBy.getTime()) {
      flags.push({
        kind: 'late-inflate',
        severity: 'critical',
        message:
          `Inflated at ${timeText(inflatedAt)}, after the inflate-by time ${timeText(inflateBy)}: the resin may have begun to set before the ` +
          `patch was pressed home.`,
        details: [message('flag.lateInflate', { at: instant(inflatedAt), by: instant(inflateBy) })],
      });
    } else if (inflatedAt == null && now !== undefined && now.getTime() > inflateBy.getTime()) {
      flags.push({
        kind: 'late-inflate',
        severity: 'critical',
        message: `Not inflated and the inflate-by time ${timeText(inflateBy)} has passed: the working window of this mix is over.`,
        details: [message('flag.notInflated', { by: instant(inflateBy) })],
      });
    }
  }

  // Outside the rated range the resin's times do not apply; only the maker's hold (override) counts.
  const pipeInRange = pipeTempC !== undefined && pipeTempC >= resin.minTempC && pipeTempC <= resin.maxTempC;
  const holdMin = pipeInRange
    ? cureMinutes(resin, pipeTempC).holdMin
    : pipeTempC !== undefined
      ? makerHoldMin
      : undefined;

  // early-deflate: the bladder came off before the hold was up (critical), or inside the
  // company's hold reserve (warning: the hold was kept, the company's extra was not).
  if (inflatedAt != null && deflatedAt != null && holdMin !== undefined) {
    const holdEnds = addMinutes(inflatedAt, holdMin);
    const reserveEnds = addMinutes(inflatedAt, holdMin * (1 + holdReserve));
    const whose = pipeInRange ? 'the hold time' : "the resin maker's hold time";
    const whoseDetail = message(pipeInRange ? 'flag.whoseResin' : 'flag.whoseMaker');
    if (deflatedAt.getTime() < holdEnds.getTime()) {
      flags.push({
        kind: 'early-deflate',
        severity: 'critical',
        message: `Deflated at ${timeText(deflatedAt)}, before ${whose} was up at ${timeText(holdEnds)}: the patch may not have held its shape.`,
        details: [
          message('flag.earlyDeflate', { at: instant(deflatedAt), whose: whoseDetail, ends: instant(holdEnds) }),
        ],
      });
    } else if (deflatedAt.getTime() < reserveEnds.getTime()) {
      flags.push({
        kind: 'early-deflate',
        severity: 'warning',
        message:
          `Deflated at ${timeText(deflatedAt)}: after ${whose} (${timeText(holdEnds)}) but inside the company's ` +
          `${Math.round(holdReserve * 100)} % hold reserve, which ran to ${timeText(reserveEnds)}.`,
        details: [
          message('flag.insideReserve', {
            at: instant(deflatedAt),
            whose: whoseDetail,
            ends: instant(holdEnds),
            pct: { percent: Math.round(holdReserve * 100) },
            reserveEnds: instant(reserveEnds),
          }),
        ],
      });
    }
  }

  // Outside the resin's rated range the published times do not apply and the cure is uncertain, whether the
  // pipe or the mix was out of range: one cold-cure / hot-cure flag says which (both when both were).
  const cold: Said[] = [];
  const hot: Said[] = [];
  const t = (c: number) => formatTemperature(c, system);
  const temps = (c: number, limit: number) => ({ temp: { temperatureC: c }, limit: { temperatureC: limit } });
  if (pipeTempC !== undefined && pipeTempC < resin.minTempC) {
    cold.push({
      text: `Cured in a pipe at ${t(pipeTempC)}, below the resin's minimum of ${t(resin.minTempC)}.`,
      detail: message('flag.coldPipe', temps(pipeTempC, resin.minTempC)),
    });
  }
  if (mixTempC !== undefined && mixTempC < resin.minTempC) {
    cold.push({
      text: `Resin mixed at ${t(mixTempC)}, below the resin's minimum of ${t(resin.minTempC)}.`,
      detail: message('flag.coldMix', temps(mixTempC, resin.minTempC)),
    });
  }
  if (pipeTempC !== undefined && pipeTempC > resin.maxTempC) {
    hot.push({
      text: `Cured in a pipe at ${t(pipeTempC)}, above the resin's maximum of ${t(resin.maxTempC)}.`,
      detail: message('flag.hotPipe', temps(pipeTempC, resin.maxTempC)),
    });
  }
  if (windowTempC !== undefined && windowTempC > resin.maxTempC) {
    hot.push({
      text: `Mixed at ${t(windowTempC)}, above the resin's maximum of ${t(resin.maxTempC)}.`,
      detail: message('flag.hotMix', temps(windowTempC, resin.maxTempC)),
    });
  }
  if (cold.length) flags.push({ kind: 'cold-cure', severity: 'critical', ...joined(cold) });
  if (hot.length) flags.push({ kind: 'hot-cure', severity: 'critical', ...joined(hot) });

  if (dryRunSeconds === undefined) {
    flags.push({ kind: 'no-dry-run', severity: 'warning', ...joined([noDryRunText()]) });
  } else if (workingWindowMin !== undefined && windowTempC !== undefined) {
    const safeWindowMin = workingWindowMin * (1 - safetyMargin);
    const neededMin = prepMinutes + dryRunSeconds / 60;
    if (neededMin > safeWindowMin) {
      const slow = slowPullText({
        dryRunSeconds,
        prepMinutes,
        neededMin,
        safeWindowMin,
        safetyMargin,
        mixTempC: windowTempC,
        system,
      });
      flags.push({ kind: 'slow-dry-run', severity: 'warning', ...joined([slow]) });
    }
  }

  // Too little pressure leaves the patch loose against the wall; too much risks the bladder and the host pipe.
  if (packer !== undefined && pressures.length > 0) {
    const outside = pressures.filter((p) => p < packer.minPressureKpa || p > packer.maxPressureKpa);
    if (outside.length > 0) {
      // reduce, not Math.min(...list): a long logger series would overflow the call stack.
      const low = pressures.reduce((a, b) => Math.min(a, b));
      const high = pressures.reduce((a, b) => Math.max(a, b));
      flags.push({
        kind: 'pressure-out-of-range',
        severity: 'critical',
        message:
          `${outside.length} of ${pressures.length} pressure readings outside the packer's rating of ` +
          `${formatPressure(packer.minPressureKpa, system)}–${formatPressure(packer.maxPressureKpa, system)} ` +
          `(readings from ${formatPressure(low, system)} to ${formatPressure(high, system)}).`,
        details: [
          message('flag.pressure', {
            count: outside.length,
            total: pressures.length,
            min: { pressureKpa: packer.minPressureKpa },
            max: { pressureKpa: packer.maxPressureKpa },
            low: { pressureKpa: low },
            high: { pressureKpa: high },
          }),
        ],
      });
    }
  }

  // The kit is judged on the day it was mixed, or today when it is not mixed yet.
  const usedOn = mixedAt ?? now;
  const expires =
    install.resinKitExpiresOn == null ? undefined : calendarDay(install.resinKitExpiresOn, 'Resin kit expiry');
  if (expires !== undefined && usedOn != null) {
    const used = calendarDay(usedOn, 'Mix date');
    if (expires < used) {
      flags.push({
        kind: 'expired-resin',
        severity: 'critical',
        message: `The resin kit expired on ${expires}, before it was ${mixedAt != null ? 'mixed' : 'to be mixed'} on ${used}.`,
        details: [
          message(mixedAt != null ? 'flag.expiredMixed' : 'flag.expiredToMix', {
            expires: { day: expires },
            used: { day: used },
          }),
        ],
      });
    }
  }

  return flags;
}

/** Sentences of one flag: the English joined by spaces, the messages in order. */
const joined = (said: Said[]) => ({ message: said.map((s) => s.text).join(' '), details: said.map((s) => s.detail) });
