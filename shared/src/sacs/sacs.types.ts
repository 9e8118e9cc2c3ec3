import type { AcknowledgedWarnings } from '../errors/plausibility.js';
import type { CalendarDate } from '../breeding/calendar-day.js';
import type { BroodStage } from '../breeding/brood-stage.js';
import type { PullWindowView } from '../breeding/pull-window.js';
import type { RollStatus } from '../breeding/roll-schedule.js';

/**
 * How a sac ended up; `failed` carries a reason. `emerged`: the young are out of the sac. (Not "hatched":
 * the eggs hatch inside the sac weeks before the young leave it, so that word would name an earlier step.)
 */
export const SAC_OUTCOMES = ['in-progress', 'emerged', 'failed'] as const;
export type SacOutcomeState = (typeof SAC_OUTCOMES)[number];

export const SAC_FAILURE_REASONS = ['infertile', 'spoiled', 'eaten', 'other'] as const;
export type SacFailureReason = (typeof SAC_FAILURE_REASONS)[number];

/** Limits the server enforces on per-sac settings. */
export const ROLL_INTERVAL_LIMITS = Object.freeze({ minHours: 1, maxHours: 72 });
export const PULL_DAY_MAX = 120;

export interface CreateSacRequest extends AcknowledgedWarnings {
  /** Calendar date in the keeper's time zone; today or earlier. */
  layDate: CalendarDate;
  /** Set when the sac has already been taken from the mother (an instant, ISO 8601). */
  pulledAt?: string | null;
  pullFromDay?: number | null;
  pullToDay?: number | null;
  rollIntervalHours?: number;
  rollingOff?: boolean;
  notes?: string | null;
}

export interface UpdateSacRequest {
  layDate?: CalendarDate;
  /** An instant sets the sac as pulled; null puts it back with the mother (a mistaken entry). */
  pulledAt?: string | null;
  outcome?: SacOutcomeState;
  failureReason?: SacFailureReason | null;
  /** Both set, or both null to fall back to the species / default window. */
  pullFromDay?: number | null;
  pullToDay?: number | null;
  rollIntervalHours?: number;
  rollingOff?: boolean;
  notes?: string | null;
}

/** Where the pull window in force comes from. */
export type PullWindowOrigin = 'sac' | 'species' | 'default';

export interface SacRollView {
  /** Instant the next roll is due (ISO 8601). */
  due: string;
  status: RollStatus;
  /** Last roll that counts (not struck), if any. */
  lastRollAt: string | null;
}

export interface SacResponse {
  id: string;
  projectId: string;
  layDate: CalendarDate;
  /** Day N for the viewer today (lay date = day 0, the viewer's own time zone). */
  dayNumber: number;
  /** The viewer's date used for `dayNumber` and the pull window state. */
  today: CalendarDate;
  pulled: boolean;
  pulledAt: string | null;
  /** The calendar date of the pull in the recorder's time zone, fixed when recorded. */
  pulledOn: CalendarDate | null;
  outcome: SacOutcomeState;
  failureReason: SacFailureReason | null;
  pullWindow: PullWindowView & { fromDay: number; toDay: number; origin: PullWindowOrigin };
  rollIntervalHours: number;
  rollingOff: boolean;
  /** Null when rolling does not apply (left with the mother, first instar reached, or turned off). */
  roll: SacRollView | null;
  broodStage: BroodStage;
  opened: boolean;
  /** Latest alive count of the brood; null before the opening. */
  currentCount: number | null;
  /** The latest count is an estimate: show "about N". */
  currentCountEstimated: boolean;
  notes: string | null;
  /** Why an unusual lay date was saved despite a warning. */
  warningReason: string | null;
  /** Present for a pulled sac: the heat-source caution the incubator view shows. */
  incubatorCaution: string | null;
  createdAt: string;
  updatedAt: string;
}
