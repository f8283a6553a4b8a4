import type { ResinClockSpec } from './types';

/** The columns of a stored resin system that the clock needs (models/resin-system.ts). */
export type ResinSystemRow = Omit<ResinClockSpec, 'sensitivity'> & {
  sensitivityKind: 'doubling' | 'arrhenius';
  doublingC: number | null;
  activationEnergyKj: number | null;
};

/** A stored resin system as the clock's input; the trade's 10 °C doubling when the row lacks its figure. */
export function resinClockSpec(row: ResinSystemRow): ResinClockSpec {
  const sensitivity =
    row.sensitivityKind === 'arrhenius' && row.activationEnergyKj
      ? { activationEnergyKJ: Number(row.activationEnergyKj) }
      : { doublingC: Number(row.doublingC ?? 10) };
  return {
    refTempC: Number(row.refTempC),
    potLifeMin: Number(row.potLifeMin),
    holdMin: Number(row.holdMin),
    fullCureMin: Number(row.fullCureMin),
    minTempC: Number(row.minTempC),
    maxTempC: Number(row.maxTempC),
    sensitivity,
  };
}
