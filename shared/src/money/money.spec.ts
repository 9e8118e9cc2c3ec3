import { describe, expect, it } from 'vitest';
import { formatMoney, formatMoneyCode, minorDigits, minorToMajor, parseMoney, toMinor } from './money.js';
import { wordsFor } from '../i18n/words.js';

// ISO 4217 (list one, "minor unit" column; values from memory of the published list):
// JPY 0, EUR 2, USD 2, CHF 2, KWD 3.
const ISO_4217_MINOR_UNIT = { JPY: 0, EUR: 2, USD: 2, CHF: 2, KWD: 3 } as const;
const CURRENCIES = Object.keys(ISO_4217_MINOR_UNIT) as (keyof typeof ISO_4217_MINOR_UNIT)[];

describe('minor units', () => {
  it.each(CURRENCIES)('%s has the ISO 4217 minor unit, as Intl.NumberFormat resolves it', (currency) => {
    const intl = new Intl.NumberFormat('en', { style: 'currency', currency }).resolvedOptions().maximumFractionDigits;
    expect(minorDigits(currency)).toBe(ISO_4217_MINOR_UNIT[currency]);
    expect(minorDigits(currency)).toBe(intl);
  });

  it('refuses a malformed currency code (Intl.NumberFormat throws a RangeError)', () => {
    expect(() => minorDigits('EURO')).toThrow(RangeError);
  });
});

describe('formatting', () => {
  // The reference: Intl.NumberFormat itself, fed the major amount written out by hand from the ISO 4217 minor unit.
  it.each([
    ['JPY', 123456, 123456],
    ['EUR', 123456, 1234.56],
    ['USD', 123456, 1234.56],
    ['CHF', 123456, 1234.56],
    ['KWD', 123456, 123.456],
  ] as const)('%s %d minor units read as Intl.NumberFormat writes %d', (currency, minor, major) => {
    for (const locale of ['en-GB', 'de-DE', 'ja-JP']) {
      expect(formatMoney(minor, currency, locale)).toBe(new Intl.NumberFormat(locale, { style: 'currency', currency }).format(major));
    }
  });

  it('writes the code and the plain amount for statement files', () => {
    expect(formatMoneyCode(1450, 'EUR')).toBe('EUR 14.50');
    expect(formatMoneyCode(-5, 'EUR')).toBe('EUR -0.05');
    expect(formatMoneyCode(0, 'EUR')).toBe('EUR 0.00');
    expect(formatMoneyCode(1450, 'JPY')).toBe('JPY 1450');
    expect(formatMoneyCode(1450, 'KWD')).toBe('KWD 1.450');
    expect(formatMoneyCode(7, 'KWD')).toBe('KWD 0.007');
    expect(formatMoneyCode(-123456, 'CHF')).toBe('CHF -1234.56');
  });

  it('gives a number field its start value in major units', () => {
    expect([minorToMajor(1250, 'EUR'), minorToMajor(1250, 'JPY'), minorToMajor(1250, 'KWD')]).toEqual([12.5, 1250, 1.25]);
  });
});

describe('typed amounts', () => {
  it.each([
    ['12.5', 'EUR', 1250],
    ['12,50', 'EUR', 1250],
    ['0.07', 'USD', 7],
    ['1250', 'JPY', 1250],
    ['1.250', 'KWD', 1250],
    ['0.001', 'KWD', 1],
    ['19.95', 'CHF', 1995],
    [' 3 ', 'EUR', 300],
    ['-4.2', 'EUR', -420],
    ['12.', 'EUR', 1200],
  ] as const)('"%s" %s is kept exactly as %d minor units', (typed, currency, minor) => {
    expect(parseMoney(typed, currency)).toEqual({ ok: true, minor });
  });

  it('takes a number from a number field the same way', () => {
    expect(parseMoney(12.5, 'EUR')).toEqual({ ok: true, minor: 1250 });
    expect(parseMoney(0.1 + 0.2, 'EUR')).toMatchObject({ ok: false }); // 0.30000000000000004: refused, not rounded
  });

  // The refusal names its catalogue sentence and values; `message` is that sentence in English.
  const refusal = (key: string, values: Record<string, string | number>, message: string) => ({ ok: false, key: `rule.money.${key}`, values, message });

  it('refuses more decimals than the currency has instead of rounding', () => {
    expect(parseMoney('12.345', 'EUR')).toEqual(refusal('decimals', { currency: 'EUR', count: 2 }, 'EUR has 2 decimal places; give at most 2.'));
    expect(parseMoney('5.5', 'JPY')).toEqual(refusal('wholeOnly', { currency: 'JPY' }, 'JPY has no smaller unit; give a whole amount.'));
    expect(parseMoney('1.2345', 'KWD')).toEqual(refusal('decimals', { currency: 'KWD', count: 3 }, 'KWD has 3 decimal places; give at most 3.'));
  });

  it("refuses what is not a plain number, with an example in the currency's own digits", () => {
    expect(parseMoney('', 'EUR')).toEqual(refusal('required', {}, 'Give an amount.'));
    expect(parseMoney('1,234.50', 'EUR')).toEqual(refusal('notNumber', { example: 12.5 }, 'Give the amount as a plain number, such as 12.5.'));
    expect(parseMoney('twelve', 'JPY')).toEqual(refusal('notNumber', { example: 1250 }, 'Give the amount as a plain number, such as 1250.'));
    expect(parseMoney('1e3', 'EUR')).toMatchObject({ ok: false, key: 'rule.money.notNumber' });
    expect(parseMoney('99999999999999999', 'EUR')).toEqual(refusal('tooLarge', {}, 'That amount is too large.'));
  });

  it('is said in German from the same key and values, with the decimal comma (Duden: Komma als Dezimalzeichen)', () => {
    const de = wordsFor('de');
    const said = (typed: string, currency: string) => {
      const r = parseMoney(typed, currency);
      return r.ok ? null : de(r.key, r.values);
    };
    expect(said('12.345', 'EUR')).toBe('EUR hat 2 Nachkommastellen; gib höchstens 2 an.');
    expect(said('abc', 'EUR')).toBe('Gib den Betrag als einfache Zahl an, etwa 12,5.');
    expect(said('abc', 'JPY')).toBe('Gib den Betrag als einfache Zahl an, etwa 1250.');
  });

  it('converts a validated amount for sending, and throws rather than send a refused one', () => {
    expect(toMinor('12.34', 'EUR')).toBe(1234);
    expect(() => toMinor('12.345', 'EUR')).toThrow('EUR has 2 decimal places; give at most 2.');
  });
});
