/**
 * Reading a date as typed. A text is read as ISO 8601 (YYYY-MM-DD), as a dotted date day first
 * (14.03.2025, as every locale that writes dots does), or in the browser locale's numeric order
 * (e.g. 14/03/2025 in en-GB, 03/14/2025 in en-US) with a four-digit year; anything
 * else is refused with a message. Nothing is guessed, completed or moved to the nearest allowed day.
 */
import i18next from 'i18next';
import { words } from '@/lib/i18n';

export type DateOrder = 'DMY' | 'MDY' | 'YMD';

export interface LocaleDateFormat {
  order: DateOrder;
  /** How the locale writes it, e.g. "DD/MM/YYYY" or "DD.MM.YYYY". */
  pattern: string;
}

export type TypedDate = { kind: 'empty' } | { kind: 'date'; iso: string } | { kind: 'invalid'; message: string };

const formats = new Map<string, LocaleDateFormat>();

/** The numeric day/month/year order of a locale, read from Intl. */
export function localeDateFormat(locale: string): LocaleDateFormat {
  const known = formats.get(locale);
  if (known) return known;
  const parts = new Intl.DateTimeFormat(locale, { day: '2-digit', month: '2-digit', year: 'numeric', timeZone: 'UTC' }).formatToParts(
    new Date(Date.UTC(2025, 2, 14)),
  );
  const fields = parts.filter((p) => p.type === 'day' || p.type === 'month' || p.type === 'year');
  const order = fields.map((p) => p.type[0].toUpperCase()).join('');
  const pattern = parts
    .map((p) => (p.type === 'day' ? 'DD' : p.type === 'month' ? 'MM' : p.type === 'year' ? 'YYYY' : p.value.replace(/[^./\- ]/g, '')))
    .join('')
    .trim();
  const format: LocaleDateFormat =
    order === 'MDY' || order === 'YMD' ? { order, pattern } : { order: 'DMY', pattern: order === 'DMY' ? pattern : 'DD/MM/YYYY' };
  formats.set(locale, format);
  return format;
}

/**
 * The format the reader types in: German numeric order (DD.MM.YYYY) when the interface is German,
 * else the browser's own locale (14/03/2025 in en-GB, 03/14/2025 in en-US).
 */
export function browserDateFormat(): LocaleDateFormat {
  if (i18next.language === 'de') return localeDateFormat('de-DE');
  return localeDateFormat(typeof navigator === 'undefined' ? 'en-GB' : navigator.language || 'en-GB');
}

/** The locale dates are said in words: the interface language. */
const wordsLocale = (): string => (i18next.language === 'de' ? 'de-DE' : 'en-GB');

/** Years outside this span are almost surely a typing slip (a dropped or extra digit). */
const YEARS = { first: 1900, last: 2199 };

const ISO = /^(\d{4})-(\d{2})-(\d{2})$/;
const NUMERIC = /^(\d{1,4})\s*[./-]\s*(\d{1,2})\s*[./-]\s*(\d{1,4})\.?$/;

export function howToType(format: LocaleDateFormat): string {
  if (format.pattern === 'YYYY-MM-DD') return 'YYYY-MM-DD';
  return words('page.shell.fields.dateOr', {
    pattern: i18next.language === 'de' ? format.pattern.replace('DD', 'TT').replace('YYYY', 'JJJJ') : format.pattern,
  });
}

/** 14 March 2025 written in the format's numeric order, e.g. "14.03.2025" or "03/14/2025". */
export function dateExample(format: LocaleDateFormat): string {
  return format.pattern.replace('DD', '14').replace('MM', '03').replace('YYYY', '2025');
}

