import { assertCalendarDate, diffDays, type CalendarDate } from '../breeding/calendar-day.js';

/**
 * - `no-molt-recorded`: nothing to go on.
 * - `hardening`: less than 21 days since her last molt; her new skin and fangs are still soft
 *   (pairing is usually held off for a few weeks after a molt, common practice).
 * - `ready`: 21 days or more since her last molt.
 * - `premolt`: the keeper flagged premolt and no molt is recorded since; not now, whatever the
 *   days since her last molt say (a molt after pairing sheds the stored sperm, TRADE-FACTS §5).
 */
export type FemaleReadinessState = 'no-molt-recorded' | 'hardening' | 'ready' | 'premolt';

export const FEMALE_HARDENING_DAYS = 21;

export interface FemaleReadiness {
  daysSinceMolt: number | null;
  state: FemaleReadinessState;
  note: string;
}

const LOST_PAIRING_NOTE = 'If she molts again before she lays, the pairing is lost: the stored sperm is shed with the old skin.';

/**
 * Whether a premolt flag set on `premoltSince` still stands: a molt on or after that day ends it
 * (the molt the flag announced has happened).
 */
export function premoltStands(premoltSince: CalendarDate | null | undefined, lastMoltOn: CalendarDate | null | undefined): boolean {
  return !!premoltSince && (!lastMoltOn || lastMoltOn < premoltSince);
}

export function femaleReadiness(lastMoltOn: CalendarDate | null, today: CalendarDate, premoltSince: CalendarDate | null = null): FemaleReadiness {
  assertCalendarDate(today, 'date today');
  if (premoltSince !== null) assertCalendarDate(premoltSince, 'premolt date');
  if (premoltStands(premoltSince, lastMoltOn)) {
    const daysSinceMolt = lastMoltOn === null ? null : diffDays(lastMoltOn, today);
    return {
      daysSinceMolt,
      state: 'premolt',
      note: `Not now: in premolt since ${premoltSince}. Pairing her now would be lost with the coming molt; wait until she has molted and hardened (about ${FEMALE_HARDENING_DAYS} days).`,
    };
  }
  if (lastMoltOn === null) {
    return {
      daysSinceMolt: null,
      state: 'no-molt-recorded',
      note: `No molt recorded. Add her last molt to see how long ago it was. ${LOST_PAIRING_NOTE}`,
    };
  }
  assertCalendarDate(lastMoltOn, 'molt date');
  const days = diffDays(lastMoltOn, today);
  if (days < 0) throw new RangeError(`The molt date ${lastMoltOn} is after today (${today}).`);
  const ago = days === 1 ? '1 day ago' : `${days} days ago`;
  if (days < FEMALE_HARDENING_DAYS) {
    return {
      daysSinceMolt: days,
      state: 'hardening',
      note: `Molted ${ago}. Give her new skin time to harden before pairing (about ${FEMALE_HARDENING_DAYS - days} more days).`,
    };
  }
  return { daysSinceMolt: days, state: 'ready', note: `Last molted ${ago}. ${LOST_PAIRING_NOTE}` };
}
