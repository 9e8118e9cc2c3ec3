import dayjs from 'dayjs';
import customParseFormat from 'dayjs/plugin/customParseFormat';
import { afterEach, describe, expect, it } from 'vitest';
import { browserDateFormat, checkDate, dateInWords, localeDateFormat, readTypedDate } from './typed-date';
import { i18next } from '@/lib/i18n';

dayjs.extend(customParseFormat);

const GB = localeDateFormat('en-GB');
const US = localeDateFormat('en-US');
const DE = localeDateFormat('de-DE');

describe('localeDateFormat', () => {
  // CLDR date patterns (as shipped in Intl): en-GB dd/MM/y, en-US M/d/y, de dd.MM.y.
  it('reads the numeric order from the locale', () => {
    expect(GB).toEqual({ order: 'DMY', pattern: 'DD/MM/YYYY' });
    expect(US).toEqual({ order: 'MDY', pattern: 'MM/DD/YYYY' });
    expect(DE).toEqual({ order: 'DMY', pattern: 'DD.MM.YYYY' });
  });
});

describe('readTypedDate', () => {
  it('keeps an ISO 8601 calendar date exactly as meant, even far from today', () => {
    // ISO 8601-1:2019 §5.2.2.1 extended calendar date format YYYY-MM-DD.
    expect(readTypedDate('2031-05-05', GB)).toEqual({ kind: 'date', iso: '2031-05-05' });
    expect(readTypedDate('2025-03-14', US)).toEqual({ kind: 'date', iso: '2025-03-14' });
  });

  it('reads the locale order and agrees with dayjs strict parsing of the same pattern', () => {
    // Reference: dayjs customParseFormat in strict mode.
    const cases: [string, typeof GB, string][] = [
      ['14/03/2025', GB, 'DD/MM/YYYY'],
      ['03/14/2025', US, 'MM/DD/YYYY'],
      ['14.03.2025', DE, 'DD.MM.YYYY'],
      ['29/02/2024', GB, 'DD/MM/YYYY'],
    ];
    for (const [text, format, pattern] of cases) {
      const reference = dayjs(text, pattern, true);
      expect(reference.isValid()).toBe(true);
      expect(readTypedDate(text, format)).toEqual({ kind: 'date', iso: reference.format('YYYY-MM-DD') });
    }
  });

  it('refuses dates that do not exist instead of rolling them over (dayjs strict agrees)', () => {
    for (const [text, pattern] of [
      ['29/02/2025', 'DD/MM/YYYY'],
      ['31/04/2025', 'DD/MM/YYYY'],
    ]) {
      expect(dayjs(text, pattern, true).isValid()).toBe(false);
      const read = readTypedDate(text, GB);
      expect(read.kind).toBe('invalid');
    }
    expect(readTypedDate('2025-13-01', GB)).toMatchObject({ kind: 'invalid', message: expect.stringContaining('no month 13') });
  });

  it('refuses a day-first date in a month-first locale rather than guessing', () => {
    expect(readTypedDate('14/03/2025', US)).toMatchObject({ kind: 'invalid', message: expect.stringContaining('no month 14') });
  });

  it('reads a dotted date as the locales that write dots do, whatever the browser locale', () => {
    // Reference: CLDR numeric date patterns as shipped in Intl. Every locale here writes 14 March 2025
    // with dots, day first (or year first in Hungarian); a US browser reads each the same way.
    for (const locale of ['de-DE', 'ru-RU', 'pl-PL', 'fi-FI', 'nb-NO', 'tr-TR', 'cs-CZ', 'hu-HU']) {
      const written = new Intl.DateTimeFormat(locale, { day: '2-digit', month: '2-digit', year: 'numeric', timeZone: 'UTC' }).format(
        new Date(Date.UTC(2025, 2, 14)),
      );
      expect(written).toContain('.');
      for (const format of [US, GB]) expect(readTypedDate(written, format)).toEqual({ kind: 'date', iso: '2025-03-14' });
    }
    // A day that does not exist is still refused, in the dotted order's own words.
    expect(readTypedDate('31.02.2025', US)).toMatchObject({ kind: 'invalid', message: expect.stringContaining('February 2025') });
  });

  it('refuses two-digit years, mistyped years and words with a message saying how to type it', () => {
    expect(readTypedDate('14/03/25', GB)).toMatchObject({ kind: 'invalid', message: expect.stringContaining('four digits') });
    expect(readTypedDate('0203-01-01', GB)).toMatchObject({ kind: 'invalid', message: expect.stringContaining('0203 looks mistyped') });
    expect(readTypedDate('yesterday', GB)).toMatchObject({ kind: 'invalid', message: expect.stringContaining('YYYY-MM-DD or DD/MM/YYYY') });
  });

  it('treats blank as empty', () => {
    expect(readTypedDate('  ', GB)).toEqual({ kind: 'empty' });
  });
});

describe('checkDate', () => {
  it('refuses a future date with a message instead of moving it to today', () => {
    expect(checkDate('2031-05-05', { latest: '2026-12-02' }, GB)).toBe('5 May 2031 is after 2 December 2026, the latest date this can be.');
    expect(checkDate('2026-12-02', { latest: '2026-12-02' }, GB)).toBeNull();
  });

  it('asks for a required date and lets an optional one be empty', () => {
    expect(checkDate('', { required: 'Give the date of the molt.' }, GB)).toBe('Give the date of the molt.');
    expect(checkDate('', {}, GB)).toBeNull();
  });
});

it('dateInWords says the day in words', () => {
  expect(dateInWords('2025-03-14')).toBe('14 March 2025');
});

describe('a German reader', () => {
  afterEach(async () => {
    await i18next.changeLanguage('en');
  });

  it('types dates in German order (DD.MM.YYYY) and hears them in German words', async () => {
    // German numeric order DD.MM.YYYY (DIN 5008, CLDR de dd.MM.y); reference parse: dayjs strict with the same pattern.
    await i18next.changeLanguage('de');
    expect(browserDateFormat()).toEqual({ order: 'DMY', pattern: 'DD.MM.YYYY' });
    expect(readTypedDate('14.03.2025')).toEqual({ kind: 'date', iso: dayjs('14.03.2025', 'DD.MM.YYYY', true).format('YYYY-MM-DD') });
    expect(readTypedDate('14.03.2025')).toEqual({ kind: 'date', iso: '2025-03-14' });
    expect(dateInWords('2025-03-14')).toBe('14. März 2025');
    expect(readTypedDate('2025-13-01')).toMatchObject({ kind: 'invalid', message: 'Einen Monat 13 gibt es nicht. Gib es als JJJJ-MM-TT oder TT.MM.JJJJ ein.' });
    expect(readTypedDate('30.02.2025')).toMatchObject({ kind: 'invalid', message: expect.stringContaining('Februar 2025 hat keinen 30. Tag.') });
  });
});
