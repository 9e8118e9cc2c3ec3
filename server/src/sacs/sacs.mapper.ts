import {
  INCUBATOR_CAUTION,
  dayNumber,
  outsideRange,
  pullWindowView,
  rollState,
  rollingStopsAt,
  sacPermissions,
  type ProjectRole,
  type PullWindowOrigin,
  type ReadingAlert,
  type SacFact,
  type SacResponse,
  type ValueSource,
} from '@broodsilk/shared';
import type { Sac } from './sac.entity';
import type { LatestCare } from './sac-queries';
import { bandOf } from './sac-band';

export interface PullWindowInForce {
  fromDay: number;
  toDay: number;
  origin: PullWindowOrigin;
  /** Where a species or default window comes from; null for the keeper's own window. */
  source: ValueSource | null;
}

export interface SacViewContext {
  /** The viewer's calendar date now. */
  today: string;
  now: Date;
  window: PullWindowInForce;
  care: LatestCare;
  role: ProjectRole;
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
    rollPastLegs: sac.rollPastLegs,
    pulledAt: sac.pulledAt ?? now,
    lastRollAt,
    intervalHours: sac.rollIntervalHours,
    now,
  });
  return state ? { due: state.due.toISOString(), status: state.status, lastRollAt: lastRollAt?.toISOString() ?? null } : null;
}

/** The latest temperature and humidity readings that lie outside the band. */
function readingAlerts(band: SacResponse['band'], care: LatestCare): ReadingAlert[] {
  const alerts: ReadingAlert[] = [];
  for (const [kind, reading, range] of [
    ['temperature', care.temperature, band.temperatureC],
    ['humidity', care.humidity, band.humidityPercent],
  ] as const) {
    const side = reading ? outsideRange(reading.value, range) : null;
    if (reading && side) alerts.push({ kind, value: reading.value, at: reading.at.toISOString(), side });
  }
  return alerts;
}

export function toSacResponse(sac: Sac, c: SacViewContext): SacResponse {
  const view = pullWindowView(sac.layDate, c.today, c.window);
  const band = bandOf(sac);
  const inIncubator = !!sac.pulledAt && sac.outcome === 'in-progress';
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
    pullWindow: { ...view, fromDay: c.window.fromDay, toDay: c.window.toDay, origin: c.window.origin, source: c.window.source },
    rollIntervalHours: sac.rollIntervalHours,
    rollingOff: sac.rollingOff,
    // An opened sac is not rolled: its eggs are counted, and any kept back are a batch with its own log.
    roll: c.opened ? null : rollOf(sac, c.now, c.care.lastRollAt ?? null),
    leftWithMother: sac.leftWithMother,
    rollPastLegs: sac.rollPastLegs,
    rollingStopsAt: rollingStopsAt(sac.rollPastLegs),
    container: sac.container ?? null,
    band,
    readingAlerts: inIncubator ? readingAlerts(band, c.care) : [],
    inIncubator,
    may: sacPermissions(c.role, sac.project.caretakersMayPullAndOpen),
    caretakersMayPullAndOpen: sac.project.caretakersMayPullAndOpen,
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
