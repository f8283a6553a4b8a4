import { describe, expect, it } from 'vitest';
import { repairFormSchema } from '@/lib/validation/repairs';

const ok = {
  segmentId: crypto.randomUUID(),
  distance: 10,
  defectType: 'hole',
  conditionGrade: 3,
  defectLength: 4,
  clockPosition: '',
  notes: '',
};
const messages = (result: { success: boolean; error?: { issues: { message: string }[] } }) =>
  (result.error?.issues ?? []).map((i) => i.message).join(' ');

describe('repair form range errors in the company’s units', () => {
  it('imperial: a defect beyond 20 m reads in feet, never mm', () => {
    // 20 000 mm = 65.6 ft (1 ft = 304.8 mm, NIST SP 811, exact); 800 in is past it.
    const result = repairFormSchema('imperial').safeParse({ ...ok, defectLength: 800 });
    expect(result.success).toBe(false);
    expect(messages(result)).toBe('A point repair covers a defect of at most 66 ft');
    expect(messages(result)).not.toMatch(/mm|\bm\b/);
  });

  it('metric: the same limit in metres', () => {
    const result = repairFormSchema('metric').safeParse({ ...ok, defectLength: 20_001 });
    expect(messages(result)).toBe('A point repair covers a defect of at most 20 m');
  });

  it('a distance past 1 km: 3 281 ft or 1 000 m', () => {
    expect(messages(repairFormSchema('imperial').safeParse({ ...ok, distance: 4000 }))).toBe(
      'The distance is at most 3281 ft',
    );
    expect(messages(repairFormSchema('metric').safeParse({ ...ok, distance: 1001 }))).toBe(
      'The distance is at most 1000 m',
    );
    expect(repairFormSchema('imperial').safeParse(ok).success).toBe(true);
  });
});
