/** A calendar date without time, ISO 8601 `YYYY-MM-DD`. */
export type CalendarDate = string;

const DATE_PATTERN = /^\d{4}-\d{2}-\d{2}$/;
const DAY_MS = 86_400_000;

// Plain `Date` arithmetic on UTC midnights: these run for every sac of every list (and for every
// reminder the planner weighs), where a date library's parse-and-format cost dominated the profile.
const utcMidnight = (date: CalendarDate): number => Date.parse(`${date}T00:00:00Z`);
const isoDay = (ms: number): CalendarDate => new Date(ms).toISOString().slice(0, 10);

/** True when `value` is a real `YYYY-MM-DD` date (2023-02-29 is not, nor is year 0, which PostgreSQL does not have). */
export function isCalendarDate(value: string): boolean {
  if (!DATE_PATTERN.test(value) || value.startsWith('0000')) return false;
  // `Date` rolls 02-30 over into March, so a round trip tells a real date from a rolled one.
  const ms = utcMidnight(value);
  return !Number.isNaN(ms) && isoDay(ms) === value;
}

/** Throws a RangeError a person can read when `value` is not a real calendar date. */
export function assertCalendarDate(value: string, what = 'date'): void {
  if (!isCalendarDate(value)) {
    throw new RangeError(`The ${what} "${value}" is not a calendar date in the form YYYY-MM-DD.`);
  }
}

/** One formatter per time zone: building an `Intl.DateTimeFormat` costs far more than using one. */
const dayFormats = new Map<string, Intl.DateTimeFormat>();
function dayFormatIn(timeZone: string): Intl.DateTimeFormat {
  let f = dayFormats.get(timeZone);
  if (!f) {
    try {
      f = new Intl.DateTimeFormat('en-US', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit', calendar: 'iso8601', numberingSystem: 'latn' });
    } catch {
      throw new RangeError(`"${timeZone}" is not a time zone name this system knows (e.g. "Europe/Berlin").`);
    }
    dayFormats.set(timeZone, f);
  }
  return f;
}

/** The calendar date a viewer in the IANA zone `timeZone` sees at the instant `now`. */
export function todayIn(timeZone: string, now: Date): CalendarDate {
  if (Number.isNaN(now.getTime())) throw new RangeError('The current time is not a valid instant.');
  const parts = dayFormatIn(timeZone).formatToParts(now);
  const part = (type: Intl.DateTimeFormatPartTypes) => parts.find((p) => p.type === type)!.value;
  return `${part('year').padStart(4, '0')}-${part('month')}-${part('day')}`;
}

/** `date` moved by `n` whole days (n may be negative). Works on the UTC calendar, so no DST shifts. */
export function addDays(date: CalendarDate, n: number): CalendarDate {
  assertCalendarDate(date);
  if (!Number.isInteger(n)) throw new RangeError(`A number of days must be a whole number, not ${n}.`);
  return isoDay(utcMidnight(date) + n * DAY_MS);
}

/** Whole days from `a` to `b` (positive when `b` is later). */
export function diffDays(a: CalendarDate, b: CalendarDate): number {
  assertCalendarDate(a);
  assertCalendarDate(b);
  return Math.round((utcMidnight(b) - utcMidnight(a)) / DAY_MS);
}

/** Day N of a sac: the lay date is day 0, the next day day 1; negative before the lay date. */
export function dayNumber(layDate: CalendarDate, today: CalendarDate): number {
  return diffDays(layDate, today);
}
