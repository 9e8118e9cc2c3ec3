import { isBroodStageAtLeast, type BroodStage } from './brood-stage.js';

/** Hours between rolls when the keeper sets none: 12 (twice a day, common practice). */
export const DEFAULT_ROLL_INTERVAL_HOURS = 12;
/** A roll is "due soon" in the last hour before it is due. */
export const ROLL_DUE_SOON_MS = 3_600_000;
/** A roll is "overdue" once more than a quarter of the interval has passed since it fell due. */
export const ROLL_OVERDUE_FRACTION = 0.25;

const HOUR_MS = 3_600_000;

/**
 * - `upcoming`: more than an hour before due.
 * - `due-soon`: within the hour before due.
 * - `due`: from the due instant until a quarter of the interval after it (3 h for 12 h), inclusive.
 * - `overdue`: later than that.
 */
export type RollStatus = 'upcoming' | 'due-soon' | 'due' | 'overdue';

export type Instant = string | Date;

function toMs(value: Instant, what: string): number {
  const ms = value instanceof Date ? value.getTime() : Date.parse(value);
  if (Number.isNaN(ms)) throw new RangeError(`The ${what} "${String(value)}" is not a valid date and time.`);
  return ms;
}

function assertInterval(intervalHours: number): void {
  if (!Number.isFinite(intervalHours) || intervalHours <= 0) {
    throw new RangeError(`The roll interval must be a positive number of hours (got ${intervalHours}).`);
  }
}

export interface NextRollInput {
  pulledAt: Instant;
  lastRollAt?: Instant | null;
  intervalHours?: number;
}

/**
 * When the next roll is due. Rolls follow elapsed time, not the wall clock, so a daylight-saving
 * change moves the local hour of the next roll: the first roll is due at the pull, each next one
 * `intervalHours` after the last roll.
 */
export function nextRollDue({ pulledAt, lastRollAt, intervalHours = DEFAULT_ROLL_INTERVAL_HOURS }: NextRollInput): Date {
  assertInterval(intervalHours);
  const pulled = toMs(pulledAt, 'pull time');
  if (lastRollAt === undefined || lastRollAt === null) return new Date(pulled);
  const last = toMs(lastRollAt, 'last roll time');
  if (last < pulled) throw new RangeError('The last roll is recorded before the sac was pulled; check both times.');
  return new Date(last + intervalHours * HOUR_MS);
}

export function rollStatus(now: Instant, due: Instant, intervalHours = DEFAULT_ROLL_INTERVAL_HOURS): RollStatus {
  assertInterval(intervalHours);
  const late = toMs(now, 'current time') - toMs(due, 'due time');
  if (late < -ROLL_DUE_SOON_MS) return 'upcoming';
  if (late < 0) return 'due-soon';
  return late <= intervalHours * HOUR_MS * ROLL_OVERDUE_FRACTION ? 'due' : 'overdue';
}

export interface RollingFacts {
  /** True once the sac has been taken from the mother. */
  pulled: boolean;
  /** Most advanced stage recorded for the brood, if any. */
  stage?: BroodStage | null;
  /** The keeper has turned rolling off for this sac. */
  rollingOff?: boolean;
  /** The keeper keeps rolling after the legs have formed (until first instar). */
  rollPastLegs?: boolean;
}

/**
 * Rolling applies to a pulled sac until the legs have formed (docs/trade-facts.md §4: rolled "until
 * the legs have formed, then left alone"), or until first instar where the keeper chose to keep
 * rolling, and never once the keeper turns it off.
 */
export function rollingApplies({ pulled, stage, rollingOff, rollPastLegs }: RollingFacts): boolean {
  if (!pulled || rollingOff) return false;
  return !stage || !isBroodStageAtLeast(stage, rollingStopsAt(rollPastLegs));
}

/** The stage at which rolling stops: eggs with legs by default, first instar when the keeper keeps rolling. */
export function rollingStopsAt(rollPastLegs = false): BroodStage {
  return rollPastLegs ? 'first-instar' : 'eggs-with-legs';
}

export interface RollState {
  due: Date;
  status: RollStatus;
}

/** Next roll and its status for a dashboard, or null when rolling does not apply. */
export function rollState(facts: RollingFacts & NextRollInput & { now: Instant }): RollState | null {
  if (!rollingApplies(facts)) return null;
  const due = nextRollDue(facts);
  return { due, status: rollStatus(facts.now, due, facts.intervalHours ?? DEFAULT_ROLL_INTERVAL_HOURS) };
}
