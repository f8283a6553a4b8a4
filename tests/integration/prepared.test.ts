import { describe, expect, it } from 'vitest';
import { definePrepared, queryPrepared } from '@/lib/data/prepared';

// Prepared statements of the hot paths (lib/data/prepared.ts): values go as literals quoted by the driver, so what
// comes back must be exactly what went in, whatever quotes, backslashes or commas it holds; and an error must not
// leave a connection behind whose prepared statements are unknown.
const ECHO_TEXT = definePrepared('test_echo_text', 'SELECT $1::text AS v');
const ECHO_ARRAY = definePrepared('test_echo_array', 'SELECT $1::varchar(32)[] AS v');
const ECHO_JSON = definePrepared('test_echo_json', 'SELECT $1::jsonb AS v');
const ECHO_TIME = definePrepared('test_echo_time', 'SELECT $1::timestamptz AS v, $2::int AS n, $3::boolean AS b');
const DIVIDE = definePrepared('test_divide', 'SELECT 10 / $1::int AS v');

const echo = async <T>(name: string, args: unknown[]) => (await queryPrepared<{ v: T }>(name, args))[0].v;

describe('prepared statements', () => {
  it('gives back exactly the values sent, quotes, backslashes and separators included', async () => {
    for (const text of ["O'Reilly", 'back\\slash', 'double "quote"', "'; DROP TABLE users; --", 'ünïcode ✓', ''])
      expect(await echo(ECHO_TEXT, [text])).toBe(text);
    const items = ['a"b', 'c\\d', 'e,f', '{g}', "h'i", 'NULL', ' spaced '];
    expect(await echo(ECHO_ARRAY, [items])).toEqual(items);
    expect(await echo(ECHO_ARRAY, [[]])).toEqual([]);
    const json = { text: 'it\'s "x" \\ y', list: [1, 2.5, null], nested: { ok: true } };
    expect(await echo(ECHO_JSON, [json])).toEqual(json);
    const at = new Date('2026-12-02T10:11:12.345Z');
    const [row] = await queryPrepared<{ v: Date; n: number; b: boolean }>(ECHO_TIME, [at, 42, false]);
    expect(new Date(row.v).getTime()).toBe(at.getTime());
    expect(row).toMatchObject({ n: 42, b: false });
    expect(await echo(ECHO_TEXT, [null])).toBeNull();
  });

  it('refuses a number that is not finite instead of sending it', async () => {
    await expect(queryPrepared(DIVIDE, [Number.NaN])).rejects.toThrow(/finite/);
  });

  it('keeps working after a statement fails: the failed connection is closed, a new one prepares again', async () => {
    await expect(queryPrepared(DIVIDE, [0])).rejects.toThrow(/division by zero/);
    for (let i = 0; i < 30; i++) expect(await echo<number>(DIVIDE, [5])).toBe(2);
    expect(await echo(ECHO_TEXT, ['still here'])).toBe('still here');
  });

  it('refuses one name for two statements', () => {
    expect(() => definePrepared('test_echo_text', 'SELECT 2')).toThrow(/twice/);
    expect(definePrepared('test_echo_text', 'SELECT $1::text AS v')).toBe('test_echo_text');
  });
});
