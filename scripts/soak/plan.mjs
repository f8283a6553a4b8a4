// What each simulated tablet sends: the clock events of an install in the order a crew taps them, with
// as many pressure readings while the bladder is up as the tablet's share of taps needs. Pure, so a unit
// test can walk it through the server's own ordering rules (lib/install/state.ts).

/** Clock events every install goes through, with `readings` pressure readings while the bladder is up. */
export function installTaps(tablet, repair, readings) {
  const items = tablet.checklist.map((item) => ({ id: item.id, ok: true }));
  const pressure = (i) => ({ pressureKpa: 100 + ((i * 7) % 11) - 5 });
  return [
    ['safety_acknowledged', {}],
    ['checks_done', { items }],
    ['dry_run_started', {}],
    ['dry_run_finished', { seconds: 180 }],
    [
      'conditions_recorded',
      {
        mixTempC: 20,
        airTempC: 19,
        prepMinutes: 8,
        pipeTempC: 16,
        resinKitId: tablet.kitId,
        packerId: tablet.packerId,
        patchLengthMm: repair.planned_patch_length_mm,
      },
    ],
    ['go_decision', { go: true }],
    ['resin_mixed', {}],
    ['patch_loaded', {}],
    ['packer_in_position', {}],
    ['bladder_inflated', pressure(0)],
    ...Array.from({ length: readings }, (_, i) => ['pressure_reading', pressure(i + 1)]),
    ['bladder_deflated', { reason: 'Soak run: the simulated crew deflates at once', confirmedEarly: true }],
    ['inspection_recorded', { result: 'pass', notes: 'Simulated inspection of the soak run.' }],
    ['signed_off', { name: tablet.name }],
  ];
}
export const FIXED_TAPS = 13;

/** How a tablet's taps are spread over its installs: about `perInstall` each, at least the fixed steps. */
export function splitTaps(total, perInstall) {
  const installs = Math.max(1, Math.round(total / perInstall));
  return Array.from({ length: installs }, (_, i) => Math.floor(total / installs) + (i < total % installs ? 1 : 0));
}
