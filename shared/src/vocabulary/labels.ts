import type { EndedEarlyReason, ProjectStage } from '../breeding/project-stage.js';
import type { MaleClockState } from '../collection/male-clock.js';
import type { SacOutcomeState } from '../sacs/sacs.types.js';

/**
 * The interface's words for states several screens show, kept here once so the
 * dashboard, the project pages and the collection never disagree.
 */
export const PROJECT_STAGE_LABELS: Record<ProjectStage, string> = {
  planned: 'Planned',
  paired: 'Paired',
  'waiting-for-sac': 'Waiting for sac',
  'sac-laid': 'Sac laid',
  'in-incubator': 'In incubator',
  brood: 'Brood',
  'shares-settled': 'Shares settled',
  closed: 'Closed',
  'ended-early': 'Ended early',
};

export const ENDED_EARLY_LABELS: Record<EndedEarlyReason, string> = {
  'no-sac': 'no sac',
  'female-molted': 'the female molted',
  'sac-failed': 'the sac failed',
  'sac-eaten': 'the sac was eaten',
  'male-died': 'the male died before pairing',
};

export const SAC_OUTCOME_LABELS: Record<SacOutcomeState, string> = { 'in-progress': 'In progress', emerged: 'Young emerged', failed: 'Failed' };

/** Male clock states in our own words, with the advice each one carries. */
export const MALE_CLOCK_LABELS: Record<MaleClockState, { label: string; hint: string }> = {
  fresh: { label: 'Just matured', hint: 'Give him time to build his first sperm web before pairing.' },
  prime: { label: 'Ready to pair', hint: 'His best time for pairings.' },
  late: { label: 'Time running short', hint: 'He is into the range where males of his group usually die; pair him soon.' },
  'past-typical': { label: 'Beyond the usual span', hint: 'He has outlived the typical range for his group; any pairing now is a bonus.' },
};
