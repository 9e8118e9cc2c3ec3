import { isCalendarDate } from '../breeding/calendar-day.js';

/** An instant as the API takes it: RFC 3339 date-time, always with its offset (`Z` or `±hh:mm`); seconds optional. */
export type InstantString = string;

// RFC 3339 §5.6 date-time, except that seconds may be left out (ISO 8601 reduced precision).
const INSTANT = /^(\d{4}-\d{2}-\d{2})T(\d{2}):(\d{2})(?::(\d{2})(?:\.\d{1,9})?)?(?:Z|[+-](\d{2}):(\d{2}))$/i;

/**
 * True when `value` names one real instant. JavaScript's Date rolls 2026-02-30 into March and
 * T24:00 into the next day; those are refused here, as are leap seconds (a Date cannot hold
 * them), year 0 (PostgreSQL has none) and local times without an offset.
 */
export function isInstant(value: unknown): value is InstantString {
  if (typeof value !== 'string') return false;
  const m = INSTANT.exec(value);
  if (!m) return false;
  const [, date, hour, minute, second = '00', offHour = '00', offMinute = '00'] = m;
  if (!isCalendarDate(date)) return false;
  return Number(hour) <= 23 && Number(minute) <= 59 && Number(second) <= 59 && Number(offHour) <= 23 && Number(offMinute) <= 59;
}
