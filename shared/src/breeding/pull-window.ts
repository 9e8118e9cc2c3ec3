import { addDays, dayNumber, type CalendarDate } from './calendar-day.js';
import { ruleText, type RuleText } from '../errors/rule-text.js';

/** Days after the lay date (day 0) in which a sac should be pulled; both ends inclusive. */
export interface PullWindow {
  fromDay: number;
  toDay: number;
}

/** Used where a species has no window of its own: day 21 to day 45 (common practice). */
export const DEFAULT_PULL_WINDOW: Readonly<PullWindow> = Object.freeze({ fromDay: 21, toDay: 45 });

/** "Closing" is the window's last 3 days, the close day included. */
export const CLOSING_DAYS = 3;

export type PullWindowState = 'not-yet' | 'open' | 'closing' | 'past';

export interface PullWindowDates {
  opensOn: CalendarDate;
  closesOn: CalendarDate;
  /** First day of the closing stretch (never before `opensOn` for windows shorter than 3 days). */
  closingFrom: CalendarDate;
}

/** Everything a sac card shows about its pull window on one viewer's day. */
export interface PullWindowView extends PullWindowDates {
  dayNumber: number;
  state: PullWindowState;
  /** Days until the window opens; 0 once it is open or past. */
  daysUntilOpens: number;
  /** Days until the close day (0 on the close day itself); null once the window is past. */
  daysUntilCloses: number | null;
  /** Days since the close day; 0 until then. */
  daysPastClose: number;
}

/** Why a window is not usable (a keyed sentence), or null when it is. */
export function pullWindowProblem(window: PullWindow): RuleText | null {
  const { fromDay, toDay } = window;
  if (!Number.isInteger(fromDay) || !Number.isInteger(toDay)) return ruleText('pullWindow.wholeDays', { fromDay, toDay });
  if (fromDay < 0) return ruleText('pullWindow.beforeLaid', { fromDay });
  if (toDay < fromDay) return ruleText('pullWindow.closesBeforeOpens', { fromDay, toDay });
  return null;
}

/** Throws a RangeError with the English sentence of `pullWindowProblem` unless the window is usable. */
export function assertPullWindow(window: PullWindow): void {
  const problem = pullWindowProblem(window);
  if (problem) throw new RangeError(problem.message);
}

function closingFromDay(window: PullWindow): number {
  return Math.max(window.fromDay, window.toDay - (CLOSING_DAYS - 1));
}

export function pullWindowDates(layDate: CalendarDate, window: PullWindow = DEFAULT_PULL_WINDOW): PullWindowDates {
  assertPullWindow(window);
  return {
    opensOn: addDays(layDate, window.fromDay),
    closesOn: addDays(layDate, window.toDay),
    closingFrom: addDays(layDate, closingFromDay(window)),
  };
}

export function pullWindowState(layDate: CalendarDate, today: CalendarDate, window: PullWindow = DEFAULT_PULL_WINDOW): PullWindowState {
  assertPullWindow(window);
  const day = dayNumber(layDate, today);
  if (day < window.fromDay) return 'not-yet';
  if (day > window.toDay) return 'past';
  return day >= closingFromDay(window) ? 'closing' : 'open';
}

export function pullWindowView(layDate: CalendarDate, today: CalendarDate, window: PullWindow = DEFAULT_PULL_WINDOW): PullWindowView {
  const dates = pullWindowDates(layDate, window);
  const day = dayNumber(layDate, today);
  return {
    ...dates,
    dayNumber: day,
    state: pullWindowState(layDate, today, window),
    daysUntilOpens: Math.max(0, window.fromDay - day),
    daysUntilCloses: day > window.toDay ? null : window.toDay - day,
    daysPastClose: Math.max(0, day - window.toDay),
  };
}
