import type { InstallRecord, ResinClockSpec } from '@/lib/cure';

// A typical ambient-cure point-repair epoxy, common practice (no published source): at normal
// temperature (taken here as 20 °C) the packer may be deflated after about 1 h 30 min and the
// patch reaches full cure in about 4 h; its times roughly halve for every 10 °C (18 °F) warmer.
// The 30 min pot life and the 5–40 °C range are example inputs for the tests, not claims about
// any product.
export const typicalEpoxy: ResinClockSpec = {
  refTempC: 20,
  potLifeMin: 30,
  holdMin: 90,
  fullCureMin: 240,
  minTempC: 5,
  maxTempC: 40,
  sensitivity: { doublingC: 10 },
};

export const at = (iso: string) => new Date(iso);
export const plusMin = (d: Date, min: number) => new Date(d.getTime() + min * 60_000);

const mixedAt = at('2025-06-02T08:00:00Z');

// A finished install that did everything right: at 20 °C the window is 30 min (24 min safe),
// the hold 90 min.
export const cleanInstall = {
  resin: typicalEpoxy,
  mixedAt,
  mixTempC: 20,
  pipeTempC: 20,
  inflatedAt: plusMin(mixedAt, 20),
  deflatedAt: plusMin(mixedAt, 20 + 95),
  dryRunSeconds: 8 * 60,
  prepMinutes: 6,
  pressuresKpa: [150, 160, 155],
  packer: { minPressureKpa: 100, maxPressureKpa: 200 },
  resinKitExpiresOn: '2025-12-31',
} satisfies InstallRecord;
