import { randomUUID } from 'node:crypto';
import fc from 'fast-check';
import type { z } from 'zod';

// fast-check arbitraries shaped from a zod (v4) schema: most values have the type and bounds the schema asks
// for, so many bodies get past the first check and reach the data layer; the rest are hostile — wrong types,
// NaN/Infinity as strings, 1e308, negative and zero numbers, 10 000-character and unicode strings, far-past and
// far-future dates, missing and extra keys, and ids of other companies.

export type IdPools = { own: string[]; foreign: string[] };

type Def = {
  type: string;
  format?: string;
  coerce?: boolean;
  shape?: Record<string, z.ZodType>;
  innerType?: z.ZodType;
  in?: z.ZodType;
  out?: z.ZodType;
  options?: z.ZodType[];
  element?: z.ZodType;
  entries?: Record<string, string | number>;
  values?: unknown[];
  valueType?: z.ZodType;
};
type Bag = {
  minimum?: number;
  maximum?: number;
  minLength?: number;
  maxLength?: number;
  integer?: boolean;
  pattern?: RegExp;
};
type Check = {
  _zod: {
    def: {
      check: string;
      value?: number;
      inclusive?: boolean;
      minimum?: number;
      maximum?: number;
      length?: number;
      format?: string;
      pattern?: RegExp;
    };
  };
};

const internals = (schema: z.ZodType) => (schema as unknown as { _zod: { def: Def & { checks?: Check[] } } })._zod;

/** The bounds a schema's checks set: sizes of strings, ranges of numbers, whole numbers. */
function boundsOf(def: Def & { checks?: Check[] }): Bag {
  const bag: Bag = { integer: def.format !== undefined && /int/.test(def.format) };
  for (const check of def.checks ?? []) {
    const c = check._zod.def;
    if (c.check === 'greater_than') bag.minimum = (c.value ?? 0) + (c.inclusive ? 0 : 1e-6);
    if (c.check === 'less_than') bag.maximum = (c.value ?? 0) - (c.inclusive ? 0 : 1e-6);
    if (c.check === 'min_length') bag.minLength = c.minimum;
    if (c.check === 'max_length') bag.maxLength = c.maximum;
    if (c.check === 'length_equals') bag.minLength = bag.maxLength = c.length;
    if (c.check === 'number_format' && c.format && /int/.test(c.format)) bag.integer = true;
    if (c.check === 'string_format' && c.format === 'regex' && c.pattern) bag.pattern = c.pattern;
  }
  return bag;
}

const LONG = 'x'.repeat(10_000);
const FAR_DATES = ['0001-01-01', '1900-02-29', '9999-12-31', '2026-02-30', '1970-01-01', '2999-01-01'];
const FAR_TIMES = [
  '0001-01-01T00:00:00.000Z',
  '9999-12-31T23:59:59.999Z',
  '1970-01-01T00:00:00Z',
  '2100-06-01T12:00:00+14:00',
  '2026-13-01T00:00:00Z',
];

/** Values of the wrong type or out of any sane range; every field gets some of these. */
export const hostile: fc.Arbitrary<unknown> = fc.oneof(
  fc.constantFrom<unknown>(
    null,
    true,
    false,
    0,
    -1,
    -0.5,
    1e308,
    -1e308,
    Number.MAX_SAFE_INTEGER + 2,
    'NaN',
    'Infinity',
    '-Infinity',
    '1e308',
    '',
    ' ',
    [],
    {},
    [null],
    { $gt: '' },
    LONG,
  ),
  fc.constantFrom<unknown>(...FAR_DATES, ...FAR_TIMES),
  fc.string({ maxLength: 30 }),
  fc.string({ unit: 'grapheme', maxLength: 30 }),
  fc.integer(),
  fc.double(),
  fc.array(fc.oneof(fc.integer(), fc.string({ maxLength: 5 })), { maxLength: 3 }),
);

function idArbitrary(pools: IdPools) {
  return fc.oneof(
    { weight: 6, arbitrary: fc.constantFrom(...pools.own) },
    { weight: 2, arbitrary: fc.constantFrom(...pools.foreign) },
    { weight: 1, arbitrary: fc.constant(null).map(() => randomUUID()) },
  );
}

