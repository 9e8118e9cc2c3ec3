import { describe, expect, it } from 'vitest';
import { createWords, LANGUAGES, wordsOf } from './words.js';
import { refusalsDe, refusalsEn } from './refusals.js';

/** One sample for every value a `rule.*` sentence takes; a sentence naming any other value fails below. */
const SAMPLES: Record<string, string | number> = {
  example: 12.5,
  currency: 'EUR',
  accountCurrency: 'CHF',
  layDate: '2026-03-01',
  paired: '2026-01-10',
  minDays: 120,
  days: 400,
  on: '2026-03-08',
  matured: '2026-03-02',
  female: 'MO-7',
  project: 'Spring pairing',
  previous: 220,
  alive: 240,
  joined: 40,
  ceiling: 260,
  total: 601,
  min: 100,
  max: 600,
  excess: 2,
  available: 3,
  share: 23,
  handedOver: 20,
  sold: 0,
  cashedOut: 0,
  counted: 2,
  lo: 24,
  hi: 28,
  value: 80,
  fromDay: 21,
  toDay: 45,
  count: 5, // plural sentences are said with 1 and 5 below
};

/** Every leaf of a section as [key path, text]. */
const leaves = (o: object, at = 'rule.'): [string, string][] =>
  Object.entries(o).flatMap(([k, v]) => (typeof v === 'string' ? [[`${at}${k}`, v] as [string, string]] : leaves(v as object, `${at}${k}.`)));

/** The value names a sentence interpolates (`{{name}}` or `{{name, format}}`). */
const placeholders = (text: string) => [...text.matchAll(/\{\{\s*(\w+)/g)].map((m) => m[1]!).sort();

describe('the rule sentences (catalogue section `rule`)', () => {
  const en = new Map(leaves(refusalsEn));
  const de = new Map(leaves(refusalsDe));

  it('takes the same values in German as in English, and only values the samples know', () => {
    for (const [key, text] of en) {
      expect(placeholders(de.get(key)!), key).toEqual(placeholders(text));
      for (const name of placeholders(text)) expect(SAMPLES, `${key}: {{${name}}}`).toHaveProperty(name);
    }
  });

  for (const lng of LANGUAGES) {
    const t = wordsOf(createWords(lng, { fallback: false }));
    it(`says every sentence in ${lng} with its values filled in, never a key path or a placeholder`, () => {
      // plural pairs are asked for by their base key with a count, as the rules do
      const keys = new Set([...en.keys()].map((k) => k.replace(/_(one|other)$/, '')));
      for (const key of keys) {
        for (const count of [1, 5]) {
          const text = t(key, { ...SAMPLES, count });
          expect(text, key).not.toMatch(/\{\{|\}\}|rule\./);
          expect(text.length, key).toBeGreaterThan(10);
          for (const name of placeholders(en.get(key) ?? en.get(`${key}_other`)!)) {
            if (typeof SAMPLES[name] === 'string') expect(text, `${key} shows ${name}`).toContain(SAMPLES[name]);
          }
        }
      }
    });
  }

  it('writes the example amount in the reader’s decimal mark (Intl.NumberFormat, CLDR: en "." and de ",")', () => {
    const say = (lng: 'en' | 'de') => wordsOf(createWords(lng))('rule.money.notNumber', { example: 12.5 });
    expect(say('en')).toContain('such as 12.5.');
    expect(say('de')).toContain('etwa 12,5.');
    expect(wordsOf(createWords('en'))('rule.money.notNumber', { example: 1250 })).toContain('such as 1250.'); // no grouping comma
  });

  it('picks the plural by Intl.PluralRules: 1 decimal place / 2 decimal places, 1 Nachkommastelle / 3 Nachkommastellen', () => {
    expect(wordsOf(createWords('en'))('rule.money.decimals', { currency: 'X', count: 1 })).toBe('X has 1 decimal place; give at most 1.');
    expect(wordsOf(createWords('de'))('rule.money.decimals', { currency: 'KWD', count: 3 })).toBe('KWD hat 3 Nachkommastellen; gib höchstens 3 an.');
  });
});
