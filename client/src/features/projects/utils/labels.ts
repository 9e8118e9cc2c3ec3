import { projectStageText } from '@broodsilk/shared';
import type { EndedEarlyReason, ProjectStage, WarningSeverity } from '@broodsilk/shared';
import { catalogueLabels, i18next, words } from '@/lib/i18n';

/** The progress line in our own words (docs/product.md, Project stages); the words live in shared/ so every screen agrees. */
export const STAGE_LABELS = catalogueLabels('projectStage');
export const ENDED_EARLY_LABELS = catalogueLabels('endedEarly');
export const PAIRING_OUTCOME_LABELS = catalogueLabels('pairingOutcome');
export const ROLE_LABELS = catalogueLabels('role');
export const FAILURE_CLAUSE_LABELS = catalogueLabels('failureClause');
export const SHIPPING_LABELS = catalogueLabels('shippingPayer');

export const SEVERITY_COLOURS: Record<WarningSeverity, string> = { danger: 'clay', warning: 'amber', info: 'moss' };

/** A label inside a sentence: lower-cased in English, kept as it is in German (nouns keep their capitals). */
export function midSentence(label: string): string {
  return i18next.language === 'de' ? label : label.toLowerCase();
}

/** "Ended early: the female molted" for an ended project, else the stage's own name. */
export function stageText(stage: ProjectStage, reason?: EndedEarlyReason): string {
  return projectStageText(words, stage, reason);
}
