import { INCUBATOR_CAUTION, dayNumber, pullWindowView, rollState, type PullWindowOrigin, type SacFact, type SacResponse } from '@broodsilk/shared';
import type { Sac } from './sac.entity';

export interface PullWindowInForce {
  fromDay: number;
  toDay: number;
  origin: PullWindowOrigin;
}

export interface SacViewContext {
  /** The viewer's calendar date now. */
  today: string;
  now: Date;
  window: PullWindowInForce;
  lastRollAt: Date | null;
  opened: boolean;
  currentCount: number | null;
  currentCountEstimated: boolean;
}

/** The roll state of a sac (null when rolling does not apply), by the roll rule in docs/product.md, Data rules. */
export function rollOf(sac: Sac, now: Date, lastRollAt: Date | null): SacResponse['roll'] {
  const pulled = !!sac.pulledAt && sac.outcome === 'in-progress';
  const state = rollState({
    pulled,
    stage: sac.broodStage,
    rollingOff: sac.rollingOff,
    pulledAt: sac.pulledAt ?? now,
    lastRollAt,
    intervalHours: sac.rollIntervalHours,
    now,
  });
  return state ? { due: state.due.toISOString(), status: state.status, lastRollAt: lastRollAt?.toISOString() ?? null } : null;
}

export function toSacResponse(sac: Sac, c: SacViewContext): SacResponse {
  const view = pullWindowView(sac.layDate, c.today, c.window);
  return {
    id: sac.id,
    projectId: sac.project.id,
    layDate: sac.layDate,
    dayNumber: dayNumber(sac.layDate, c.today),
    today: c.today,
    pulled: !!sac.pulledAt,
    pulledAt: sac.pulledAt?.toISOString() ?? null,
    pulledOn: sac.pulledOn ?? null,
    outcome: sac.outcome,
    failureReason: sac.failureReason ?? null,
    pullWindow: { ...view, fromDay: c.window.fromDay, toDay: c.window.toDay, origin: c.window.origin },
    rollIntervalHours: sac.rollIntervalHours,
    rollingOff: sac.rollingOff,
    // An opened sac is not rolled: its eggs are counted, and any kept back are a batch with its own log.
    roll: c.opened ? null : rollOf(sac, c.now, c.lastRollAt),
    broodStage: sac.broodStage,
    opened: c.opened,
    currentCount: c.currentCount,
    currentCountEstimated: c.currentCountEstimated,
    notes: sac.notes ?? null,
    warningReason: sac.warningReason ?? null,
    incubatorCaution: sac.pulledAt ? INCUBATOR_CAUTION : null,
    createdAt: sac.createdAt.toISOString(),
    updatedAt: sac.updatedAt.toISOString(),
  };
}

/** What the project stage derivation wants to know about a sac. */
export function toSacFact(sac: Sac): SacFact {
  const fate = sac.outcome !== 'failed' ? 'developing' : sac.failureReason === 'eaten' ? 'eaten' : 'failed';
  return { id: sac.id, layDate: sac.layDate, pulledOn: sac.pulledOn ?? null, fate, broodStage: sac.broodStage };
}
