import {
  broodStageLabel,
  type BandSide,
  type BroodStage,
  type PullWindowState,
  type RollStatus,
  type SacResponse,
  type StageNumbering,
} from '@broodsilk/shared';
import { catalogueLabels, currentNumbering, words } from '@/lib/i18n';
import { formatDate, formatInstant } from '@/lib/dates';
import { PULL_WINDOW_TONE, ROLL_STATUS_TONE, type ToneStyle } from '@/lib/tones';

/** A brood stage in the reader's language and numbering set (settings). */
export function broodLabel(stage: BroodStage, numbering: StageNumbering = currentNumbering()): string {
  return broodStageLabel(words, stage, numbering);
}

/** Tone class and words for a pull window state. */
export const PULL_WINDOW_TEXT = new Proxy({} as Record<PullWindowState, { label: string } & ToneStyle>, {
  get: (_t, key: string) => ({ label: words(`pullWindow.${key}`), ...PULL_WINDOW_TONE[key as PullWindowState] }),
});

export const ROLL_TEXT = new Proxy({} as Record<RollStatus, { label: string } & ToneStyle>, {
  get: (_t, key: string) => ({ label: words(`roll.${key}`), ...ROLL_STATUS_TONE[key as RollStatus] }),
});

const days = (n: number) => (n === 1 ? '1 day' : `${n} days`);

/** One sentence about the pull window, e.g. "Opens in 3 days (12 Dec 2026), closes 5 Jan 2027". */
export function pullWindowSentence(sac: SacResponse): string {
  const w = sac.pullWindow;
  if (sac.leftWithMother && !sac.pulled) return `Left with the mother by choice: she keeps and turns it herself (day ${sac.dayNumber}).`;
  if (sac.pulled) return `Pulled${sac.pulledOn ? ` on ${formatDate(sac.pulledOn)}` : ''} (window was day ${w.fromDay}–${w.toDay}).`;
  switch (w.state) {
    case 'not-yet':
      return `Opens in ${days(w.daysUntilOpens)} on ${formatDate(w.opensOn)} (day ${w.fromDay}); closes ${formatDate(w.closesOn)} (day ${w.toDay}).`;
    case 'open':
      return `Open since ${formatDate(w.opensOn)}; closes ${formatDate(w.closesOn)}, in ${days(w.daysUntilCloses ?? 0)}.`;
    case 'closing':
      return w.daysUntilCloses === 0
        ? `Closes today, ${formatDate(w.closesOn)}.`
        : `Closing: last day ${formatDate(w.closesOn)}, in ${days(w.daysUntilCloses ?? 0)}.`;
    case 'past':
      return `Closed ${formatDate(w.closesOn)}, ${days(w.daysPastClose)} ago.`;
  }
}

/** "Roll overdue · due Tue 1 Dec, 08:00" or null when rolling does not apply. */
export function rollSentence(sac: SacResponse, timeZone: string): string | null {
  if (!sac.roll) return null;
  return `${ROLL_TEXT[sac.roll.status].label} · due ${formatInstant(sac.roll.due, timeZone)}`;
}

export const SAC_OUTCOME_TEXT = catalogueLabels('sacOutcome');

/** Where a sac is, in words. */
export function whereSacIs(sac: SacResponse): string {
  if (sac.pulled) return sac.container ? `in ${sac.container}` : 'in the incubator';
  return sac.leftWithMother ? 'left with the mother' : 'with the mother';
}

export { bandRangeWords as rangeText, readingAlertWords as readingAlertText } from '@broodsilk/shared';

/** The flag beside a logged reading outside the band. */
export function bandFlag(side: BandSide | null): string | null {
  return side ? `${side} the band` : null;
}
