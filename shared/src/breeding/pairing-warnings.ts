import { addDays, assertCalendarDate, diffDays, type CalendarDate } from './calendar-day.js';
import { maleClock, type MaleLifespan } from '../collection/male-clock.js';
import type { FailureClause, PairingFact } from './pairing.types.js';
import { wordsFor } from '../i18n/words.js';

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
  /** The values the catalogue's `warning.<code>` sentence takes (`count` picks the plural). */
  params: Record<string, string | number>;
  /** The sentence in English; a reader's language renders `warning.<code>` with `params`. */
  message: string;
}

/** Sentences and values in, the warning out (English message kept for mail and older readers). */
function warning(code: PairingWarningCode, severity: WarningSeverity, params: Record<string, string | number> = {}): PairingWarning {
  return { code, severity, params, message: wordsFor('en')(`warning.${code}`, params) };
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

/** Warnings for a project's pairing page and dashboard, most severe first. */
export function pairingWarnings(facts: PairingWarningFacts): PairingWarning[] {
  const { today, male } = facts;
  assertCalendarDate(today, 'date today');
  // Names him (" MO-042") after the catalogue's "the male" when the project has had more than one.
  const named = male?.label ? ` ${male.label}` : '';
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
      out.push(warning('female-molted-after-pairing', 'danger', { molt, paired: lastConnected }));
    } else if (diffDays(lastConnected, today) > PAIRING_TO_SAC_MAX_DAYS) {
      out.push(warning('no-sac-after-a-year', 'warning', { days: diffDays(lastConnected, today), paired: lastConnected }));
    }
  }

  if (male?.diedOn) {
    assertCalendarDate(male.diedOn, 'date the male died');
    const before = connected.filter((d) => d <= male.diedOn!).at(-1);
    out.push(
      before
        ? warning('male-died-after-pairing', 'info', { named, died: male.diedOn, paired: before })
        : warning('male-died-before-pairing', 'danger', { named, died: male.diedOn, clause: wordsFor('en')(`failureClauseText.${facts.failureClause}`) }),
    );
  } else if (male) {
    if (male.dueBackOn && !male.returnedOn) {
      assertCalendarDate(male.dueBackOn, 'due-back date');
      const late = diffDays(male.dueBackOn, today);
      if (late > 0) {
        out.push(warning('loan-overdue', 'warning', { named, dueBack: male.dueBackOn, count: late }));
      }
    }
    if (male.maturedOn && !anySac && male.maturedOn <= today) {
      const clock = maleClock(male.maturedOn, today, male.lifespan);
      const endsOn = addDays(clock.changes[3]!.from, -1);
      if (clock.state === 'fresh') {
        out.push(warning('male-fresh', 'info', { named, count: clock.daysSinceMaturing }));
      } else if (clock.state === 'late') {
        out.push(warning('male-clock-late', 'warning', { named, count: clock.daysSinceMaturing, endsOn }));
      } else if (clock.state === 'past-typical') {
        out.push(warning('male-clock-past-typical', 'warning', { named, count: clock.daysSinceMaturing, endsOn }));
      }
      if (!lastConnected && (clock.state === 'late' || clock.state === 'past-typical')) {
        out.push(warning('no-pairing-male-late', 'danger', { named }));
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
