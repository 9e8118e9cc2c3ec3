import type { CalendarDate } from '../breeding/calendar-day.js';
import { plausibilityWarning, type PlausibilityWarning } from '../errors/plausibility.js';
import { ruleText, type RuleText } from '../errors/rule-text.js';

/** The count a new count is measured against: the latest one before it that is not struck. */
export interface PreviousCount {
  alive: number;
  /** Its calendar date, in the recorder's zone. */
  on: CalendarDate;
  /** An estimate (young not counted one by one); a higher count after it only warns. */
  estimated: boolean;
}

export type CountCheck = { refuse: RuleText } | { warn: PlausibilityWarning } | null;

/**
 * Young do not appear in a brood between counts: a count may not exceed the last exact count plus
 * the young that joined since (`joinedSince`: a kept-back batch moved into the brood). After an
 * estimated count a higher number is possible (the estimate was low), so it only warns.
 */
export function checkCount(alive: number, previous: PreviousCount | null, joinedSince = 0): CountCheck {
  if (!previous) return null;
  const ceiling = previous.alive + joinedSince;
  if (alive <= ceiling) return null;
  const values = { previous: previous.alive, on: previous.on, alive, ...(joinedSince ? { joined: joinedSince, ceiling } : {}) };
  if (previous.estimated) {
    return { warn: plausibilityWarning('count-above-estimate', values, joinedSince ? 'count-above-estimate-joined' : 'count-above-estimate') };
  }
  return { refuse: ruleText(joinedSince ? 'count.aboveLastJoined' : 'count.aboveLast', values) };
}
