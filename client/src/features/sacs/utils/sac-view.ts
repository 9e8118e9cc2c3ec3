import {
  BROOD_COUNT_MAX,
  broodStageLabel,
  type BandSide,
  type BroodStage,
  type ProjectResponse,
  type PullWindowState,
  type RollStatus,
  type SacResponse,
  type StageNumbering,
  type Words,
} from '@broodsilk/shared';
import { catalogueLabels, currentNumbering, i18next, words } from '@/lib/i18n';
import { formatInstant } from '@/lib/dates';
import { PULL_WINDOW_TONE, ROLL_STATUS_TONE, type ToneStyle } from '@/lib/tones';

/** A brood stage in the reader's language and numbering set (settings). */
export function broodLabel(stage: BroodStage, numbering: StageNumbering = currentNumbering()): string {
  return broodStageLabel(words, stage, numbering);
}

/** A label placed inside a sentence: lower case in English; German keeps its capitals (nouns). */
export function midSentence(label: string): string {
  return i18next.language === 'de' ? label : label.toLowerCase();
}

/** Tone class and words for a pull window state. */
export const PULL_WINDOW_TEXT = new Proxy({} as Record<PullWindowState, { label: string } & ToneStyle>, {
  get: (_t, key: string) => ({ label: words(`pullWindow.${key}`), ...PULL_WINDOW_TONE[key as PullWindowState] }),
});

export const ROLL_TEXT = new Proxy({} as Record<RollStatus, { label: string } & ToneStyle>, {
  get: (_t, key: string) => ({ label: words(`roll.${key}`), ...ROLL_STATUS_TONE[key as RollStatus] }),
});

/** One sentence about the pull window, e.g. "Opens in 3 days (12 Dec 2026), closes 5 Jan 2027". */
export function pullWindowSentence(sac: SacResponse): string {
  const w = sac.pullWindow;
  const s = (key: string, values: Record<string, unknown>) => words(`page.sacs.window.${key}`, { from: w.fromDay, to: w.toDay, ...values });
  if (sac.leftWithMother && !sac.pulled) return s('leftWithMother', { day: sac.dayNumber });
  if (sac.pulled) return sac.pulledOn ? s('pulledOn', { date: sac.pulledOn }) : s('pulled', {});
  switch (w.state) {
    case 'not-yet':
      return s('notYet', { count: w.daysUntilOpens, opens: w.opensOn, closes: w.closesOn });
    case 'open':
      return s('open', { count: w.daysUntilCloses ?? 0, opens: w.opensOn, closes: w.closesOn });
    case 'closing':
      return w.daysUntilCloses === 0 ? s('closesToday', { closes: w.closesOn }) : s('closing', { count: w.daysUntilCloses ?? 0, closes: w.closesOn });
    case 'past':
      return s('past', { count: w.daysPastClose, closes: w.closesOn });
  }
}

/** "Roll overdue · due Tue 1 Dec, 08:00" or null when rolling does not apply. */
export function rollSentence(sac: SacResponse, timeZone: string): string | null {
  if (!sac.roll) return null;
  return words('page.sacs.rollDue', { state: ROLL_TEXT[sac.roll.status].label, due: formatInstant(sac.roll.due, timeZone) });
}

export const SAC_OUTCOME_TEXT = catalogueLabels('sacOutcome');

/** Where a sac is, in words. */
export function whereSacIs(sac: SacResponse): string {
  if (sac.pulled) return sac.container ? words('page.sacs.where.inContainer', { container: sac.container }) : words('page.sacs.where.inIncubator');
  return sac.leftWithMother ? words('page.sacs.where.leftWithMother') : words('page.sacs.where.withMother');
}

export { rangeText, readingAlertText } from '@/lib/band';

/** The flag beside a logged reading outside the band. */
export function bandFlag(side: BandSide | null): string | null {
  return side ? words(`page.sacs.band.flag.${side}`) : null;
}

/** A count as read: "about 38" for an estimate, the number alone for a count made one by one. */
export function countText(t: Words, n: number, estimated: boolean): string {
  return estimated ? t('page.sacs.about', { n }) : String(n);
}

/** A count of eggs or young: a whole number from 0 to `max`, refused in the reader's words. */
export const countRule = (t: Words, max: number = BROOD_COUNT_MAX) => ({ min: 0, max, decimals: 0, rangeMessage: t('page.sacs.wholeFrom0', { max }) });

/**
 * What the species' facts say of urticating hairs for this sac (the pair's species; a hybrid
 * counts if either parent has them); null while the project and its animals are not known.
 */
export function sacHasUrticatingHairs(project: Pick<ProjectResponse, 'femaleAnimal' | 'maleAnimal'> | undefined): boolean | null {
  if (!project) return null;
  return [project.femaleAnimal, project.maleAnimal].some((a) => a.species.urticatingHairs);
}
