import { CureInputError } from './errors';
import { addMinutes, cureMinutes, workingWindowMinutes } from './clock';
import { DEFAULT_PREP_MINUTES, DEFAULT_SAFETY_MARGIN } from './limits';
import { coldPipeText, hotPipeText, noDryRunText, slowPullText } from './reasons';
import type { CurePlan, CurePlanInput, ResinClockSpec } from './types';
import {
  requireDate,
  requireNonNegative,
  requireSafetyMargin,
  requireTemperature,
  validateEventOrder,
  validateResin,
} from './validate';

/**
 * The clock of one install: when the packer must be inflated, when it may be deflated, when
 * the line may return to service, and whether the crew should mix at all.
 *
 * go = a dry run is recorded, the pipe temperature is within the resin's range, and
 * prepMinutes + dryRunSeconds/60 ≤ workingWindowMin × (1 − safetyMargin).
 * Without a dry run the answer is no-go: the pull time is then unknown, and the dry run is
 * the only measure of it the crew has before the resin is mixed.
 */
export function planCure(resin: ResinClockSpec, input: CurePlanInput): CurePlan {
  validateResin(resin);
  if (typeof input !== 'object' || input === null) throw new CureInputError('planCure needs an input object.');
  const mixedAt = requireDate(input.mixedAt, 'Mix time');
  const mixTempC = requireTemperature(input.mixTempC, 'Mixing temperature');
  const pipeTempC = requireTemperature(input.pipeTempC, 'Pipe temperature');
  validateEventOrder(mixedAt, input.inflatedAt, input.deflatedAt);
  const dryRunSeconds = input.dryRunSeconds == null ? undefined : requireNonNegative(input.dryRunSeconds, 'Dry run time');
  const prepMinutes = input.prepMinutes == null ? DEFAULT_PREP_MINUTES : requireNonNegative(input.prepMinutes, 'Preparation time');
  const safetyMargin = input.safetyMargin == null ? DEFAULT_SAFETY_MARGIN : requireSafetyMargin(input.safetyMargin);
  const system = input.unitSystem ?? 'metric';

  const workingWindowMin = workingWindowMinutes(resin, mixTempC);
  const safeWorkingWindowMin = workingWindowMin * (1 - safetyMargin);
  const { holdMin, fullCureMin } = cureMinutes(resin, pipeTempC);

  const plan: CurePlan = {
    workingWindowMin,
    safeWorkingWindowMin,
    inflateBy: addMinutes(mixedAt, workingWindowMin),
    safeInflateBy: addMinutes(mixedAt, safeWorkingWindowMin),
    holdMin,
    fullCureMin,
    go: false,
    reasons: [],
  };
  if (input.inflatedAt != null) {
    plan.deflateAfter = addMinutes(input.inflatedAt, holdMin);
    plan.returnToService = addMinutes(input.inflatedAt, fullCureMin);
  }

  const reasons: string[] = [];
  if (pipeTempC < resin.minTempC) reasons.push(coldPipeText(resin, pipeTempC, system));
  if (pipeTempC > resin.maxTempC) reasons.push(hotPipeText(resin, pipeTempC, system));
  if (dryRunSeconds === undefined) {
    reasons.push(noDryRunText());
  } else {
    const neededMin = prepMinutes + dryRunSeconds / 60;
    plan.neededMin = neededMin;
    if (neededMin > safeWorkingWindowMin) {
      reasons.push(
        slowPullText({ dryRunSeconds, prepMinutes, neededMin, safeWindowMin: safeWorkingWindowMin, safetyMargin, mixTempC, system }),
      );
    }
  }
  plan.reasons = reasons;
  plan.go = reasons.length === 0;
  return plan;
}
