import { bench, describe } from 'vitest';
import { designLiner } from '@/lib/design';
import { flagsFor, planCure } from '@/lib/cure';

// Demo-like inputs; the figures are for comparing versions of the code, not facts of the trade.
const resin = {
  refTempC: 20,
  potLifeMin: 40,
  holdMin: 90,
  fullCureMin: 240,
  minTempC: 5,
  maxTempC: 35,
  sensitivity: { doublingC: 10 },
};
const mixedAt = new Date('2026-12-01T15:00:00Z');
const input = {
  mixedAt,
  mixTempC: 24,
  pipeTempC: 14,
  inflatedAt: new Date('2026-12-01T15:18:00Z'),
  deflatedAt: new Date('2026-12-01T17:30:00Z'),
  dryRunSeconds: 210,
};

describe('computations', () => {
  bench('planCure', () => {
    planCure(resin, input);
  });
  bench('flagsFor (finished install)', () => {
    flagsFor({
      resin,
      ...input,
      pressuresKpa: [103, 101],
      packer: { minPressureKpa: 70, maxPressureKpa: 200 },
      resinKitExpiresOn: '2027-03-01',
    });
  });
  bench('designLiner (partial, buckling + ovality + stiffness)', () => {
    designLiner({
      condition: 'partial',
      meanDiameterIn: 8,
      ovalityPct: 2,
      longTermModulusPsi: 125_000,
      shortTermModulusPsi: 250_000,
      flexuralStrengthPsi: 4500,
      groundwaterFtAboveInvert: 10,
    });
  });
});
