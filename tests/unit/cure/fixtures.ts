import type { ResinClockSpec } from '@/lib/cure';

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
