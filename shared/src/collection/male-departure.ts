import type { CalendarDate } from '../breeding/calendar-day.js';
import type { FailureClause } from '../breeding/pairing.types.js';

/** A male leaving a project for good: handed back to his owner, or dead. */
export type MaleDeparture = 'returned' | 'died';

/** Activity kinds written on each of his projects, one per departure. */
export const MALE_DEPARTURE_KINDS: Readonly<Record<MaleDeparture, string>> = Object.freeze({ returned: 'male.returned', died: 'male.died' });

/** What each failure clause means once the male is gone, in our own words. */
const CLAUSE_AFTER_DEATH: Record<FailureClause, string> = {
  'nothing-owed': 'The terms in force say nothing is owed if the project fails: unless a sac comes from an earlier pairing, the project ends with no payout.',
  'carries-over':
    'The terms in force say the deal carries over: a sac from an earlier pairing still counts, and otherwise the deal moves to the female’s next pairing or sac.',
};
const NO_TERMS = 'No terms are in force on this project, so no failure clause applies; agree with your partners what happens now.';

/**
 * The sentence written on a project's timeline when its male departs. For a death it names the
 * failure clause that now applies (`null`: no terms in force).
 */
export function maleDepartureSummary(departure: MaleDeparture, label: string, on: CalendarDate, clause: FailureClause | null): string {
  if (departure === 'returned') return `The male ${label} went back to his owner on ${on}; his breeding loan is over.`;
  return `The male ${label} died on ${on}. ${clause ? CLAUSE_AFTER_DEATH[clause] : NO_TERMS}`;
}
