import { describe, expect, it } from 'vitest';
import { LANGUAGES, wordsOf } from './words.js';
import { createServerWords } from './server-catalogue.js';
import { serverRefusalsDe, serverRefusalsEn } from './server-refusals.js';
import { refusalsEn } from './refusals.js';

/** Every leaf of the `refusal` section as [key path, English text]; plural forms stay separate keys. */
function leaves(node: object, prefix = 'refusal'): [string, string][] {
  return Object.entries(node).flatMap(([k, v]) =>
    typeof v === 'string' ? [[`${prefix}.${k}`, v] as [string, string]] : leaves(v as object, `${prefix}.${k}`),
  );
}
const PLURAL = /_(one|other)$/;
const placeholders = (text: string) => [...text.matchAll(/\{\{(\w+)\}\}/g)].map((m) => m[1]!).sort();

/** Values as the request checks (`refusal.dto.*`) pass them: a limit, a field's name, the codes a field allows. */
const SAMPLES: Record<string, string | number> = {
  max: 5000,
  min: 1,
  field: 'arrivedAlive',
  allowed: 'female, male, unsexed',
  kinds: 'roll-due, male-clock',
  channels: 'email, off',
};

/** A sentence with the rule sentences it nests (`$t(rule.withdrawal.excess)`) written out, so their values get samples too. */
const withNested = (text: string) =>
  text.replace(
    /\$t\(rule\.([\w.]+)\)/g,
    (_, path: string) => path.split('.').reduce<unknown>((o, k) => (o as Record<string, unknown>)[k], refusalsEn) as string,
  );

/** A sample value per placeholder: a count picks the plural form its key names, a known name its sample, anything else a marked word. */
function sampleValues(key: string, text: string): Record<string, string | number> {
  const count = key.endsWith('_one') ? 1 : 2;
  const values = Object.fromEntries(placeholders(withNested(text)).map((p) => [p, p === 'count' || p === 'minutes' ? count : (SAMPLES[p] ?? `‹${p}›`)]));
  // i18next picks a plural form by `count` (Intl.PluralRules), whether or not the sentence shows it.
  return PLURAL.test(key) ? { ...values, count } : values;
}

const ALL = leaves(serverRefusalsEn);

describe('the server’s refusals in every language', () => {
  it('has refusals to check (a broken walk would pass vacuously)', () => {
    expect(ALL.length).toBeGreaterThan(150);
  });

  for (const lng of LANGUAGES) {
    // No fallback: a German sentence missing from the catalogue must fail here, not come out in English.
    const t = wordsOf(createServerWords(lng, { fallback: false }));
    it(`${lng}: every refusal renders with its values: no placeholder, key path or empty text left`, () => {
      for (const [key, english] of ALL) {
        const values = sampleValues(key, english);
        const said = t(key.replace(PLURAL, ''), values);
        expect(said.trim(), key).not.toBe('');
        expect(said, key).not.toMatch(/\{\{|\}\}|\$t\(|\brefusal\./);
        expect(said, key).not.toBe(key.replace(PLURAL, ''));
        for (const [name, value] of Object.entries(values)) if (name !== 'count') expect(said, `${key} keeps {{${name}}}`).toContain(String(value));
      }
    });
  }

  it('de: every request-check sentence (refusal.dto) is German, not a copied English one', () => {
    const german = new Map(leaves(serverRefusalsDe));
    const dto = ALL.filter(([key]) => key.startsWith('refusal.dto.'));
    expect(dto.length).toBeGreaterThan(100);
    for (const [key, english] of dto) expect(german.get(key), key).not.toBe(english);
  });

  it('de: each sentence uses exactly the values its English sentence uses', () => {
    const german = new Map(leaves(serverRefusalsDe));
    for (const [key, english] of ALL) expect(placeholders(german.get(key) ?? ''), key).toEqual(placeholders(english));
  });
});
