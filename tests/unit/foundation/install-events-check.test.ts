import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { INSTALL_EVENT_TYPES } from '@/lib/domain/vocabulary';
import { parseEventBody } from '@/lib/validation/install-events';
import { checkEventBody } from '@/lib/validation/install-events-check';

// The tablet checks a tap without zod (checkEventBody) before the outbox stores it; the server checks it with
// parseEventBody. Both must accept the same bodies, keep the same event, and point at the same first problem.
function viaSchema(input: unknown) {
  const parsed = parseEventBody(input);
  if (parsed.success) return { ok: true as const, data: parsed.data };
  const issue = parsed.error.issues[0];
  const path = ['path' in parsed ? parsed.path : undefined, ...issue.path].filter((p) => p !== undefined).join('.');
  return { ok: false as const, path };
}

function viaCheck(input: unknown) {
  const checked = checkEventBody(input);
  return checked.ok ? checked : { ok: false as const, path: checked.path };
}

const UUIDS = [
  '7d3c9a4e-0b1f-4c55-9a0e-1f2b3c4d5e6f',
  '00000000-0000-0000-0000-000000000000',
  '7d3c9a4e-0b1f-0c55-9a0e-1f2b3c4d5e6f', // version 0: not a UUID
  '7D3C9A4E-0B1F-4C55-BA0E-1F2B3C4D5E6F',
  'not-a-uuid',
];
const numbers = fc.oneof(
  fc.constantFrom(0, -0, 1, -1, 0.5, 1.5, -20, -20.1, 60, 60.1, 240, 241, 1000, 1000.5, 10_000, 10_001, 14_400),
  fc.constantFrom(14_401, 10_080, 10_081, Number.NaN, Number.POSITIVE_INFINITY, 2 ** 53, -1e-9),
  fc.double(),
  fc.integer({ min: -50, max: 20_000 }),
);
const texts = fc.oneof(
  fc.constantFrom('', ' ', 'ab', ' ab ', 'abc', '  a  ', 'Why not', 'pass', 'fail', 'PASS'),
  fc.string({ maxLength: 4 }),
  fc.string({ minLength: 199, maxLength: 202 }),
  fc.string({ minLength: 498, maxLength: 502 }).map((s) => ` ${s}`),
  fc.constant('x'.repeat(1001)),
);
const dateTimes = fc.constantFrom(
  '2026-12-02T10:00:00.000Z',
  '2026-12-02T10:00:00+01:00',
  '2026-12-02T10:00Z',
  '2026-02-29T10:00:00Z',
  '2028-02-29T10:00:00Z',
  '2026-12-02 10:00:00Z',
  '2026-12-02T24:00:00Z',
  '2026-12-02T10:00:00',
);
const leaf = fc.oneof(
  numbers,
  texts,
  fc.boolean(),
  fc.constantFrom(...UUIDS),
  dateTimes,
  fc.constant(undefined),
  fc.constant(null),
);
const itemList = fc.oneof(
  fc.constant([]),
  fc.array(fc.record({ id: texts, ok: fc.oneof(fc.boolean(), leaf), note: leaf }, { requiredKeys: ['id'] }), {
    maxLength: 3,
  }),
  leaf,
);
const FIELDS = [
  'mixTempC',
  'airTempC',
  'prepMinutes',
  'pipeTempC',
  'resinKitId',
  'packerId',
  'patchLengthMm',
  'go',
  'overrideReason',
  'makerHoldMin',
  'pressureKpa',
  'confirmedOutOfRange',
  'confirmedEarly',
  'reason',
  'result',
  'notes',
  'name',
  'text',
  'seconds',
  'deviceTime',
  'extra',
];
const payloads = fc.oneof(
  fc.dictionary(fc.constantFrom(...FIELDS), leaf, { maxKeys: 8 }),
  fc.record({ items: itemList }),
  fc.record({ payload: fc.oneof(fc.constant({ pressureKpa: 5 }), leaf), reason: texts }, { requiredKeys: [] }),
  fc.constantFrom(undefined, null, [], 'x', {}),
);
const bodies = fc.record(
  {
    clientEventId: fc.constantFrom(...UUIDS),
    type: fc.oneof(fc.constantFrom(...INSTALL_EVENT_TYPES), fc.constantFrom('dance', '', undefined)),
    deviceTime: fc.oneof(dateTimes, leaf),
    payload: payloads,
    correctsEventId: fc.constantFrom(...UUIDS),
    userId: fc.constantFrom(...UUIDS),
    installId: fc.constantFrom(...UUIDS),
    userName: texts,
  },
  { requiredKeys: ['clientEventId', 'type', 'deviceTime'] },
);