function stringArbitrary(bag: Bag): fc.Arbitrary<string> {
  if (bag.pattern)
    return fc.oneof(
      { weight: 6, arbitrary: fc.stringMatching(bag.pattern) },
      { weight: 1, arbitrary: fc.string({ maxLength: 20 }) },
    );
  const min = bag.minLength ?? 0;
  const max = Math.min(bag.maxLength ?? 60, 300);
  return fc.oneof(
    { weight: 5, arbitrary: fc.string({ minLength: min, maxLength: Math.max(min, Math.min(max, 40)) }) },
    {
      weight: 2,
      arbitrary: fc.string({ unit: 'grapheme', minLength: min, maxLength: Math.max(min, Math.min(max, 20)) }),
    },
    {
      weight: 1,
      arbitrary: fc.constantFrom(
        'Main run',
        'MH-1',
        'a',
        '  padded  ',
        '<script>alert(1)</script>',
        "O'Brien; DROP TABLE jobs;--",
        '=1+2',
        '\u0000',
        '😀🚰',
        LONG,
      ),
    },
  );
}

function numberArbitrary(bag: Bag, key = ''): fc.Arbitrary<number> {
  let min = Math.max(Number.isFinite(bag.minimum) ? (bag.minimum as number) : -100, -1e9);
  let max = Math.min(Number.isFinite(bag.maximum) ? (bag.maximum as number) : Math.max(min + 1000, 1000), 1e9);
  // A pair like minTempC/maxTempC is checked against each other: the lower half for min*, the upper for max*.
  const middle = (min + max) / 2;
  if (/^min[A-Z]/.test(key)) max = middle;
  if (/^max[A-Z]/.test(key)) min = middle;
  const whole = fc.integer({ min: Math.ceil(min), max: Math.max(Math.ceil(min), Math.floor(max)) });
  return fc.oneof(
    { weight: 6, arbitrary: whole },
    { weight: bag.integer ? 1 : 3, arbitrary: fc.double({ min, max, noNaN: true, noDefaultInfinity: true }) },
    { weight: 1, arbitrary: fc.constantFrom(0, -1, 1, 1e308, -1e308, 0.1 + 0.2, 2 ** 31, 2 ** 53, -0) },
  );
}

const dateArbitrary = fc.oneof(
  {
    weight: 4,
    arbitrary: fc
      .integer({ min: -400, max: 400 })
      .map((days) => new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10)),
  },
  { weight: 1, arbitrary: fc.constantFrom(...FAR_DATES) },
);
const timeArbitrary = fc.oneof(
  {
    weight: 4,
    arbitrary: fc
      .integer({ min: -30 * 24 * 60, max: 24 * 60 })
      .map((min) => new Date(Date.now() + min * 60_000).toISOString()),
  },
  { weight: 1, arbitrary: fc.constantFrom(...FAR_TIMES) },
);

/** Keys whose schema checks against a list the generator cannot see (a refine): the list, and a few outside it. */
const KEYS: Record<string, fc.Arbitrary<unknown>> = {
  timeZone: fc.constantFrom(
    'America/Denver',
    'UTC',
    'Europe/Berlin',
    'Asia/Kolkata',
    'Mars/Olympus_Mons',
    'america/denver',
    '',
  ),
  contentType: fc.constantFrom(
    'image/jpeg',
    'image/png',
    'image/webp',
    'video/mp4',
    'IMAGE/PNG',
    'application/pdf',
    'text/html',
    'image/svg+xml',
  ),
};

type Options = { pools: IdPools; overrides: Record<string, fc.Arbitrary<unknown>>; noise: number; key?: string };

/**
 * A body for the schema. A third are hostile through and through or of the schema's shape with many bad
 * fields; the rest are of its shape with a rare bad field, so they reach the data layer.
 */
export function arbitraryOf(
  schema: z.ZodType,
  pools: IdPools,
  extra: Record<string, fc.Arbitrary<unknown>> = {},
): fc.Arbitrary<unknown> {
  const overrides = { ...KEYS, ...extra };
  return fc.oneof(
    { weight: 4, arbitrary: node(schema, { pools, overrides, noise: 0.02 }, 0) },
    { weight: 2, arbitrary: node(schema, { pools, overrides, noise: 0.2 }, 0) },
    { weight: 1, arbitrary: hostile },
  );
}

/** One value of the schema's shape, or (with probability `noise`) a hostile one. */
function node(schema: z.ZodType, options: Options, depth: number): fc.Arbitrary<unknown> {
  const hostileWeight = Math.max(1, Math.round(options.noise * 100));
  return fc.oneof(
    { weight: 100 - hostileWeight, arbitrary: shaped(schema, options, depth) },
    { weight: hostileWeight, arbitrary: hostile },
  );
}

