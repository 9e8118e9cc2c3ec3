import type { MaleClockState, PullWindowState, RollStatus } from '@broodsilk/shared';

/**
 * How a state is coloured: a text tone class (AA contrast in both schemes, see
 * styles/tones.css) and the Mantine colour for fills and badges. One map per
 * state, so the dashboard, the sac pages and the collection colour alike.
 */
export interface ToneStyle {
  tone: '' | 'tone-ok' | 'tone-due' | 'tone-failed';
  color: 'gray' | 'moss' | 'amber' | 'clay';
}

const QUIET: ToneStyle = { tone: '', color: 'gray' };
const OK: ToneStyle = { tone: 'tone-ok', color: 'moss' };
const DUE: ToneStyle = { tone: 'tone-due', color: 'amber' };
const FAILED: ToneStyle = { tone: 'tone-failed', color: 'clay' };

export const ROLL_STATUS_TONE: Record<RollStatus, ToneStyle> = { upcoming: QUIET, 'due-soon': DUE, due: DUE, overdue: FAILED };
export const PULL_WINDOW_TONE: Record<PullWindowState, ToneStyle> = { 'not-yet': QUIET, open: OK, closing: DUE, past: FAILED };
export const MALE_CLOCK_TONE: Record<MaleClockState, ToneStyle> = { fresh: OK, prime: OK, late: DUE, 'past-typical': FAILED };
