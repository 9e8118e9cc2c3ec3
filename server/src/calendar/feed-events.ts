import {
  addDays,
  broodStageLabel,
  isBroodStageAtLeast,
  serverWordsFor,
  type CalendarDate,
  type ExpectedStageDays,
  type MaleClockRow,
  type SacResponse,
  valueSourceLabel,
} from '@broodsilk/shared';
import type { Reader } from '../users/reader-words';

const ENGLISH: Reader = { t: serverWordsFor('en'), lng: 'en', numbering: 'us', unit: 'C' };

/** One all-day event: `end` is exclusive (the day after the last day), as RFC 5545 §3.6.1 has it. */
export interface FeedEvent {
  uid: string;
  start: CalendarDate;
  end: CalendarDate;
  summary: string;
  description: string;
}

/** The stages the calendar expects, each with its figure in the species' (or group's) values. */
const EXPECTED_STAGES = [
  { key: 'eggs-with-legs', stage: 'eggs-with-legs', days: 'eggsWithLegs' },
  { key: 'free-living', stage: 'first-instar', days: 'freeLiving' },
] as const;

/** Where a stage figure comes from, in the reader's words: a guide only, with its source or mark. */
function stageSource(t: Reader['t'], days: ExpectedStageDays[keyof ExpectedStageDays]): string {
  const from = t(`calendar.stageFrom.${days.from}`);
  return t('calendar.stageGuide', { from, source: valueSourceLabel(t, days.source) });
}

const DOMAIN = 'broodsilk';

/**
 * A sac's pull window and its expected stages. The stage days are the species' own figures, else
 * its group's (`expectedStageDays`, docs/trade-facts.md §1, §2): species differ, so one fixed set
 * would contradict the genus values.
 */
export function sacEvents(projectTitle: string, sac: SacResponse, stages: ExpectedStageDays, { t, numbering }: Reader = ENGLISH): FeedEvent[] {
  const out: FeedEvent[] = [];
  const where = t('calendar.where', { project: projectTitle, layDate: sac.layDate });
  if (!sac.pulled) {
    out.push({
      uid: `pull-window-${sac.id}@${DOMAIN}`,
      start: sac.pullWindow.opensOn,
      end: addDays(sac.pullWindow.closesOn, 1),
      summary: t('calendar.pullWindow', { project: projectTitle }),
      description: t('calendar.pullBetween', {
        where,
        from: sac.pullWindow.fromDay,
        to: sac.pullWindow.toDay,
        opens: sac.pullWindow.opensOn,
        closes: sac.pullWindow.closesOn,
      }),
    });
  }
  for (const e of EXPECTED_STAGES) {
    if (isBroodStageAtLeast(sac.broodStage, e.stage)) continue;
    const days = stages[e.days];
    const { fromDay, toDay } = days.value;
    out.push({
      uid: `${e.key}-${sac.id}@${DOMAIN}`,
      start: addDays(sac.layDate, fromDay),
      end: addDays(sac.layDate, toDay + 1),
      summary: t('calendar.stageExpected', { stage: broodStageLabel(t, e.stage, numbering), project: projectTitle }),
      description: t('calendar.stageDays', { where, from: fromDay, to: toDay, source: stageSource(t, days) }),
    });
  }
  return out;
}

/** The days a male's clock moves to its next state (the maturing day itself is not an event). */
export function maleClockEvents(row: MaleClockRow, { t }: Reader = ENGLISH): FeedEvent[] {
  return row.clock.changes
    .filter((c) => c.state !== 'fresh')
    .map((c) => ({
      uid: `male-clock-${row.animal.id}-${c.state}@${DOMAIN}`,
      start: c.from,
      end: addDays(c.from, 1),
      summary: t('calendar.maleClock', { animal: row.animal.label, state: t(`maleClock.${c.state}.label`) }),
      description: t('calendar.maleClockFrom', {
        animal: row.animal.label,
        from: c.from,
        state: t(`maleClock.${c.state}.label`),
        hint: t(`maleClock.${c.state}.hint`),
      }),
    }));
}
