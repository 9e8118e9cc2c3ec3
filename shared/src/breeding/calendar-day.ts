import dayjs from 'dayjs';
import timezone from 'dayjs/plugin/timezone.js';
import utc from 'dayjs/plugin/utc.js';

dayjs.extend(utc);
dayjs.extend(timezone);

/** A calendar date without time, ISO 8601 `YYYY-MM-DD`. */
export type CalendarDate = string;

const DATE_PATTERN = /^\d{4}-\d{2}-\d{2}$/;
const DAY_MS = 86_400_000;

/** True when `value` is a real `YYYY-MM-DD` date (2023-02-29 is not, nor is year 0, which PostgreSQL does not have). */
export function isCalendarDate(value: string): boolean {
  if (!DATE_PATTERN.test(value) || value.startsWith('0000')) return false;
  // dayjs rolls 02-30 over into March, so a round trip tells a real date from a rolled one.
  return dayjs.utc(value).format('YYYY-MM-DD') === value;
}

/** Throws a RangeError a person can read when `value` is not a real calendar date. */
export function assertCalendarDate(value: string, what = 'date'): void {
  if (!isCalendarDate(value)) {
    throw new RangeError(`The ${what} "${value}" is not a calendar date in the form YYYY-MM-DD.`);
  }
}

/** The calendar date a viewer in the IANA zone `timeZone` sees at the instant `now`. */
export function todayIn(timeZone: string, now: Date): CalendarDate {
  if (Number.isNaN(now.getTime())) throw new RangeError('The current time is not a valid instant.');
  try {
    return dayjs(now).tz(timeZone).format('YYYY-MM-DD');
  } catch {
    throw new RangeError(`"${timeZone}" is not a time zone name this system knows (e.g. "Europe/Berlin").`);
  }
}

/** `date` moved by `n` whole days (n may be negative). Works on the UTC calendar, so no DST shifts. */
export function addDays(date: CalendarDate, n: number): CalendarDate {
  assertCalendarDate(date);
  if (!Number.isInteger(n)) throw new RangeError(`A number of days must be a whole number, not ${n}.`);
  return dayjs.utc(date).add(n, 'day').format('YYYY-MM-DD');
}

/** Whole days from `a` to `b` (positive when `b` is later). */
export function diffDays(a: CalendarDate, b: CalendarDate): number {
  assertCalendarDate(a);
  assertCalendarDate(b);
  return Math.round((dayjs.utc(b).valueOf() - dayjs.utc(a).valueOf()) / DAY_MS);
}

/** Day N of a sac: the lay date is day 0, the next day day 1; negative before the lay date. */
export function dayNumber(layDate: CalendarDate, today: CalendarDate): number {
  return diffDays(layDate, today);
}