function shaped(schema: z.ZodType, options: Options, depth: number): fc.Arbitrary<unknown> {
  const { def } = internals(schema);
  const bag = boundsOf(def);
  const { pools } = options;
  const inner = (s: z.ZodType) => node(s, options, depth + 1);
  switch (def.type) {
    case 'string':
      if (def.format === 'uuid' || def.format === 'guid') return idArbitrary(pools);
      if (def.format === 'email') {
        return fc.oneof(
          {
            weight: 6,
            arbitrary: fc
              .tuple(fc.stringMatching(/^[a-z][a-z0-9]{0,15}$/), fc.stringMatching(/^[a-z]{2,12}$/))
              .map(([user, host]) => `${user}@${host}.test`),
          },
          { weight: 1, arbitrary: fc.emailAddress() },
          {
            weight: 1,
            arbitrary: fc.constantFrom('not-an-email', 'a@b', `${'a'.repeat(250)}@x.test`, 'ÜNICODE@exämple.test'),
          },
        );
      }
      if (def.format === 'date') return dateArbitrary;
      if (def.format === 'datetime') return timeArbitrary;
      return stringArbitrary(bag);
    case 'number':
    case 'int':
      return def.coerce
        ? fc.oneof(numberArbitrary(bag, options.key), numberArbitrary(bag, options.key).map(String))
        : numberArbitrary(bag, options.key);
    case 'bigint':
      return fc.bigInt({ min: -(2n ** 70n), max: 2n ** 70n }).map(String);
    case 'boolean':
      return def.coerce ? fc.constantFrom(true, false, 'true', 'false') : fc.boolean();
    case 'date':
      return timeArbitrary;
    case 'enum':
      return fc.constantFrom(...Object.values(def.entries ?? {}));
    case 'literal':
      return fc.constantFrom(...(def.values ?? []));
    case 'optional':
      return fc.option(inner(def.innerType!), { nil: undefined, freq: 4 });
    case 'nullable':
      return fc.option(inner(def.innerType!), { nil: null, freq: 4 });
    case 'default':
    case 'prefault':
    case 'catch':
    case 'readonly':
    case 'nonoptional':
      return fc.option(inner(def.innerType!), { nil: undefined, freq: 4 });
    case 'pipe': {
      // `.transform(f)` ends in a transform: its input decides. Otherwise the schema behind the pipe is the
      // stricter one (`z.string().trim().pipe(z.uuid())`, preprocess).
      const source = internals(def.out!).def.type === 'transform' ? def.in! : def.out!;
      return shaped(source, options, depth);
    }
    case 'union':
      return fc.oneof(...(def.options ?? []).map((option) => shaped(option, options, depth)));
    case 'array':
      return depth > 4 ? fc.constant([]) : fc.array(inner(def.element!), { maxLength: 4 });
    case 'record':
      return fc.dictionary(fc.string({ maxLength: 8 }), inner(def.valueType!), { maxKeys: 3 });
    case 'object':
      return objectArbitrary(def.shape ?? {}, options, depth);
    default:
      // unknown, any, transform, lazy…: anything at all.
      return hostile;
  }
}

function objectArbitrary(shape: Record<string, z.ZodType>, options: Options, depth: number) {
  const fields: Record<string, fc.Arbitrary<unknown>> = {};
  const rare = Math.max(1, Math.round(options.noise * 100));
  for (const [key, schema] of Object.entries(shape)) {
    const arbitrary = options.overrides[key] ?? node(schema, { ...options, key }, depth + 1);
    // Now and then a key goes missing; `undefined` drops out of JSON.
    fields[key] = fc.oneof({ weight: 100 - rare, arbitrary }, { weight: rare, arbitrary: fc.constant(undefined) });
  }
  const extra = fc.oneof(
    { weight: 100 - rare, arbitrary: fc.constant({}) },
    {
      weight: rare,
      arbitrary: fc.dictionary(
        fc.constantFrom('companyId', 'id', 'status', '__proto__', 'constructor', 'extra', 'createdAt'),
        hostile,
        { maxKeys: 2 },
      ),
    },
  );
  return fc.tuple(fc.record(fields), extra).map(([record, more]) => ({ ...more, ...record }));
}
