import { CureInputError } from './errors';
import { addMinutes, cureMinutes, workingWindowMinutes } from '@/lib/cure/resin-clock';
import { DEFAULT_PREP_MINUTES, DEFAULT_SAFETY_MARGIN } from './limits';
import {
  coldMixText,
  coldPipeText,
  countedText,
  hotMixText,
  hotPipeText,
  noClockText,
  noDryRunText,
  slowPullText,
  type Said,
} from './reasons';
import type { CurePlan, CurePlanInput, ResinClockSpec } from './types';
import {
  requireDate,
  requireHoldReserve,
  requireNonNegative,
  requirePositive,
  requireSafetyMargin,
  requireTemperature,
  validateEventOrder,
  validateResin,
} from './validate';

/**
 * The clock of one install: when the packer must be inflated, when it may be deflated, when
 * the line may return to service, and whether the crew should mix at all.
 *
 * The working window is the pot life corrected to the warmer of the resin and the air where it
 * is mixed. go = a dry run is recorded, resin and pipe are within the resin's rated range, and
 * prepMinutes + dryRunSeconds/60 ≤ workingWindowMin × (1 − safetyMargin): the window must cover
 * wet-out and loading as well as the pull. Without a dry run the answer is no-go: the pull time is
 * then unknown, and the dry run is the only measure of it the crew has before the resin is mixed.
 *
 * With the pipe outside the rated range there is no clock: hold and full cure are null and no
 * deflate-after or return to service is given, unless the maker's hold (`makerHoldMin`) is supplied.
 * deflateAfter = inflatedAt + hold × (1 + holdReserve); the hold itself is returned unchanged.
 */
export function planCure(resin: ResinClockSpec, input: CurePlanInput): CurePlan {
  validateResin(resin);
  if (typeof input !== 'object' || input === null) throw new CureInputError('planCure needs an input object.');
  const mixedAt = requireDate(input.mixedAt, 'Mix time');
  const mixTempC = requireTemperature(input.mixTempC, 'Mixing temperature');
  const airTempC = input.airTempC == null ? undefined : requireTemperature(input.airTempC, 'Air temperature');
  const pipeTempC = requireTemperature(input.pipeTempC, 'Pipe temperature');
  validateEventOrder(mixedAt, input.inflatedAt, input.deflatedAt);
  const dryRunSeconds =
    input.dryRunSeconds == null ? undefined : requireNonNegative(input.dryRunSeconds, 'Dry run time');
  const prepMinutes =
    input.prepMinutes == null ? DEFAULT_PREP_MINUTES : requireNonNegative(input.prepMinutes, 'Preparation time');
  const safetyMargin = input.safetyMargin == null ? DEFAULT_SAFETY_MARGIN : requireSafetyMargin(input.safetyMargin);
  const holdReserve = input.holdReserve == null ? 0 : requireHoldReserve(input.holdReserve);
  const makerHoldMin =
    input.makerHoldMin == null ? undefined : requirePositive(input.makerHoldMin, "Maker's hold time");
  const system = input.unitSystem ?? 'metric';

  const windowTempC = airTempC === undefined ? mixTempC : Math.max(mixTempC, airTempC);
  const workingWindowMin = workingWindowMinutes(resin, windowTempC);
  const safeWorkingWindowMin = workingWindowMin * (1 - safetyMargin);
  const pipeInRange = pipeTempC >= resin.minTempC && pipeTempC <= resin.maxTempC;
  const cure = pipeInRange ? cureMinutes(resin, pipeTempC) : null;
  const holdSource = cure ? 'resin' : makerHoldMin !== undefined ? 'maker' : null;
  const countedHold = cure ? cure.holdMin : (makerHoldMin ?? null);
  // Rounded to a microsecond of a minute: 90 × 1.1 is 99.00000000000001 in floating point, which would
  // put deflate-after a millisecond past the whole minute the crew can check by hand.
  const keepInflatedMin = countedHold === null ? null : Math.round(countedHold * (1 + holdReserve) * 1e9) / 1e9;
  const neededMin = dryRunSeconds === undefined ? undefined : prepMinutes + dryRunSeconds / 60;

  const plan: CurePlan = {
    workingWindowMin,
    safeWorkingWindowMin,
    windowTempC,
    inflateBy: addMinutes(mixedAt, workingWindowMin),
    safeInflateBy: addMinutes(mixedAt, safeWorkingWindowMin),
    holdMin: cure ? cure.holdMin : null,
    fullCureMin: cure ? cure.fullCureMin : null,
    holdReserve,
    keepInflatedMin,
    holdSource,
    ...(holdSource === 'maker' ? { makerHoldMin } : {}),
    prepMinutes,
    ...(neededMin === undefined ? {} : { neededMin }),
    ...counted(
      countedText({
        prepMinutes,
        dryRunSeconds,
        neededMin,
        workingWindowMin,
        safeWindowMin: safeWorkingWindowMin,
        safetyMargin,
        mixTempC,
        airTempC,
        system,
      }),
    ),
    go: false,
    reasons: [],
    reasonDetails: [],
  };
  if (input.inflatedAt != null) {
    if (keepInflatedMin !== null) plan.deflateAfter = addMinutes(input.inflatedAt, keepInflatedMin);
    if (cure) plan.returnToService = addMinutes(input.inflatedAt, cure.fullCureMin);
  }

  const reasons: Said[] = [];
  if (pipeTempC < resin.minTempC) reasons.push(coldPipeText(resin, pipeTempC, system));
  if (pipeTempC > resin.maxTempC) reasons.push(hotPipeText(resin, pipeTempC, system));
  if (!pipeInRange) reasons.push(noClockText());
  if (mixTempC < resin.minTempC) reasons.push(coldMixText(resin, mixTempC, system));
  if (windowTempC > resin.maxTempC) reasons.push(hotMixText(resin, windowTempC, system));
  if (dryRunSeconds === undefined || neededMin === undefined) {
    reasons.push(noDryRunText());
  } else if (neededMin > safeWorkingWindowMin) {
    reasons.push(
      slowPullText({
        dryRunSeconds,
        prepMinutes,
        neededMin,
        safeWindowMin: safeWorkingWindowMin,
        safetyMargin,
        mixTempC: windowTempC,
        system,
      }),
    );
  }
  plan.reasons = reasons.map((r) => r.text);
  plan.reasonDetails = reasons.map((r) => r.detail);
  plan.go = reasons.length === 0;
  return plan;
}

const counted = (said: Said) => ({ counted: said.text, countedDetail: said.detail });
