import { addDays, assertCalendarDate, diffDays, type CalendarDate } from './calendar-day.js';
import { maleClock, type MaleLifespan } from '../collection/male-clock.js';
import type { FailureClause, PairingFact } from './pairing.types.js';

export type WarningSeverity = 'info' | 'warning' | 'danger';

export type PairingWarningCode =
  | 'female-molted-after-pairing'
  | 'male-fresh'
  | 'male-clock-late'
  | 'male-clock-past-typical'
  | 'no-pairing-male-late'
  | 'loan-overdue'
  | 'male-died-before-pairing'
  | 'male-died-after-pairing'
  | 'no-sac-after-a-year';

export interface PairingWarning {
  code: PairingWarningCode;
  severity: WarningSeverity;
  message: string;
}

export interface PairingWarningMale {
  /** Names him in the messages when a project has had more than one male. */
  label?: string;
  maturedOn?: CalendarDate | null;
  lifespan: MaleLifespan;
  diedOn?: CalendarDate | null;
  /** On a breeding loan: the day he should go back to his owner. */
  dueBackOn?: CalendarDate | null;
  returnedOn?: CalendarDate | null;
}

export interface PairingWarningFacts {
  today: CalendarDate;
  pairings: readonly PairingFact[];
  femaleMolts: readonly CalendarDate[];
  /** Lay dates of the project's sacs. */
  sacLayDates: readonly CalendarDate[];
  male?: PairingWarningMale | null;
  failureClause: FailureClause;
}

/** Longest usual wait from pairing to sac before we say so: 365 days (docs/trade-facts.md §3, up to a year). */
export const PAIRING_TO_SAC_MAX_DAYS = 365;

const days = (n: number) => (n === 1 ? '1 day' : `${n} days`);

const CLAUSE_TEXT: Record<FailureClause, string> = {
  'nothing-owed': 'Under these terms nothing is owed when a project fails.',
  'carries-over': 'Under these terms the deal carries over to the next sac or pairing.',
};

/** Warnings for a project's pairing page and dashboard, most severe first. */
export function pairingWarnings(facts: PairingWarningFacts): PairingWarning[] {
  const { today, male } = facts;
  assertCalendarDate(today, 'date today');
  const him = male?.label ? `The male ${male.label}` : 'The male';
  const out: PairingWarning[] = [];
  const connected = facts.pairings
    .filter((p) => p.outcome === 'connected')
    .map((p) => p.on)
    .sort();
  const lastConnected = connected.at(-1);
  const sacSince = (date: string) => facts.sacLayDates.some((d) => d >= date);
  const anySac = facts.sacLayDates.length > 0;

  if (lastConnected && !sacSince(lastConnected)) {
    const molt = facts.femaleMolts.filter((m) => m >= lastConnected).sort()[0];
    if (molt) {
      out.push({
        code: 'female-molted-after-pairing',
        severity: 'danger',
        message: `The female molted on ${molt}, after the last successful pairing (${lastConnected}) and before laying. Stored sperm is shed with the molt, so that pairing is lost; pair her again once her new skin has hardened.`,
      });
    } else if (diffDays(lastConnected, today) > PAIRING_TO_SAC_MAX_DAYS) {
      out.push({
        code: 'no-sac-after-a-year',
        severity: 'warning',
        message: `No sac ${diffDays(lastConnected, today)} days after the last successful pairing (${lastConnected}). Most females lay within weeks to months, rarely after more than a year; consider pairing again or ending the project.`,
      });
    }
  }

  if (male?.diedOn) {
    assertCalendarDate(male.diedOn, 'date the male died');
    const before = connected.filter((d) => d <= male.diedOn!).at(-1);
    out.push(
      before
        ? {
            code: 'male-died-after-pairing',
            severity: 'info',
            message: `${him} died on ${male.diedOn}, after a successful pairing on ${before}; the female can still lay from that pairing.`,
          }
        : {
            code: 'male-died-before-pairing',
            severity: 'danger',
            message: `${him} died on ${male.diedOn} before a successful pairing. ${CLAUSE_TEXT[facts.failureClause]}`,
          },
    );
  } else if (male) {
    if (male.dueBackOn && !male.returnedOn) {
      assertCalendarDate(male.dueBackOn, 'due-back date');
      const late = diffDays(male.dueBackOn, today);
      if (late > 0) {
        out.push({
          code: 'loan-overdue',
          severity: 'warning',
          message: `${male.label ? `The loaned male ${male.label}` : 'The loaned male'} was due back on ${male.dueBackOn}, ${days(late)} ago.`,
        });
      }
    }
    if (male.maturedOn && !anySac && male.maturedOn <= today) {
      const clock = maleClock(male.maturedOn, today, male.lifespan);
      const endsOn = addDays(clock.changes[3]!.from, -1);
      if (clock.state === 'fresh') {
        out.push({
          code: 'male-fresh',
          severity: 'info',
          message: `${him} matured ${days(clock.daysSinceMaturing)} ago. Wait for his first sperm web (usually 2–4 weeks after the molt) before pairing.`,
        });
      } else if (clock.state === 'late') {
        out.push({
          code: 'male-clock-late',
          severity: 'warning',
          message: `${him} matured ${days(clock.daysSinceMaturing)} ago and is in the late part of his usual lifespan, which ends around ${endsOn}.`,
        });
      } else if (clock.state === 'past-typical') {
        out.push({
          code: 'male-clock-past-typical',
          severity: 'warning',
          message: `${him} matured ${days(clock.daysSinceMaturing)} ago, past his usual lifespan (to around ${endsOn}). He may die any day.`,
        });
      }
      if (!lastConnected && (clock.state === 'late' || clock.state === 'past-typical')) {
        out.push({
          code: 'no-pairing-male-late',
          severity: 'danger',
          message: `No successful pairing yet and ${him.replace(/^The/, 'the')} is running out of time: pair him soon.`,
        });
      }
    }
  }

  const rank: Record<WarningSeverity, number> = { danger: 0, warning: 1, info: 2 };
  return out.sort((a, b) => rank[a.severity] - rank[b.severity]);
}

/** Warnings about the female and the pairings, not about a male: said once per project. */
const ABOUT_HER: ReadonlySet<PairingWarningCode> = new Set(['female-molted-after-pairing', 'no-sac-after-a-year']);

export interface ProjectWarningFacts extends Omit<PairingWarningFacts, 'male'> {
  /** Every male of the project, the first one first. */
  males: readonly PairingWarningMale[];
}

/**
 * Warnings for a project that may have had several males (a backup, a replacement after a death):
 * the female's once, and the clock, loan and death warnings of each male, named when there are
 * several. A dead male is left out once another male of the project lives: the living one carries
 * the attempt on.
 */
export function projectWarnings(facts: ProjectWarningFacts): PairingWarning[] {
  const { males, ...rest } = facts;
  const several = males.length > 1;
  const anyAlive = males.some((m) => !m.diedOn);
  const perMale = males
    .filter((m) => !(several && m.diedOn && anyAlive))
    .flatMap((m) => pairingWarnings({ ...rest, male: several ? m : { ...m, label: undefined } }).filter((w) => !ABOUT_HER.has(w.code)));
  const rank: Record<WarningSeverity, number> = { danger: 0, warning: 1, info: 2 };
  return [...pairingWarnings({ ...rest, male: null }), ...perMale].sort((a, b) => rank[a.severity] - rank[b.severity]);
}
