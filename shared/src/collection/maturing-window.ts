import dayjs from 'dayjs';
import utc from 'dayjs/plugin/utc.js';
import { assertCalendarDate, type CalendarDate } from '../breeding/calendar-day.js';

dayjs.extend(utc);

/**
 * Typical months from a penultimate male's last molt to his maturing molt. From memory: keepers
 * expect the last molt of a subadult male some 3 to 8 months after the one before; slow New World
 * terrestrials sit at the long end, fast Old World species at the short end. An editable default.
 */
export interface MonthInterval {
  min: number;
  max: number;
}

export const PENULTIMATE_INTERVAL_MONTHS: Readonly<MonthInterval> = Object.freeze({ min: 3, max: 8 });

/**
 * - `not-yet`: before the window opens.
 * - `due`: inside the window (both ends included).
 * - `overdue`: after the window; he may be late, or the molt was missed.
 */
export type MaturingWindowState = 'not-yet' | 'due' | 'overdue';

export interface MaturingWindow {
  /** The molt the window counts from. */
  lastMoltOn: CalendarDate;
  from: CalendarDate;
  to: CalendarDate;
  state: MaturingWindowState;
  /** Where the interval comes from, said once for the interface. */
  source: 'from memory';
}

/** Calendar months as dayjs counts them: Jan 31 + 1 month = the last day of February. */
const addMonths = (date: CalendarDate, months: number): CalendarDate => dayjs.utc(date).add(months, 'month').format('YYYY-MM-DD');

/** When a penultimate male's maturing molt is expected, counted from his last molt. */
export function maturingWindow(lastMoltOn: CalendarDate, today: CalendarDate, interval: Readonly<MonthInterval> = PENULTIMATE_INTERVAL_MONTHS): MaturingWindow {
  assertCalendarDate(lastMoltOn, 'last molt date');
  assertCalendarDate(today, 'date today');
  const from = addMonths(lastMoltOn, interval.min);
  const to = addMonths(lastMoltOn, interval.max);
  const state: MaturingWindowState = today < from ? 'not-yet' : today > to ? 'overdue' : 'due';
  return { lastMoltOn, from, to, state, source: 'from memory' };
}
