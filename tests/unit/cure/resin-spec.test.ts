import { describe, expect, it } from 'vitest';
import { resinClockSpec } from '@/lib/cure';

const row = { refTempC: 20, potLifeMin: 40, holdMin: 90, fullCureMin: 240, minTempC: 5, maxTempC: 35 };

describe('resinClockSpec', () => {
  it('maps a doubling-rule resin', () => {
    expect(
      resinClockSpec({ ...row, sensitivityKind: 'doubling', doublingC: 8, activationEnergyKj: null }).sensitivity,
    ).toEqual({ doublingC: 8 });
  });
  it('maps an Arrhenius resin', () => {
    expect(
      resinClockSpec({ ...row, sensitivityKind: 'arrhenius', doublingC: null, activationEnergyKj: 52 }).sensitivity,
    ).toEqual({ activationEnergyKJ: 52 });
  });
  it("falls back to the trade's 10 °C rule (common practice) when the figure is missing", () => {
    expect(
      resinClockSpec({ ...row, sensitivityKind: 'doubling', doublingC: null, activationEnergyKj: null }).sensitivity,
    ).toEqual({ doublingC: 10 });
  });
});
