import type { InstallEventType } from '@/lib/domain/vocabulary';
import type { InstallEventInput } from '@/lib/install/state';

// A small builder of install event logs for the step-machine tests: times are minutes after 08:00 UTC.
export const T0 = Date.parse('2026-12-01T08:00:00Z');
export const at = (min: number) => new Date(T0 + min * 60_000);

let seq = 0;
export function ev(
  type: InstallEventType,
  min: number,
  payload: Record<string, unknown> = {},
  extra: Partial<InstallEventInput> = {},
): InstallEventInput {
  seq += 1;
  return {
    id: `e${seq}`,
    clientEventId: `c${seq}`,
    type,
    deviceTime: at(min),
    receivedAt: at(min + 0.05),
    payload,
    ...extra,
  };
}

export const conditions = {
  mixTempC: 20,
  pipeTempC: 20,
  resinKitId: 'kit-1',
  packerId: 'packer-1',
  patchLengthMm: 910,
};

/** A whole clean install, in order. */
export function cleanLog(): InstallEventInput[] {
  return [
    ev('safety_acknowledged', 0),
    ev('checks_done', 4, { items: [{ id: 'flow', ok: true }] }),
    ev('dry_run_started', 8),
    ev('dry_run_finished', 11, { seconds: 180 }),
    ev('conditions_recorded', 13, conditions),
    ev('go_decision', 14, { go: true }),
    ev('resin_mixed', 16),
    ev('patch_loaded', 22),
    ev('packer_in_position', 27),
    ev('bladder_inflated', 32, { pressureKpa: 100 }),
    ev('pressure_reading', 60, { pressureKpa: 98 }),
    ev('bladder_deflated', 32 + 100, {}),
    ev('inspection_recorded', 145, { result: 'pass', notes: 'Tight to the wall' }),
    ev('signed_off', 150, { name: 'A Foreman' }),
  ];
}
