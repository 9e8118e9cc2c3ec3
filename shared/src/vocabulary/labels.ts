import type { EndedEarlyReason, ProjectStage } from '../breeding/project-stage.js';
import type { MaleClockState } from '../collection/male-clock.js';
import type { PairingOutcome, SacFate } from '../breeding/pairing.types.js';
import type { SacOutcomeState } from '../sacs/sacs.types.js';
import type { NotificationKind } from '../dashboard/notifications.types.js';
import type { ReminderChannel } from '../reminders/reminder-preferences.types.js';

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

export const PAIRING_OUTCOME_LABELS: Record<PairingOutcome, string> = {
  connected: 'Connected',
  'interest-only': 'Interest only',
  'female-refused': 'Female refused',
  aggression: 'Aggression, separated',
  'male-lost': 'Male lost',
};

/** How a sac fares, as the stage rules see it. */
export const SAC_FATE_LABELS: Record<SacFate, string> = { developing: 'Developing', failed: 'Failed', eaten: 'Eaten by the mother' };

/** Reminder kinds as the settings and the inbox name them. */
export const NOTIFICATION_KIND_LABELS: Record<NotificationKind, string> = {
  'roll-due': 'A roll falls due',
  'roll-overdue': 'A roll is overdue',
  'pull-window-opens': 'A pull window opens',
  'pull-window-closes': 'A pull window closes in 2 days',
  'male-clock': 'A male’s clock moves on',
  'reading-out-of-band': 'A reading is outside the target band',
  'female-molted': 'A female molted after pairing',
  'loan-due-back': 'A loaned animal is due back in 7 days',
  'daily-digest': 'The daily digest',
};

export const REMINDER_CHANNEL_LABELS: Record<ReminderChannel, string> = {
  both: 'E-mail and in-app',
  email: 'E-mail only',
  'in-app': 'In-app only',
  off: 'Off',
};
