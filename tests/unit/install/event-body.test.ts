import { describe, expect, it } from 'vitest';
import { createInstallSchema, parseEventBody } from '@/lib/validation/install-events';

const ID = '0b5c3f52-8d0e-4a4e-9a53-1f0f3c1d2e4a';
const OTHER = '6f1d8a20-3c4b-4e8f-8a1e-2b7c9d0e1f23';
const base = { clientEventId: ID, deviceTime: '2026-12-01T08:00:00-07:00' };
const paths = (result: ReturnType<typeof parseEventBody>) =>
  result.success ? [] : result.error.issues.map((i) => i.path.join('.'));

describe('parseEventBody: how a correction names its event', () => {
  it('accepts a correction that names an event and changes its time or values', () => {
    expect(
      parseEventBody({
        ...base,
        type: 'correction',
        correctsEventId: OTHER,
        payload: { reason: 'clock off', deviceTime: '2026-12-01T07:58:00-07:00' },
      }).success,
    ).toBe(true);
    expect(
      parseEventBody({
        ...base,
        type: 'correction',
        correctsEventId: OTHER,
        payload: { reason: 'misread', payload: { pressureKpa: 90 } },
      }).success,
    ).toBe(true);
  });

  it('refuses a correction without its event or without a change, and an ordinary event naming one', () => {
    expect(
      paths(
        parseEventBody({ ...base, type: 'correction', payload: { reason: 'clock off', deviceTime: base.deviceTime } }),
      ),
    ).toEqual(['correctsEventId']);
    expect(
      paths(parseEventBody({ ...base, type: 'correction', correctsEventId: OTHER, payload: { reason: 'nothing' } })),
    ).toEqual(['payload']);
    expect(paths(parseEventBody({ ...base, type: 'resin_mixed', correctsEventId: OTHER, payload: {} }))).toEqual([
      'correctsEventId',
    ]);
  });

  it('still checks the payload against its type, and says so', () => {
    const result = parseEventBody({ ...base, type: 'bladder_inflated', payload: { pressureKpa: 0 } });
    expect(result.success).toBe(false);
    expect(!result.success && 'path' in result && result.path).toBe('payload');
  });
});

describe('createInstallSchema', () => {
  it('wants two ids', () => {
    expect(createInstallSchema.safeParse({ id: ID, repairId: OTHER }).success).toBe(true);
    expect(createInstallSchema.safeParse({ id: 'x', repairId: OTHER }).success).toBe(false);
  });
});
