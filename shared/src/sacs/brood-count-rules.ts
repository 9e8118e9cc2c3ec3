import type { CalendarDate } from '../breeding/calendar-day.js';
import type { PlausibilityWarning } from '../errors/plausibility.js';

/** The count a new count is measured against: the latest one before it that is not struck. */
export interface PreviousCount {
  alive: number;
  /** Its calendar date, in the recorder's zone. */
  on: CalendarDate;
  /** An estimate (young not counted one by one); a higher count after it only warns. */
  estimated: boolean;
}

export type CountCheck = { refuse: string } | { warn: PlausibilityWarning } | null;

/**
 * Young do not appear in a brood between counts: a count may not exceed the last exact count plus
 * the young that joined since (`joinedSince`: a kept-back batch moved into the brood). After an
 * estimated count a higher number is possible (the estimate was low), so it only warns.
 */
export function checkCount(alive: number, previous: PreviousCount | null, joinedSince = 0): CountCheck {
  if (!previous) return null;
  const ceiling = previous.alive + joinedSince;
  if (alive <= ceiling) return null;
  const joined = joinedSince ? `, and ${joinedSince} kept-back young joined the brood since (${ceiling} in all)` : '';
  if (previous.estimated) {
    return {
      warn: {
        code: 'count-above-estimate',
        message: `About ${previous.alive} were alive by the estimate on ${previous.on}${joined}; ${alive} is more than that. Save it if the estimate was low.`,
      },
    };
  }
  return {
    refuse: `${previous.alive} were alive at the last count on ${previous.on}${joined}; ${alive} is more than that. Young are not added between counts: correct the earlier count if it was wrong.`,
  };
}
