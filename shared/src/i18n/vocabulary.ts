import type { EndedEarlyReason, ProjectStage } from '../breeding/project-stage.js';
import { en } from './en.js';
import { broodStageLabel, isBroodStage, type StageNumbering } from '../breeding/brood-stage.js';
import { formatTemperature } from '../time/temperature.js';
import type { TemperatureUnit } from '../auth/auth.types.js';
import type { ActivityEventResponse } from '../projects/activity.types.js';
import { label, type Words } from './words.js';

/** "Ended early: the female molted" for an ended project, else the stage's own name. */
export function projectStageText(t: Words, stage: ProjectStage, reason?: EndedEarlyReason | null): string {
  if (stage === 'ended-early' && reason) return t('endedEarlyWith', { reason: label(t, 'endedEarly', reason) });
  return label(t, 'projectStage', stage);
}

/** Every activity kind the server records, as dotted names (`pairing.recorded`), taken from the catalogue. */
export const ACTIVITY_KINDS: readonly string[] = Object.entries(en.activityKind).flatMap(([group, kinds]) => Object.keys(kinds).map((k) => `${group}.${k}`));

/** A timeline heading for an activity kind; a kind the catalogue lacks gets the plain word "Activity", never its code. */
export function activityKindLabel(t: Words, kind: string): string {
  return ACTIVITY_KINDS.includes(kind) ? t(`activityKind.${kind}`) : t('activityKindOther');
}

/**
 * An activity event's sentence for one reader: events whose data carry their values are said again
 * in the reader's language, unit and numbering; others keep the sentence stored when they happened.
 */
export function activitySentence(
  t: Words,
  e: Pick<ActivityEventResponse, 'kind' | 'summary' | 'data'>,
  reader: { unit: TemperatureUnit; numbering: StageNumbering },
): string {
  const d = e.data;
  const layDate = typeof d.layDate === 'string' ? d.layDate : null;
  if (e.kind === 'care.temperature' && typeof d.temperatureC === 'number' && layDate)
    return t('text.ofSac', { what: t('text.temperatureNow', { temperature: formatTemperature(d.temperatureC, reader.unit) }), layDate });
  if (e.kind === 'care.stage' && isBroodStage(d.stage) && layDate)
    return t('text.ofSac', { what: t('text.stageNow', { stage: broodStageLabel(t, d.stage, reader.numbering) }), layDate });
  if (
    e.kind === 'pairing.recorded' &&
    typeof d.on === 'string' &&
    typeof d.durationMinutes === 'number' &&
    typeof d.outcome === 'string' &&
    d.outcome in en.pairingOutcome
  )
    return typeof d.male === 'string'
      ? t('text.pairingOnWith', { date: d.on, male: d.male, minutes: d.durationMinutes, outcome: t(`pairingOutcome.${d.outcome}`) })
      : t('text.pairingOn', { date: d.on, minutes: d.durationMinutes, outcome: t(`pairingOutcome.${d.outcome}`) });
  if (e.kind === 'project.ended' && typeof d.reason === 'string' && d.reason in en.endedEarly)
    return t('text.endedEarly', { reason: t(`endedEarly.${d.reason}`) });
  return e.summary;
}
