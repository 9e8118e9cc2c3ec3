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

/** What went wrong in the current attempt, read from the facts: advice to try again, never an end. */
export type ProjectSetback = Exclude<EndedEarlyReason, 'no-sac'>;

export interface ProjectFacts {
  pairings: readonly PairingFact[];
  /** Molts of the female (dates); only those after a pairing matter. */
  femaleMolts: readonly CalendarDate[];
  sacs: readonly SacFact[];
  sharesSettled?: boolean;
  closedOn?: CalendarDate | null;
  /** Set by the keeper when calling the project off (e.g. 'no-sac' after waiting long enough). */
  endedEarly?: EndedEarlyReason | null;
  /** When the last of the project's males died; null while one of them lives. */
  maleDiedOn?: CalendarDate | null;
}

export interface DerivedProjectStage {
  stage: ProjectStage;
  /** Why the keeper ended it (stage `ended-early` only). */
  reason?: EndedEarlyReason;
  /** What went wrong in the current attempt; the project stays open for the next pairing and sac. */
  setback?: ProjectSetback;
  /** The sac the stage is about (sac-laid, in-incubator, brood, a failed sac). */
  sacId?: string;
  /** Steps before the current one with nothing recorded (a sac with no successful pairing before it): not "done". */
  unrecorded?: ProjectStage[];
}

const isLive = (s: SacFact) => s.fate === 'developing';
const hasBrood = (s: SacFact) => isLive(s) && !!s.broodStage && isBroodStageAtLeast(s.broodStage, 'first-instar');
const latest = <T>(items: readonly T[], date: (t: T) => string): T | undefined =>
  [...items].sort((a, b) => (date(a) < date(b) ? -1 : date(a) > date(b) ? 1 : 0)).at(-1);

/**
 * A project's stage from its facts. Only the keeper ends or closes a project; what goes wrong is a
 * `setback` on a stage that stays open for another attempt. Rules, first match wins:
 * 1. `closedOn` set → `closed` (also after an early end).
 * 2. The keeper ended it early → `ended-early` with their reason.
 * 3. A developing sac with young at first instar or later → `shares-settled` if shares are settled, else `brood`.
 * 4. Another developing sac → `in-incubator` if pulled, else `sac-laid` (left with the mother).
 *    For 3 and 4, `unrecorded: ['paired']` when no connected pairing is recorded on or before the sac's lay date.
 * 5. The "current attempt" is everything after the lay date of the latest failed or eaten sac (or
 *    everything, if none). With no connected pairing in it the stage is `paired` after any attempt,
 *    else `planned`, with a setback:
 *    - a failed sac before it → `sac-eaten` or `sac-failed` (the latest one's fate);
 *    - the last male died, or the last pairing ended with the male lost → `male-died`.
 * 6. With a connected pairing: a female molt on or after the last connected pairing (sperm is shed with
 *    the molt, docs/trade-facts.md §5) → `paired` with setback `female-molted`; otherwise → `waiting-for-sac`.
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

  if (facts.closedOn) return { stage: 'closed' };
  if (facts.endedEarly) return { stage: 'ended-early', reason: facts.endedEarly };

  const withId = (stage: ProjectStage, sac: SacFact | undefined): DerivedProjectStage => (sac?.id !== undefined ? { stage, sacId: sac.id } : { stage });
  // A sac stage says the steps before it happened; "paired" only did if a successful pairing is recorded before the sac.
  const sacStage = (stage: ProjectStage, sac: SacFact): DerivedProjectStage => {
    const paired = facts.pairings.some((p) => p.outcome === 'connected' && p.on <= sac.layDate);
    return paired ? withId(stage, sac) : { ...withId(stage, sac), unrecorded: ['paired'] };
  };
  const brood = latest(facts.sacs.filter(hasBrood), (s) => s.layDate);
  if (brood) return sacStage(facts.sharesSettled ? 'shares-settled' : 'brood', brood);
  const live = facts.sacs.filter(isLive);
  const pulled = latest(
    live.filter((s) => !!s.pulledOn),
    (s) => s.layDate,
  );
  if (pulled) return sacStage('in-incubator', pulled);
  const laid = latest(live, (s) => s.layDate);
  if (laid) return sacStage('sac-laid', laid);

  const lastDead = latest(facts.sacs, (s) => s.layDate);
  const since = lastDead?.layDate;
  const attempt = facts.pairings.filter((p) => since === undefined || p.on > since);
  const lastConnected = latest(
    attempt.filter((p) => p.outcome === 'connected'),
    (p) => p.on,
  );
  if (!lastConnected) {
    const stage: ProjectStage = attempt.length > 0 ? 'paired' : 'planned';
    if (lastDead) return { ...withId(stage, lastDead), setback: lastDead.fate === 'eaten' ? 'sac-eaten' : 'sac-failed' };
    const lastPairing = latest(attempt, (p) => p.on);
    if (facts.maleDiedOn || lastPairing?.outcome === 'male-lost') return { stage, setback: 'male-died' };
    return { stage };
  }
  if (facts.femaleMolts.some((m) => m >= lastConnected.on)) return { stage: 'paired', setback: 'female-molted' };
  return { stage: 'waiting-for-sac' };
}
