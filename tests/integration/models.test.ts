import { describe, expect, it } from 'vitest';
import { Company, Packer, ResinSystem } from '@/models';
import { makeWorld } from './helpers/world';

describe('models', () => {
  it('read NUMERIC columns back as numbers, nested includes too', async () => {
    const w = await makeWorld('Delta');
    await ResinSystem.create({
      companyId: w.company.id,
      name: 'R',
      refTempC: 20.5,
      potLifeMin: 40,
      holdMin: 90,
      fullCureMin: 240,
      minTempC: 5,
      maxTempC: 35,
      doublingC: 10,
    });
    const resin = await ResinSystem.findOne({ where: { companyId: w.company.id } });
    expect(resin!.refTempC).toBe(20.5);
    expect(resin!.get({ plain: true }).doublingC).toBe(10);
    expect(resin!.activationEnergyKj).toBeNull();
    const company = await Company.findByPk(w.company.id);
    expect(company!.workingWindowSafetyMargin).toBe(0.2);
  });

  it('store timestamps as timestamptz in UTC', async () => {
    const w = await makeWorld('Epsilon');
    const packer = await Packer.create({
      companyId: w.company.id,
      name: 'P',
      minDiameterMm: 140,
      maxDiameterMm: 165,
      bladderLengthMm: 1200,
      endMarginMm: 100,
      minPressureKpa: 70,
      maxPressureKpa: 200,
    });
    const [[row]] = (await Packer.sequelize!.query(
      `SELECT pg_typeof(created_at)::text AS type FROM packers WHERE id = :id`,
      { replacements: { id: packer.id } },
    )) as [Array<{ type: string }>, unknown];
    expect(row.type).toBe('timestamp with time zone');
    expect(packer.minPressureKpa).toBe(70);
  });
});
