import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { DEFECT_TYPES, LABELS, label } from '@/lib/domain/vocabulary';
import { repairInputSchema, repairPatchSchema } from '@/lib/validation/repairs';

const require = createRequire(import.meta.url);
const { RENAMES } = require('../../../migrations/20261202001210-own-defect-names.cjs') as {
  RENAMES: [string, string][];
};

describe('defect types: our own plain-English names', () => {
  it('no code is one of the noun-first crack codes', () => {
    for (const banned of ['crack_longitudinal', 'crack_circumferential', 'crack_multiple']) {
      expect(DEFECT_TYPES).not.toContain(banned);
    }
  });

  it('every code has a label of its own in natural word order (never "Crack …" noun first)', () => {
    for (const code of DEFECT_TYPES) {
      expect(LABELS[code], code).toBeTruthy();
      expect(label(code)).not.toMatch(/^Crack\b/);
    }
    expect(label('lengthwise_crack')).toBe('Lengthwise crack');
    expect(label('ring_crack')).toBe('Ring crack');
    expect(label('lateral_sticking_in')).toBe('Side connection sticking in');
  });

  it('the migration maps every stored code one to one onto the new list, so down restores what up changed', () => {
    expect(RENAMES.map(([, to]) => to).sort()).toEqual([...DEFECT_TYPES].sort());
    expect(new Set(RENAMES.map(([from]) => from)).size).toBe(RENAMES.length);
    expect(RENAMES.map(([from]) => from)).toEqual(
      expect.arrayContaining(['crack_longitudinal', 'crack_circumferential', 'crack_multiple']),
    );
  });

  it('the API refuses an old code', () => {
    const body = {
      jobId: crypto.randomUUID(),
      segmentId: crypto.randomUUID(),
      distanceMm: 1000,
      conditionGrade: 3,
      defectLengthMm: 100,
    };
    expect(repairInputSchema.safeParse({ ...body, defectType: 'crack_longitudinal' }).success).toBe(false);
    expect(repairInputSchema.safeParse({ ...body, defectType: 'lengthwise_crack' }).success).toBe(true);
  });
});

describe("owner's defect code", () => {
  it('is kept exactly as typed, blank is none, and there is no list to pick from', () => {
    expect(repairPatchSchema.parse({ ownerDefectCode: ' Ab-07 / x ' }).ownerDefectCode).toBe(' Ab-07 / x ');
    expect(repairPatchSchema.parse({ ownerDefectCode: '   ' }).ownerDefectCode).toBeNull();
    expect(repairPatchSchema.parse({ ownerDefectCode: null }).ownerDefectCode).toBeNull();
    expect(repairPatchSchema.parse({}).ownerDefectCode).toBeUndefined();
    expect(repairPatchSchema.safeParse({ ownerDefectCode: 'x'.repeat(61) }).success).toBe(false);
    expect(repairPatchSchema.safeParse({ ownerDefectCode: 7 }).success).toBe(false);
  });
});
