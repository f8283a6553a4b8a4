import { INSTALL_EVENT_TYPES } from '@/lib/domain/vocabulary';

// The tablet's check of a tap before the outbox stores it, without zod: zod would bring ~30 kB (gzipped) to the
// install screen. It mirrors parseEventBody (install-events.ts, which the server still applies) rule for rule:
// what it accepts, what it keeps (trimmed text, unknown keys dropped) and where the first problem lies. A unit test
// holds the two together. Messages are the schemas' own where they name one.

type Path = (string | number)[];
/** Checks one value at `path`: returns what to keep, or throws a Problem. */
type Rule = (value: unknown, path: Path) => unknown;

class Problem {
  constructor(
    readonly path: Path,
    readonly message: string,
  ) {}
}

const fail = (path: Path, message: string): never => {
  throw new Problem(path, message);
};

// zod 4's patterns (zod/v4/core/regexes.ts `uuid()` and `datetime({ offset: true })`), so both sides accept the same.
const UUID = new RegExp(
  '^([0-9a-fA-F]{8}-[0-9a-fA-F]{4}-[1-8][0-9a-fA-F]{3}-[89abAB][0-9a-fA-F]{3}-[0-9a-fA-F]{12}|' +
    '00000000-0000-0000-0000-000000000000|ffffffff-ffff-ffff-ffff-ffffffffffff)$',
);
const DATE =
  '(?:(?:\\d\\d[2468][048]|\\d\\d[13579][26]|\\d\\d0[48]|[02468][048]00|[13579][26]00)-02-29|\\d{4}-(?:(?:0[13578]|1[02])-' +
  '(?:0[1-9]|[12]\\d|3[01])|(?:0[469]|11)-(?:0[1-9]|[12]\\d|30)|(?:02)-(?:0[1-9]|1\\d|2[0-8])))';
const ISO_DATE_TIME = new RegExp(
  `^${DATE}T(?:(?:[01]\\d|2[0-3]):[0-5]\\d:[0-5]\\d(?:\\.\\d+)?(?:Z|([+-](?:[01]\\d|2[0-3]):[0-5]\\d)))$`,
);

export const isUuid = (value: unknown): value is string => typeof value === 'string' && UUID.test(value);

const uuid: Rule = (value, path) => (isUuid(value) ? value : fail(path, 'Not a valid id'));

const isoDateTime =
  (message = 'Invalid ISO date-time'): Rule =>
  (value, path) =>
    typeof value === 'string' && ISO_DATE_TIME.test(value) ? value : fail(path, message);

const optional =
  (rule: Rule): Rule =>
  (value, path) =>
    value === undefined ? undefined : rule(value, path);

const boolean: Rule = (value, path) => (typeof value === 'boolean' ? value : fail(path, 'Expected true or false'));

const oneOf =
  (values: readonly string[], message = 'Invalid option'): Rule =>
  (value, path) =>
    values.includes(value as string) ? value : fail(path, message);

type NumberLimits = { min?: number; above?: number; max: number; int?: boolean; messages?: Record<string, string> };
const number =
  ({ min, above, max, int = false, messages = {} }: NumberLimits): Rule =>
  (value, path) => {
    if (typeof value !== 'number' || !Number.isFinite(value)) return fail(path, 'Expected a number');
    if (int && !Number.isSafeInteger(value)) return fail(path, 'Expected a whole number');
    if (above !== undefined && value <= above) return fail(path, messages.min ?? `Must be above ${above}`);
    if (min !== undefined && value < min) return fail(path, messages.min ?? `Must be at least ${min}`);
    return value > max ? fail(path, messages.max ?? `Must be at most ${max}`) : value;
  };

/** A string, trimmed first when `trim`, then held to its length. */
const text =
  (min: number, max: number, { trim = true, minMessage }: { trim?: boolean; minMessage?: string } = {}): Rule =>
  (value, path) => {
    if (typeof value !== 'string') return fail(path, 'Expected text');
    const kept = trim ? value.trim() : value;
    if (kept.length < min) return fail(path, minMessage ?? `At least ${min} characters`);
    return kept.length > max ? fail(path, `At most ${max} characters`) : kept;
  };

const isObject = (value: unknown): value is Record<string, unknown> =>
  typeof value === 'object' && value !== null && !Array.isArray(value);

const isPlainObject = (value: unknown): value is Record<string, unknown> => {
  if (!isObject(value)) return false;
  const prototype = Object.getPrototypeOf(value) as unknown;
  return prototype === null || prototype === Object.prototype;
};

/** Any plain object, kept as it is (z.record(z.string(), z.unknown())). */
const record: Rule = (value, path) => (isPlainObject(value) ? value : fail(path, 'Expected an object'));

