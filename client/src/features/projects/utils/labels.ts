import { ENDED_EARLY_LABELS, PROJECT_STAGE_LABELS } from '@broodsilk/shared';
import type { EndedEarlyReason, FailureClause, PairingOutcome, ProjectRole, ProjectStage, ShippingPayer, WarningSeverity } from '@broodsilk/shared';

/** The progress line in our own words (docs/product.md, Project stages); the words live in shared/ so every screen agrees. */
export const STAGE_LABELS = PROJECT_STAGE_LABELS;
export { ENDED_EARLY_LABELS };

export const PAIRING_OUTCOME_LABELS: Record<PairingOutcome, string> = {
  connected: 'Connected',
  'interest-only': 'Interest only',
  'female-refused': 'Female refused',
  aggression: 'Aggression, separated',
  'male-lost': 'Male lost',
};

export const ROLE_LABELS: Record<ProjectRole, string> = { owner: 'Keeper (runs it)', partner: 'Partner', caretaker: 'Caretaker' };

export const FAILURE_CLAUSE_LABELS: Record<FailureClause, string> = {
  'nothing-owed': 'Nothing is owed if it fails',
  'carries-over': 'Carries over to the next sac',
};

export const SHIPPING_LABELS: Record<ShippingPayer, string> = { sender: 'Sender pays', recipient: 'Recipient pays', split: 'Split between both' };

export const SEVERITY_COLOURS: Record<WarningSeverity, string> = { danger: 'clay', warning: 'amber', info: 'moss' };

/** "Ended early: the female molted" for an ended project, else the stage's own name. */
export function stageText(stage: ProjectStage, reason?: EndedEarlyReason): string {
  if (stage === 'ended-early') return reason ? `Ended early: ${ENDED_EARLY_LABELS[reason]}` : 'Ended early';
  return STAGE_LABELS[stage];
}
