import { afterEach, describe, expect, it } from 'vitest';
import { i18next } from './i18n';
import { formatNumber, formatPercent, formatTemperature } from './numbers';

// Reference: Intl.NumberFormat (ECMA-402) with CLDR data for en-GB and de-DE; °F = °C × 9/5 + 32 (NIST SP 811, B.9).
const ref = (locale: string, value: number, digits: number) =>
  new Intl.NumberFormat(locale, { minimumFractionDigits: digits, maximumFractionDigits: digits }).format(value);

describe('numbers in the reader’s language', () => {
  afterEach(async () => {
    await i18next.changeLanguage('en');
  });

  it('writes a decimal point in English and a decimal comma in German', async () => {
    await i18next.changeLanguage('en');
    expect(formatNumber(26.5, 1)).toBe(ref('en-GB', 26.5, 1));
    expect(formatNumber(26.5, 1)).toBe('26.5');
    expect(formatNumber(1234.5)).toBe(new Intl.NumberFormat('en-GB', { maximumFractionDigits: 20 }).format(1234.5));
    await i18next.changeLanguage('de');
    expect(formatNumber(26.5, 1)).toBe(ref('de-DE', 26.5, 1));
    expect(formatNumber(26.5, 1)).toBe('26,5');
    expect(formatNumber(1234.5)).toBe(new Intl.NumberFormat('de-DE', { maximumFractionDigits: 20 }).format(1234.5));
  });

  it('shows a stored °C temperature in the reader’s unit and language', async () => {
    await i18next.changeLanguage('de');
    expect(formatTemperature(26.5, 'C')).toBe(`${ref('de-DE', 26.5, 1)} °C`);
    expect(formatTemperature(26.5, 'C')).toBe('26,5 °C');
    // 26.5 °C × 9/5 + 32 = 79.7 °F
    expect(formatTemperature(26.5, 'F')).toBe(`${ref('de-DE', 79.7, 1)} °F`);
    await i18next.changeLanguage('en');
    expect(formatTemperature(26.5, 'C')).toBe('26.5 °C');
    expect(formatTemperature(26.5, 'F')).toBe(`${ref('en-GB', 79.7, 1)} °F`);
    expect(formatTemperature(26, 'C')).toBe('26.0 °C');
  });

  it('keeps a percentage as stored, with the reader’s decimal mark', async () => {
    await i18next.changeLanguage('de');
    expect(formatPercent(78.5)).toBe('78,5 %');
    await i18next.changeLanguage('en');
    expect(formatPercent(78)).toBe('78 %');
  });
});