/** Each key of `shape` in order, unknown keys dropped (or refused when `strict`). */
const object =
  (shape: Record<string, Rule>, strict = false): Rule =>
  (value, path) => {
    if (!isObject(value)) return fail(path, 'Expected an object');
    const kept: Record<string, unknown> = {};
    for (const [key, rule] of Object.entries(shape)) {
      const checked = rule(value[key], [...path, key]);
      if (checked !== undefined) kept[key] = checked;
    }
    const unknown = strict ? Object.keys(value).filter((key) => !(key in shape)) : [];
    return unknown.length ? fail(path, `Unrecognized key: "${unknown[0]}"`) : kept;
  };

const array =
  (item: Rule, min: number): Rule =>
  (value, path) => {
    if (!Array.isArray(value)) return fail(path, 'Expected a list');
    const kept = value.map((entry, index) => item(entry, [...path, index]));
    return kept.length < min ? fail(path, `At least ${min} item(s)`) : kept;
  };

const nothing = object({}, true);
const temperatureC = number({ min: -20, max: 60, messages: { min: 'below −20 °C', max: 'above 60 °C' } });
const pressureKpa = number({
  above: 0,
  max: 1000,
  messages: { min: 'a pressure above zero', max: 'over 1000 kPa: check the gauge units' },
});
const reason = text(3, 1000, { minMessage: 'Say why in a few words' });
const pressure = object({ pressureKpa, confirmedOutOfRange: optional(boolean) });

const PAYLOADS: Record<(typeof INSTALL_EVENT_TYPES)[number], Rule> = {
  safety_acknowledged: nothing,
  checks_done: object({
    items: array(object({ id: text(1, Infinity, { trim: false }), ok: boolean, note: optional(text(0, 500)) }), 1),
  }),
  dry_run_started: nothing,
  dry_run_finished: object({ seconds: number({ min: 1, max: 4 * 3600, int: true }) }),
  conditions_recorded: object({
    mixTempC: temperatureC,
    airTempC: optional(temperatureC),
    prepMinutes: optional(
      number({ min: 0, max: 240, messages: { min: 'not below 0 min', max: 'over 4 h: check the minutes' } }),
    ),
    pipeTempC: temperatureC,
    resinKitId: uuid,
    packerId: uuid,
    patchLengthMm: number({ above: 0, max: 10_000, int: true }),
  }),
  go_decision: object({
    go: boolean,
    overrideReason: optional(reason),
    makerHoldMin: optional(
      number({
        above: 0,
        max: 7 * 24 * 60,
        messages: { min: 'a hold above zero', max: 'over 7 days: check the minutes' },
      }),
    ),
  }),
  resin_mixed: nothing,
  patch_loaded: nothing,
  packer_in_position: nothing,
  bladder_inflated: pressure,
  pressure_reading: pressure,
  bladder_deflated: object({ reason: optional(reason), confirmedEarly: optional(boolean) }),
  inspection_recorded: object({ result: oneOf(['pass', 'fail']), notes: optional(text(0, 2000)) }),
  signed_off: object({ name: text(2, 200) }),
  note: object({ text: text(1, 2000) }),
  correction: object({ reason, deviceTime: optional(isoDateTime()), payload: optional(record) }),
};

const body = object({
  clientEventId: uuid,
  type: oneOf(INSTALL_EVENT_TYPES, 'Unknown event type'),
  deviceTime: isoDateTime('deviceTime must be an ISO date-time'),
  payload: (value, path) => (value === undefined ? {} : record(value, path)),
  correctsEventId: optional(uuid),
  userId: optional(uuid),
});

export type CheckedEvent = {
  clientEventId: string;
  type: (typeof INSTALL_EVENT_TYPES)[number];
  deviceTime: string;
  payload: Record<string, unknown>;
  correctsEventId?: string;
  userId?: string;
};

export type EventCheck = { ok: true; data: CheckedEvent } | { ok: false; path: string; message: string };

/** parseEventBody's verdict without zod: the event as the server would read it, or the first problem and its path. */
export function checkEventBody(input: unknown): EventCheck {
  try {
    const event = body(input, []) as CheckedEvent;
    const isCorrection = event.type === 'correction';
    if (isCorrection && !event.correctsEventId) fail(['correctsEventId'], 'Say which event this corrects');
    if (!isCorrection && event.correctsEventId) fail(['correctsEventId'], 'Only a correction names another event');
    if (isCorrection && event.payload.deviceTime === undefined && event.payload.payload === undefined)
      fail(['payload'], 'Give the corrected time or values');
    const payload = PAYLOADS[event.type](event.payload, ['payload']) as Record<string, unknown>;
    return { ok: true, data: { ...event, payload } };
  } catch (error) {
    if (!(error instanceof Problem)) throw error;
    return { ok: false, path: error.path.join('.'), message: error.message };
  }
}
