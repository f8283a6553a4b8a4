import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { deriveInstallState, orderProblem, type InstallEventInput } from '@/lib/install/state';
import { parseEventBody } from '@/lib/validation/install-events';
import { FIXED_TAPS, installTaps, splitTaps } from '../../../scripts/soak/plan.mjs';

// The soak (scripts/soak) must send only taps the server accepts, in an order its rules allow: any tap the
// server refused would stop a tablet and make the run fail for the wrong reason.
const tablet = {
  name: 'Soak Foreman 01',
  kitId: randomUUID(),
  packerId: randomUUID(),
  checklist: [{ id: 'flow' }, { id: 'packer' }],
};
const repair = { planned_patch_length_mm: 800 };

/** Walks taps through the body schema and the ordering rule as the server does, one after the other. */
function record(taps: [string, Record<string, unknown>][]) {
  const stored: InstallEventInput[] = [];
  const start = Date.now();
  taps.forEach(([type, payload], i) => {
    const parsed = parseEventBody({
      clientEventId: randomUUID(),
      type,
      deviceTime: new Date(start + i).toISOString(),
      payload,
    });
    expect(parsed.success, `${type}: ${JSON.stringify(parsed.error?.issues)}`).toBe(true);
    if (!parsed.success) return;
    const event = { ...parsed.data, id: randomUUID(), deviceTime: new Date(parsed.data.deviceTime) };
    expect(orderProblem(deriveInstallState(stored), event), `tap ${i + 1} (${type})`).toBeNull();
    stored.push(event);
  });
  return deriveInstallState(stored);
}

describe('the soak tablets’ taps', () => {
  it('take an install from safety to signed off, with the pressure readings while the bladder is up', () => {
    const taps = installTaps(tablet, repair, 37);
    expect(taps).toHaveLength(50);
    const state = record(taps);
    expect(state.step).toBe('done');
    expect(state.pressuresKpa).toHaveLength(38);
  });

  it('with no reading at all is still a whole install, and any beginning of one is valid', () => {
    expect(record(installTaps(tablet, repair, 0)).step).toBe('done');
    expect(installTaps(tablet, repair, 0)).toHaveLength(FIXED_TAPS);
    expect(record(installTaps(tablet, repair, 0).slice(0, 9)).step).toBe('inflate');
  });

  it('spread 10,000 taps over 20 tablets into installs of about 50, none shorter than a whole install', () => {
    const plans = Array.from({ length: 20 }, () => splitTaps(500, 50));
    expect(plans.flat().reduce((a, b) => a + b, 0)).toBe(10_000);
    expect(plans.flat()).toHaveLength(200);
    for (const total of [499, 503, 777]) {
      const plan = splitTaps(total, 50);
      expect(plan.reduce((a, b) => a + b, 0)).toBe(total);
      expect(Math.min(...plan)).toBeGreaterThanOrEqual(FIXED_TAPS);
    }
  });
});
