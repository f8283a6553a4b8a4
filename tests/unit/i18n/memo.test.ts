import { describe, expect, it } from 'vitest';
import { memoByKey } from '@/lib/i18n/memo';

describe('memoByKey', () => {
  it('makes once per key and hands back the same value', () => {
    const made: string[] = [];
    const formatterFor = memoByKey((zone) => {
      made.push(zone);
      return new Intl.DateTimeFormat('en-CA', { timeZone: zone });
    });
    const first = formatterFor('America/Denver');
    expect(formatterFor('America/Denver')).toBe(first);
    expect(formatterFor('Europe/Madrid')).not.toBe(first);
    expect(made).toEqual(['America/Denver', 'Europe/Madrid']);
  });
});