/** A valid payload per type, so the accepting side is exercised as much as the refusing one. */
const VALID: Record<string, Record<string, unknown>> = {
  checks_done: { items: [{ id: 'ready', ok: true, note: '  fine ' }] },
  dry_run_finished: { seconds: 90 },
  conditions_recorded: {
    mixTempC: 18,
    pipeTempC: 12,
    resinKitId: UUIDS[0],
    packerId: UUIDS[3],
    patchLengthMm: 600,
    extra: 1,
  },
  go_decision: { go: false, overrideReason: ' crew agreed ', makerHoldMin: 45 },
  bladder_inflated: { pressureKpa: 150, confirmedOutOfRange: true },
  pressure_reading: { pressureKpa: 150 },
  bladder_deflated: {},
  inspection_recorded: { result: 'pass', notes: ' ok ' },
  signed_off: { name: ' Ana ' },
  note: { text: 'hello' },
  correction: { reason: 'wrong time', deviceTime: '2026-12-02T10:00:00Z' },
};

describe('checkEventBody (the tablet) and parseEventBody (the server)', () => {
  it('agree on every generated body: accepted alike and kept alike, or refused at the same place', () => {
    fc.assert(
      fc.property(bodies, (input) => {
        expect(viaCheck(input)).toEqual(viaSchema(input));
      }),
      { numRuns: 3000 },
    );
  });

  it('agree on a valid payload of each type, with and without a field changed', () => {
    const variants = fc.record({
      type: fc.constantFrom(...INSTALL_EVENT_TYPES),
      field: fc.constantFrom(...FIELDS, 'items'),
      value: fc.oneof(leaf, itemList),
      change: fc.boolean(),
      corrects: fc.boolean(),
    });
    fc.assert(
      fc.property(variants, ({ type, field, value, change, corrects }) => {
        const payload = { ...(VALID[type] ?? {}), ...(change ? { [field]: value } : {}) };
        const input = {
          clientEventId: UUIDS[0],
          type,
          deviceTime: '2026-12-02T10:00:00.000Z',
          payload,
          ...(corrects ? { correctsEventId: UUIDS[3] } : {}),
        };
        expect(viaCheck(input)).toEqual(viaSchema(input));
      }),
      { numRuns: 3000 },
    );
  });

  it('accepts a valid tap of every type and keeps what the server keeps', () => {
    for (const type of INSTALL_EVENT_TYPES) {
      const input = {
        clientEventId: UUIDS[0],
        type,
        deviceTime: '2026-12-02T10:00:00+01:00',
        payload: VALID[type] ?? {},
        ...(type === 'correction' ? { correctsEventId: UUIDS[3] } : {}),
      };
      const checked = viaCheck(input);
      expect(checked.ok, type).toBe(true);
      expect(checked).toEqual(viaSchema(input));
    }
    expect(
      checkEventBody({
        clientEventId: UUIDS[0],
        type: 'signed_off',
        deviceTime: '2026-12-02T10:00:00Z',
        payload: { name: ' Ana ' },
      }),
    ).toEqual({
      ok: true,
      data: {
        clientEventId: UUIDS[0],
        type: 'signed_off',
        deviceTime: '2026-12-02T10:00:00Z',
        payload: { name: 'Ana' },
      },
    });
  });

  it('names the field at fault with the schema message', () => {
    const base = { clientEventId: UUIDS[0], deviceTime: '2026-12-02T10:00:00Z' };
    expect(checkEventBody({ ...base, type: 'bladder_inflated', payload: { pressureKpa: -5 } })).toEqual({
      ok: false,
      path: 'payload.pressureKpa',
      message: 'a pressure above zero',
    });
    expect(checkEventBody({ ...base, type: 'dance' })).toMatchObject({ ok: false, path: 'type' });
    expect(checkEventBody({ ...base, type: 'correction', payload: { reason: 'why not' } })).toMatchObject({
      ok: false,
      path: 'correctsEventId',
      message: 'Say which event this corrects',
    });
  });
});
