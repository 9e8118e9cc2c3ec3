import { celsiusToFahrenheit, type Language, type TemperatureUnit } from '@broodsilk/shared';

/** Whom a reminder's words are for: the zone its times are shown in, its language and temperature unit. */
export interface ReminderReader {
  timeZone: string;
  language: Language;
  temperatureUnit: TemperatureUnit;
}

/** Day-month-year with a 24-hour clock in English, the German forms in German (as the client's lib/dates.ts). */
const LOCALE: Record<Language, string> = { en: 'en-GB', de: 'de-DE' };

/** How one reader is shown dates, instants and readings. Calendar dates (YYYY-MM-DD) are read in UTC, so no zone moves them. */
export function reminderFormats(r: ReminderReader) {
  const locale = LOCALE[r.language];
  const number = (value: number, decimals: { min: number; max: number }) =>
    new Intl.NumberFormat(locale, { minimumFractionDigits: decimals.min, maximumFractionDigits: decimals.max }).format(value);
  const calendar = (date: string | number, options: Intl.DateTimeFormatOptions) =>
    new Intl.DateTimeFormat(locale, { timeZone: 'UTC', ...options }).format(new Date(`${date}T00:00:00Z`));
  return {
    /** An instant in the reader's zone, naming the zone: "3 Dec 2026, 14:05 (Europe/Berlin)". */
    instant: (iso: string | number | Date): string => {
      const text = new Intl.DateTimeFormat(locale, { timeZone: r.timeZone, dateStyle: 'medium', timeStyle: 'short', hourCycle: 'h23' }).format(new Date(iso));
      return `${text} (${r.timeZone})`;
    },
    /** A day in words: "Thursday, 3 December 2026". */
    day: (date: string | number): string => calendar(date, { weekday: 'long', day: 'numeric', month: 'long', year: 'numeric' }),
    /** A day in short: "3 Dec 2026". */
    date: (date: string | number): string => calendar(date, { dateStyle: 'medium' }),
    /** A stored °C value in the reader's unit, one decimal: "26.5 °C", "26,5 °C", "79.7 °F". */
    temperature: (celsius: number): string =>
      `${number(r.temperatureUnit === 'F' ? celsiusToFahrenheit(celsius) : celsius, { min: 1, max: 1 })} °${r.temperatureUnit}`,
    /** A relative humidity as it was logged (no rounding): "78 %", "78,5 %". */
    percent: (value: number): string => `${number(value, { min: 0, max: 20 })} %`,
  };
}

export type ReminderFormats = ReturnType<typeof reminderFormats>;