/** Reads a typed date; an invalid one carries the message to show next to the field. */
export function readTypedDate(text: string, format: LocaleDateFormat = browserDateFormat()): TypedDate {
  const typed = text.trim();
  if (typed === '') return { kind: 'empty' };
  const how = howToType(format);
  const refuse = (key: string, values: Record<string, unknown> = {}): TypedDate => ({
    kind: 'invalid',
    message: words(`page.shell.fields.${key}`, { ...values, how }),
  });
  let y: string, m: string, d: string;
  const iso = ISO.exec(typed);
  const numeric = NUMERIC.exec(typed);
  if (iso) [, y, m, d] = iso;
  else if (numeric) {
    const [, a, b, c] = numeric;
    // Dots are read as every locale that writes dates with them does (CLDR): day first, or year first
    // when the year leads (14.03.2025, 2025. 03. 14.). Only slashes and hyphens follow the browser's order.
    const order = !typed.includes('.') || /[/-]/.test(typed) ? format.order : a.length === 4 ? 'YMD' : 'DMY';
    if (order === 'YMD') [y, m, d] = [a, b, c];
    else if (order === 'MDY') [m, d, y] = [a, b, c];
    else [d, m, y] = [a, b, c];
  } else return refuse('notADate', { typed });
  if (y.length !== 4 || m.length > 2 || d.length > 2) return refuse('dateDigits');
  const [year, month, day] = [Number(y), Number(m), Number(d)];
  if (year < YEARS.first || year > YEARS.last) return refuse('yearMistyped', { year: y });
  if (month < 1 || month > 12) return refuse('noSuchMonth', { month });
  const date = new Date(Date.UTC(year, month - 1, day));
  if (day < 1 || date.getUTCMonth() !== month - 1) return refuse('noSuchDay', { monthYear: monthYear(year, month), day });
  return { kind: 'date', iso: `${y}-${String(month).padStart(2, '0')}-${String(day).padStart(2, '0')}` };
}

/** "February 2025" / "Februar 2025" in the reader's language. */
function monthYear(year: number, month: number): string {
  return new Intl.DateTimeFormat(wordsLocale(), { month: 'long', year: 'numeric', timeZone: 'UTC' }).format(new Date(Date.UTC(year, month - 1, 1)));
}

/** "14 March 2025" ("14. März 2025" in German): how the field echoes the date it understood. */
export function dateInWords(iso: string): string {
  const [y, m, d] = iso.split('-').map(Number);
  return new Intl.DateTimeFormat(wordsLocale(), { day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' }).format(new Date(Date.UTC(y, m - 1, d)));
}

export interface DateRule {
  /** The message when the field is empty; without it the date is optional. */
  required?: string;
  /** The last allowed date (ISO), e.g. today for something that has happened. */
  latest?: string;
  /** Said when the date is after `latest`; the default names both dates. */
  latestMessage?: string;
  earliest?: string;
  earliestMessage?: string;
}

/** The message for a typed date under a rule, or null when it is accepted as typed. */
export function checkDate(text: string, rule: DateRule = {}, format: LocaleDateFormat = browserDateFormat()): string | null {
  const read = readTypedDate(text, format);
  if (read.kind === 'empty') return rule.required ?? null;
  if (read.kind === 'invalid') return read.message;
  if (rule.latest && read.iso > rule.latest)
    return rule.latestMessage ?? words('page.shell.fields.dateAfterLatest', { date: dateInWords(read.iso), latest: dateInWords(rule.latest) });
  if (rule.earliest && read.iso < rule.earliest)
    return rule.earliestMessage ?? words('page.shell.fields.dateBeforeEarliest', { date: dateInWords(read.iso), earliest: dateInWords(rule.earliest) });
  return null;
}

/** A form validator for a date field. */
export const dateRule =
  (rule: DateRule = {}) =>
  (text: string) =>
    checkDate(text, rule);

/** The ISO date of a checked field for the request, or null when empty. */
export function readDate(text: string): string | null {
  const read = readTypedDate(text);
  return read.kind === 'date' ? read.iso : null;
}

/** Today on this device's calendar, for forms that have no profile zone at hand. */
export function deviceToday(now = new Date()): string {
  return `${now.getFullYear()}-${String(now.getMonth() + 1).padStart(2, '0')}-${String(now.getDate()).padStart(2, '0')}`;
}
