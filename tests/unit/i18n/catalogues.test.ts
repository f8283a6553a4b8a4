import { parse, TYPE, type MessageFormatElement } from '@formatjs/icu-messageformat-parser';
import { describe, expect, it } from 'vitest';
import en from '@/messages/en.json';
import es from '@/messages/es.json';
import { LOCALES } from '@/i18n/locales';

// Every screen's words come from messages/<locale>.json: a key missing in one language would show the reader a
// raw key (or English in the middle of Spanish), and a placeholder missing or renamed would drop a number — a
// deadline, a pressure — from the sentence. Both fail here.

type Tree = { [key: string]: string | Tree };
const CATALOGUES: Record<string, Tree> = { en, es };

/** "install.clock.gauge" → message, for every leaf. */
function flatten(tree: Tree, prefix = ''): Map<string, string> {
  const out = new Map<string, string>();
  for (const [key, value] of Object.entries(tree)) {
    const path = prefix ? `${prefix}.${key}` : key;
    if (typeof value === 'string') out.set(path, value);
    else for (const [k, v] of flatten(value, path)) out.set(k, v);
  }
  return out;
}

/** The arguments and rich-text tags a message uses, e.g. ["count", "name", "<link>"]. */
function placeholders(message: string): string[] {
  const found = new Set<string>();
  const walk = (elements: MessageFormatElement[]) => {
    for (const element of elements) {
      if (
        element.type === TYPE.argument ||
        element.type === TYPE.number ||
        element.type === TYPE.date ||
        element.type === TYPE.time
      )
        found.add(element.value);
      if (element.type === TYPE.select || element.type === TYPE.plural) {
        found.add(element.value);
        for (const option of Object.values(element.options)) walk(option.value);
      }
      if (element.type === TYPE.tag) {
        found.add(`<${element.value}>`);
        walk(element.children);
      }
    }
  };
  walk(parse(message));
  return [...found].sort();
}

const flat = Object.fromEntries(LOCALES.map((locale) => [locale, flatten(CATALOGUES[locale])]));

describe('message catalogues', () => {
  it('has a catalogue for every locale the app offers', () => {
    expect(Object.keys(CATALOGUES).sort()).toEqual([...LOCALES].sort());
  });

  it.each(LOCALES.flatMap((a) => LOCALES.filter((b) => b !== a).map((b) => [a, b] as const)))(
    'every key in %s is in %s',
    (a, b) => {
      const missing = [...flat[a].keys()].filter((key) => !flat[b].has(key));
      expect(missing, `keys of ${a} missing in ${b}`).toEqual([]);
    },
  );

  it('uses the same placeholders and tags for a key in every language', () => {
    const differing: string[] = [];
    for (const [key, english] of flat.en) {
      for (const locale of LOCALES) {
        const other = flat[locale].get(key);
        if (other !== undefined && placeholders(other).join() !== placeholders(english).join()) {
          differing.push(`${locale} ${key}: ${placeholders(other).join()} ≠ en ${placeholders(english).join()}`);
        }
      }
    }
    expect(differing).toEqual([]);
  });

  it('parses every message as ICU and leaves none empty', () => {
    for (const locale of LOCALES) {
      for (const [key, message] of flat[locale]) {
        expect(() => parse(message), `${locale} ${key}`).not.toThrow();
        expect(message.trim().length, `${locale} ${key}`).toBeGreaterThan(0);
      }
    }
  });

  it('fails on a missing key and on a dropped placeholder (the checks above can fail)', () => {
    const broken = flatten({ a: { b: 'Deflate after {time}' } } as Tree);
    expect([...flat.en.keys()].filter((key) => !broken.has(key)).length).toBeGreaterThan(0);
    expect(placeholders('Desinflar después')).not.toEqual(placeholders('Deflate after {time}'));
    expect(placeholders('{count, plural, one {# toque} other {# toques}} de {name}')).toEqual(['count', 'name']);
  });
});
