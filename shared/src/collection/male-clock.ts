import dayjs from 'dayjs';
import utc from 'dayjs/plugin/utc.js';
import { addDays, assertCalendarDate, diffDays, type CalendarDate } from '../breeding/calendar-day.js';

dayjs.extend(utc);

/** Lifespan groups for the typical time a mature male has left. */
export type MaleLifespanGroup = 'nw-terrestrial' | 'nw-arboreal' | 'ow-terrestrial' | 'ow-arboreal' | 'fossorial';

/** Typical months a male lives after his maturing molt, as a range. */
export interface MaleLifespan {
  minMonths: number;
  maxMonths: number;
}

/**
 * Defaults per group, from memory (docs/trade-facts.md §5: New World terrestrial 12–24 months,
 * New World arboreal 6–12, Old World 4–12, dwarf species shorter; fossorial/dwarf 6–12 is our guess).
 * Species profiles and projects may override them.
 */
export const GROUP_LIFESPAN_DEFAULTS: Readonly<Record<MaleLifespanGroup, Readonly<MaleLifespan>>> = Object.freeze({
  'nw-terrestrial': { minMonths: 12, maxMonths: 24 },
  'nw-arboreal': { minMonths: 6, maxMonths: 12 },
  'ow-terrestrial': { minMonths: 4, maxMonths: 12 },
  'ow-arboreal': { minMonths: 4, maxMonths: 12 },
  fossorial: { minMonths: 6, maxMonths: 12 },
});

/**
 * - `fresh`: days 0–20 after the maturing molt; wait for his first sperm web (2–4 weeks, common practice).
 * - `prime`: day 21 until the day before maturedOn + minMonths.
 * - `late`: maturedOn + minMonths through maturedOn + maxMonths (both dates included).
 * - `past-typical`: from the day after maturedOn + maxMonths.
 */
export type MaleClockState = 'fresh' | 'prime' | 'late' | 'past-typical';

export const MALE_CLOCK_STATES: readonly MaleClockState[] = ['fresh', 'prime', 'late', 'past-typical'];

/** Day on which a male leaves `fresh` (day 21). */
export const MALE_FRESH_DAYS = 21;

export interface MaleClock {
  daysSinceMaturing: number;
  state: MaleClockState;
  /** The whole schedule, in order: the date each state starts. */
  changes: { state: MaleClockState; from: CalendarDate }[];
  /** The next state and its first day; absent once past typical. */
  nextChange?: { state: MaleClockState; on: CalendarDate };
  /** Days left until `past-typical` starts (negative once past). */
  daysUntilPastTypical: number;
}

export function assertMaleLifespan(lifespan: MaleLifespan): void {
  const { minMonths, maxMonths } = lifespan;
  if (!Number.isInteger(minMonths) || !Number.isInteger(maxMonths)) {
    throw new RangeError(`Lifespan months must be whole numbers (got ${minMonths} to ${maxMonths}).`);
  }
  if (minMonths < 1) throw new RangeError(`A mature male's typical lifespan must be at least 1 month (got ${minMonths}).`);
  if (maxMonths < minMonths) {
    throw new RangeError(`The longest typical lifespan (${maxMonths} months) cannot be shorter than the shortest (${minMonths} months).`);
  }
}

/** Calendar months as dayjs counts them: Jan 31 + 1 month = the last day of February. */
function addMonths(date: CalendarDate, months: number): CalendarDate {
  return dayjs.utc(date).add(months, 'month').format('YYYY-MM-DD');
}

export function maleClock(maturedOn: CalendarDate, today: CalendarDate, lifespan: MaleLifespan): MaleClock {
  assertCalendarDate(maturedOn, 'maturing date');
  assertCalendarDate(today, 'date today');
  assertMaleLifespan(lifespan);
  const days = diffDays(maturedOn, today);
  if (days < 0) throw new RangeError(`The maturing date ${maturedOn} is after today (${today}).`);

  const pastTypicalFrom = addDays(addMonths(maturedOn, lifespan.maxMonths), 1);
  // minMonths ≥ 1 puts `late` at day 28 or later, so every state has at least one day.
  const changes: MaleClock['changes'] = [
    { state: 'fresh', from: maturedOn },
    { state: 'prime', from: addDays(maturedOn, MALE_FRESH_DAYS) },
    { state: 'late', from: addMonths(maturedOn, lifespan.minMonths) },
    { state: 'past-typical', from: pastTypicalFrom },
  ];
  // ISO dates compare correctly as strings.
  const current = [...changes].reverse().find((c) => c.from <= today)!;
  const next = changes.find((c) => c.from > today);
  return {
    daysSinceMaturing: days,
    state: current.state,
    changes,
    ...(next ? { nextChange: { state: next.state, on: next.from } } : {}),
    daysUntilPastTypical: diffDays(today, pastTypicalFrom),
  };
}

/**
 * Sort key for lists of males: sort ascending, most urgent first. It is the days left before
 * the male is past typical, so males already past typical come first, then late ones, then
 * the rest by how soon their time runs out.
 */
export function maleClockUrgency(clock: MaleClock): number {
  return clock.daysUntilPastTypical;
}
