import { describe, expect, it } from 'vitest';
import {
  companyFormSchema,
  companyPatchSchema,
  companyToForm,
  formToCompanyPatch,
  isKnownTimeZone,
} from '@/lib/validation/company';

// 1 in = 25.4 mm exactly (the international inch, 1959 agreement).
describe('company settings form ↔ API body', () => {
  const stored = {
    name: 'Acme',
    timeZone: 'America/Denver',
    unitSystem: 'imperial' as const,
    minOverlapPerEndMm: 305,
    workingWindowSafetyMargin: 0.2,
    holdReserve: 0.1,
  };

  it('shows the overlap in inches and the reserve in per cent for an imperial company', () => {
    expect(companyToForm(stored)).toEqual({
      name: 'Acme',
      timeZone: 'America/Denver',
      unitSystem: 'imperial',
      minOverlapPerEnd: 12.01,
      safetyMarginPercent: 20,
      holdReservePercent: 10,
      linerModulus: Number.NaN,
    });
  });

  it('round-trips unchanged settings to the same stored values', () => {
    const body = formToCompanyPatch(companyToForm(stored));
    expect(body).toEqual({
      name: 'Acme',
      timeZone: 'America/Denver',
      unitSystem: 'imperial',
      minOverlapPerEndMm: 305,
      workingWindowSafetyMargin: 0.2,
      holdReserve: 0.1,
      linerShortTermModulusMpa: null,
    });
    expect(companyPatchSchema.parse(body)).toEqual(body);
  });

  it('converts an entry in the unit system picked in the same form', () => {
    expect(
      formToCompanyPatch({
        ...companyToForm(stored),
        unitSystem: 'metric',
        minOverlapPerEnd: 150,
        safetyMarginPercent: 25,
      }),
    ).toMatchObject({ minOverlapPerEndMm: 150, workingWindowSafetyMargin: 0.25 });
    expect(formToCompanyPatch({ ...companyToForm(stored), minOverlapPerEnd: 6 }).minOverlapPerEndMm).toBe(152); // 6 × 25.4 = 152.4
  });

  it('refuses a reserve above 90 % and a negative overlap in the form', () => {
    const result = companyFormSchema.safeParse({
      ...companyToForm(stored),
      minOverlapPerEnd: -1,
      safetyMarginPercent: 95,
    });
    expect(result.success).toBe(false);
    expect(result.error!.issues.map((issue) => issue.path[0]).sort()).toEqual([
      'minOverlapPerEnd',
      'safetyMarginPercent',
    ]);
  });

  it('takes the hold reserve in per cent and refuses more than 100 % or less than 0', () => {
    expect(formToCompanyPatch({ ...companyToForm(stored), holdReservePercent: 15 }).holdReserve).toBe(0.15);
    expect(companyFormSchema.safeParse({ ...companyToForm(stored), holdReservePercent: 120 }).success).toBe(false);
    expect(companyPatchSchema.safeParse({ holdReserve: -0.1 }).success).toBe(false);
    expect(companyPatchSchema.safeParse({ holdReserve: 0.25 }).success).toBe(true);
  });

  it('knows IANA zones and UTC, not made-up ones', () => {
    expect(isKnownTimeZone('Europe/Berlin')).toBe(true);
    expect(isKnownTimeZone('UTC')).toBe(true);
    expect(isKnownTimeZone('Mars/Olympus_Mons')).toBe(false);
    expect(isKnownTimeZone('europe/berlin')).toBe(false);
  });
});

describe('messages in the company’s units', () => {
  const stored = {
    name: 'Units Co',
    timeZone: 'UTC',
    minOverlapPerEndMm: 75,
    workingWindowSafetyMargin: 0.2,
    holdReserve: 0.1,
  };
  const overlapMessage = (unitSystem: 'imperial' | 'metric', minOverlapPerEnd: number) => {
    const result = companyFormSchema.safeParse({ ...companyToForm({ ...stored, unitSystem }), minOverlapPerEnd });
    return result.success ? '' : result.error.issues.map((issue) => issue.message).join(' ');
  };
  it('an imperial company reads the overlap bound in inches, a metric one in millimetres', () => {
    // 1000 mm = 39.37 in (NIST SP 811: 1 in = 25.4 mm exactly).
    expect(overlapMessage('imperial', 40)).toMatch(/in\b/);
    expect(overlapMessage('imperial', 40)).not.toMatch(/mm/);
    expect(overlapMessage('metric', 1001)).toMatch(/1000 mm|1,000 mm/);
    expect(overlapMessage('imperial', 39)).toBe('');
  });
});

describe('the liner modulus for the F1216 X1 checks', () => {
  const stored = {
    name: 'Units Co',
    timeZone: 'UTC',
    minOverlapPerEndMm: 75,
    workingWindowSafetyMargin: 0.2,
    holdReserve: 0.1,
  };
  it('is typed in psi by an imperial company and stored in MPa; empty means the F1216 minimum (null)', () => {
    // ASTM F1216 Table 1: 250 000 psi minimum initial flexural modulus; 1 psi = 6.894 757 kPa (NIST SP 811) → 1723.7 MPa.
    const form = companyToForm({ ...stored, unitSystem: 'imperial', linerShortTermModulusMpa: 1723.7 });
    expect(form.linerModulus).toBe(250_000);
    expect(formToCompanyPatch(form).linerShortTermModulusMpa).toBe(1723.7);
    expect(formToCompanyPatch({ ...form, linerModulus: 400_000 }).linerShortTermModulusMpa).toBeCloseTo(2757.9, 1);
    const empty = companyToForm({ ...stored, unitSystem: 'metric', linerShortTermModulusMpa: null });
    expect(Number.isNaN(empty.linerModulus)).toBe(true);
    expect(companyFormSchema.safeParse(empty).success).toBe(true);
    expect(formToCompanyPatch(empty).linerShortTermModulusMpa).toBeNull();
  });
  it('names its bounds in the company’s units', () => {
    const imperial = companyFormSchema.safeParse({
      ...companyToForm({ ...stored, unitSystem: 'imperial' }),
      linerModulus: 10,
    });
    expect(imperial.error?.issues.map((issue) => issue.message).join(' ')).toMatch(/psi/);
    expect(imperial.error?.issues.map((issue) => issue.message).join(' ')).not.toMatch(/MPa/);
    expect(companyPatchSchema.safeParse({ linerShortTermModulusMpa: 100 }).success).toBe(false);
    expect(companyPatchSchema.safeParse({ linerShortTermModulusMpa: null }).success).toBe(true);
  });
});
