import dayjs from 'dayjs';
import i18next from 'i18next';
import utc from 'dayjs/plugin/utc';
import timezone from 'dayjs/plugin/timezone';
import relativeTime from 'dayjs/plugin/relativeTime';

// dayjs plugins are set once, here.
dayjs.extend(utc);
dayjs.extend(timezone);
dayjs.extend(relativeTime);

/** The reader's locale for dates: day-month-year with a 24-hour clock in English, the German form in German. */
const dateLocale = (): string => (i18next.language === 'de' ? 'de-DE' : 'en-GB');

/** An instant in the viewer's zone, e.g. "Tue 1 Dec 2026, 20:15". */
export function formatInstant(iso: string, timeZone: string): string {
  return new Intl.DateTimeFormat(dateLocale(), {
    timeZone,
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
  }).format(new Date(iso));
}

/** A calendar date (YYYY-MM-DD), shown without shifting zones. */
export function formatDate(date: string): string {
  const [y, m, d] = date.split('-').map(Number);
  return new Intl.DateTimeFormat(dateLocale(), { timeZone: 'UTC', day: 'numeric', month: 'short', year: 'numeric' }).format(new Date(Date.UTC(y, m - 1, d)));
}

export { dayjs };

/** A stored sentence (an activity summary) with its ISO 8601 calendar dates shown in the interface's one date format. */
export function withReadableDates(text: string): string {
  return text.replace(/\b(\d{4})-(\d{2})-(\d{2})\b/g, (iso) => formatDate(iso));
}
