import { addDays, broodStageLabel, isBroodStageAtLeast, wordsFor, type CalendarDate, type MaleClockRow, type SacResponse } from '@broodsilk/shared';
import type { Reader } from '../users/reader-words';

const ENGLISH: Reader = { t: wordsFor('en'), lng: 'en', numbering: 'us', unit: 'C' };

/** One all-day event: `end` is exclusive (the day after the last day), as RFC 5545 §3.6.1 has it. */
export interface FeedEvent {
  uid: string;
  start: CalendarDate;
  end: CalendarDate;
  summary: string;
  description: string;
}

/**
 * Expected stage dates and where the figures come from (docs/trade-facts.md §1, §2; medium confidence):
 * prelarvae ("eggs with legs") hatch about day 20 in B. smithi (brachypelma-smithi.de, after
 * Vachon 1957), up to day 25 and later in other genera (arachnoworld.de: 25–42);
 * free-living young about 6–8 weeks after laying (Theraphosa blondi, day 42–56; a sac left with
 * the mother opens about week 6, tarantulaspider.net). Species differ: these are a guide only.
 */
export const EXPECTED_STAGES = [
  {
    key: 'eggs-with-legs',
    stage: 'eggs-with-legs',
    fromDay: 20,
    toDay: 25,
    source:
      'Guide only, medium confidence: prelarvae hatch about day 20 (B. smithi; brachypelma-smithi.de after Vachon 1957), later in some genera (arachnoworld.de: day 25–42).',
  },
  {
    key: 'free-living',
    stage: 'first-instar',
    fromDay: 42,
    toDay: 56,
    source:
      'Guide only, medium confidence: young leave the sac about 6–8 weeks after laying (Theraphosa blondi, day 42–56; with the mother about week 6, tarantulaspider.net).',
  },
] as const;

const DOMAIN = 'broodsilk';

export function sacEvents(projectTitle: string, sac: SacResponse, { t, numbering }: Reader = ENGLISH): FeedEvent[] {
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
    out.push({
      uid: `${e.key}-${sac.id}@${DOMAIN}`,
      start: addDays(sac.layDate, e.fromDay),
      end: addDays(sac.layDate, e.toDay + 1),
      summary: t('calendar.stageExpected', { stage: broodStageLabel(t, e.stage, numbering), project: projectTitle }),
      description: t('calendar.stageDays', { where, from: e.fromDay, to: e.toDay, source: e.source }),
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
