import type { EndedEarlyReason, ProjectStage } from '../breeding/project-stage.js';
import { en } from './en.js';
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
