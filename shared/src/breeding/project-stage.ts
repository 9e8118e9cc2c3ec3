import { assertCalendarDate, type CalendarDate } from './calendar-day.js';
import { isBroodStageAtLeast } from './brood-stage.js';
import type { PairingFact, SacFact } from './pairing.types.js';

/** The progress line of a project (our own words), in order; `ended-early` stands outside it. */
export type ProjectStage = 'planned' | 'paired' | 'waiting-for-sac' | 'sac-laid' | 'in-incubator' | 'brood' | 'shares-settled' | 'closed' | 'ended-early';

export const PROJECT_STAGE_LINE: readonly ProjectStage[] = [
  'planned',
  'paired',
  'waiting-for-sac',
  'sac-laid',
  'in-incubator',
  'brood',
  'shares-settled',
  'closed',
];

export type EndedEarlyReason = 'no-sac' | 'female-molted' | 'sac-failed' | 'sac-eaten' | 'male-died';

export interface ProjectFacts {
  pairings: readonly PairingFact[];
  /** Molts of the female (dates); only those after a pairing matter. */
  femaleMolts: readonly CalendarDate[];
  sacs: readonly SacFact[];
  sharesSettled?: boolean;
  closedOn?: CalendarDate | null;
  /** Set by the keeper when calling the project off (e.g. 'no-sac' after waiting long enough). */
  endedEarly?: EndedEarlyReason | null;
  maleDiedOn?: CalendarDate | null;
}

export interface DerivedProjectStage {
  stage: ProjectStage;
  reason?: EndedEarlyReason;
  /** The sac the stage is about (sac-laid, in-incubator, brood, a failed sac). */
  sacId?: string;
}

const isLive = (s: SacFact) => s.fate === 'developing';
const hasBrood = (s: SacFact) => isLive(s) && !!s.broodStage && isBroodStageAtLeast(s.broodStage, 'first-instar');
const latest = <T>(items: readonly T[], date: (t: T) => string): T | undefined =>
  [...items].sort((a, b) => (date(a) < date(b) ? -1 : date(a) > date(b) ? 1 : 0)).at(-1);

/**
 * A project's stage from its facts. Rules, first match wins:
 * 1. The keeper ended it early → `ended-early` with their reason.
 * 2. `closedOn` set → `closed`.
 * 3. A developing sac with young at first instar or later → `shares-settled` if shares are settled, else `brood`.
 * 4. Another developing sac → `in-incubator` if pulled, else `sac-laid` (left with the mother).
 * 5. The "current attempt" is everything after the lay date of the latest failed or eaten sac (or
 *    everything, if none). With no connected pairing in it:
 *    - a failed sac before it → `ended-early` `sac-eaten` or `sac-failed` (the latest one's outcome);
 *      a new connected pairing later moves the project on again;
 *    - the male died, or the last pairing ended with the male lost → `ended-early` `male-died`;
 *    - any pairing attempt → `paired`; none → `planned`.
 * 6. With a connected pairing: a female molt on or after the last connected pairing (sperm is shed with
 *    the molt, docs/trade-facts.md §5) → `ended-early` `female-molted`; otherwise → `waiting-for-sac`.
 *    A molt on the pairing day counts as after it. The male dying after connecting changes nothing.
 * `no-sac` is never derived: how long to wait is the keeper's call (see pairing warnings).
 */
export function deriveProjectStage(facts: ProjectFacts): DerivedProjectStage {
  for (const p of facts.pairings) assertCalendarDate(p.on, 'pairing date');
  for (const m of facts.femaleMolts) assertCalendarDate(m, 'molt date');
  for (const s of facts.sacs) {
    assertCalendarDate(s.layDate, 'lay date');
    if (s.pulledOn) assertCalendarDate(s.pulledOn, 'pull date');
  }
  if (facts.maleDiedOn) assertCalendarDate(facts.maleDiedOn, 'date the male died');

  if (facts.endedEarly) return { stage: 'ended-early', reason: facts.endedEarly };
  if (facts.closedOn) return { stage: 'closed' };

  const withId = (stage: ProjectStage, sac: SacFact | undefined): DerivedProjectStage => (sac?.id !== undefined ? { stage, sacId: sac.id } : { stage });
  const brood = latest(facts.sacs.filter(hasBrood), (s) => s.layDate);
  if (brood) return withId(facts.sharesSettled ? 'shares-settled' : 'brood', brood);
  const live = facts.sacs.filter(isLive);
  const pulled = latest(
    live.filter((s) => !!s.pulledOn),
    (s) => s.layDate,
  );
  if (pulled) return withId('in-incubator', pulled);
  const laid = latest(live, (s) => s.layDate);
  if (laid) return withId('sac-laid', laid);

  const lastDead = latest(facts.sacs, (s) => s.layDate);
  const since = lastDead?.layDate;
  const attempt = facts.pairings.filter((p) => since === undefined || p.on > since);
  const lastConnected = latest(
    attempt.filter((p) => p.outcome === 'connected'),
    (p) => p.on,
  );
  if (!lastConnected) {
    if (lastDead) return { ...withId('ended-early', lastDead), reason: lastDead.fate === 'eaten' ? 'sac-eaten' : 'sac-failed' };
    const lastPairing = latest(attempt, (p) => p.on);
    if (facts.maleDiedOn || lastPairing?.outcome === 'male-lost') return { stage: 'ended-early', reason: 'male-died' };
    return { stage: attempt.length > 0 ? 'paired' : 'planned' };
  }
  if (facts.femaleMolts.some((m) => m >= lastConnected.on)) return { stage: 'ended-early', reason: 'female-molted' };
  return { stage: 'waiting-for-sac' };
}
