import { describe, expect, it } from 'vitest';
import { packerFormSchema, packerToForm } from '@/lib/validation/packers';
import { resinKitFormSchema, resinKitToForm } from '@/lib/validation/resin-kits';
import { resinSystemFormSchema, resinSystemToForm } from '@/lib/validation/resin-systems';

// Check values: NIST SP 811 (2008) §4.2.1.1 and App. B — t/°C = (t/°F − 32)/1.8 (an interval: ΔF/1.8, exact);
// 1 psi = 6.894 757 kPa; 1 US gal = 3.785 411 784 L (exact); 1 in = 25.4 mm (exact).
const resinImperial = {
  name: 'Example epoxy',
  chemistry: 'epoxy',
  refTempC: 68,
  potLifeMin: 30,
  holdMin: 90,
  fullCureMin: 240,
  minTempC: 41,
  maxTempC: 104,
  sensitivityKind: 'doubling',
  doublingC: 18,
  activationEnergyKj: Number.NaN,
};

describe('resin system form in company units', () => {
  it('converts °F temperatures with the offset and the °F doubling step without it', () => {
    const parsed = resinSystemFormSchema('imperial').parse(resinImperial);
    expect(parsed).toMatchObject({ refTempC: 20, minTempC: 5, maxTempC: 40, doublingC: 10, activationEnergyKj: null });
    // 55 °F = 12.777… °C, kept to the column's two decimals.
    expect(resinSystemFormSchema('imperial').parse({ ...resinImperial, refTempC: 55 }).refTempC).toBe(12.78);
  });

  it('passes metric values through', () => {
    const parsed = resinSystemFormSchema('metric').parse({
      ...resinImperial,
      refTempC: 20,
      minTempC: 5,
      maxTempC: 40,
      doublingC: 10,
    });
    expect(parsed).toMatchObject({ refTempC: 20, minTempC: 5, maxTempC: 40, doublingC: 10 });
  });

  it('reports the server’s rules on the form’s fields, and an empty box as "Enter a number"', () => {
    const result = resinSystemFormSchema('imperial').safeParse({
      ...resinImperial,
      refTempC: Number.NaN,
      maxTempC: 32,
    });
    expect(result.success).toBe(false);
    const fields = Object.fromEntries(result.error!.issues.map((issue) => [issue.path.join('.'), issue.message]));
    expect(fields.refTempC).toBe('Enter a number');
    // 200 °F is 93 °C: outside the clock's range.
    const hot = resinSystemFormSchema('imperial').safeParse({ ...resinImperial, maxTempC: 200 });
    expect(hot.error!.issues.map((issue) => issue.path.join('.'))).toContain('maxTempC');
  });

  it('names its bounds in the company’s units only: °F for imperial, °C for metric', () => {
    const messages = (system: 'imperial' | 'metric', values: object) => {
      const result = resinSystemFormSchema(system).safeParse({ ...resinImperial, ...values });
      return result.success ? '' : result.error.issues.map((issue) => issue.message).join(' | ');
    };
    // −20…60 °C is −4…140 °F; a doubling step of 1…50 °C is 1.8…90 °F (NIST SP 811, intervals without the offset).
    const imperial = messages('imperial', { maxTempC: 200, doublingC: 100 });
    expect(imperial).toContain('140 °F');
    expect(imperial).toContain('90 °F');
    expect(imperial).not.toContain('°C');
    const metric = messages('metric', { refTempC: 20, minTempC: 5, maxTempC: 90, doublingC: 60 });
    expect(metric).toContain('60 °C');
    expect(metric).not.toContain('°F');
  });

  it('shows stored °C back in °F, the step as a difference', () => {
    const shown = resinSystemToForm(
      {
        name: 'x',
        chemistry: 'epoxy',
        refTempC: 20,
        potLifeMin: 30,
        holdMin: 90,
        fullCureMin: 240,
        minTempC: 5,
        maxTempC: 40,
        sensitivityKind: 'doubling',
        doublingC: 10,
        activationEnergyKj: null,
      },
      'imperial',
    );
    expect(shown).toMatchObject({ refTempC: 68, minTempC: 41, maxTempC: 104, doublingC: 18 });
  });
});

describe('packer form in company units', () => {
  const imperial = {
    name: 'P',
    serial: '',
    minDiameterMm: 6,
    maxDiameterMm: 8,
    bladderLengthMm: 48,
    endMarginMm: 4,
    minPressureKpa: 10,
    maxPressureKpa: 30,
  };

  it('converts inches to whole mm and psi to tenths of a kPa', () => {
    const parsed = packerFormSchema('imperial').parse(imperial);
    // 6 in = 152.4 mm, 8 in = 203.2 mm, 48 in = 1219.2 mm, 4 in = 101.6 mm; 10 psi = 68.94757 kPa, 30 psi = 206.84271 kPa.
    expect(parsed).toMatchObject({
      minDiameterMm: 152,
      maxDiameterMm: 203,
      bladderLengthMm: 1219,
      endMarginMm: 102,
      minPressureKpa: 68.9,
      maxPressureKpa: 206.8,
    });
  });

  it('shows stored SI back in inches and psi', () => {
    const shown = packerToForm(
      {
        name: 'P',
        serial: null,
        minDiameterMm: 152.4,
        maxDiameterMm: 254,
        bladderLengthMm: 1000,
        endMarginMm: 100,
        minPressureKpa: 68.94757,
        maxPressureKpa: 100,
      },
      'imperial',
    );
    expect(shown).toMatchObject({ minDiameterMm: 6, maxDiameterMm: 10, minPressureKpa: 10, maxPressureKpa: 14.5 });
  });

  it('names a crossed range on the field the server would', () => {
    const result = packerFormSchema('metric').safeParse({
      ...imperial,
      minDiameterMm: 200,
      maxDiameterMm: 150,
      bladderLengthMm: 1000,
      endMarginMm: 100,
    });
    expect(result.error!.issues.map((issue) => issue.path.join('.'))).toEqual(['maxDiameterMm']);
  });
});

describe('resin kit form in company units', () => {
  it('converts US gallons to litres and back', () => {
    const parsed = resinKitFormSchema('imperial').parse({
      resinSystemId: '5f2c7c1e-0d1a-4b8e-9c39-3a0e4a3f8f10',
      lot: 'L1',
      expiresOn: '2099-01-01',
      quantityL: 5,
      receivedOn: '',
      notes: '',
    });
    expect(parsed.quantityL).toBe(18.93); // 5 × 3.785411784 = 18.927 L
    expect(parsed.receivedOn).toBeNull();
    expect(
      resinKitToForm({ resinSystemId: 'x', lot: 'L1', expiresOn: '2099-01-01', quantityL: 3.785411784 }, 'imperial')
        .quantityL,
    ).toBe(1);
    expect(
      resinKitFormSchema('metric').parse({
        resinSystemId: '5f2c7c1e-0d1a-4b8e-9c39-3a0e4a3f8f10',
        lot: 'L1',
        expiresOn: '2099-01-01',
        quantityL: 20,
      }).quantityL,
    ).toBe(20);
  });
});
