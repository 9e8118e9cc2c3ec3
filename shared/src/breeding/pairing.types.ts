import type { CalendarDate } from './calendar-day.js';
import type { BroodStage } from './brood-stage.js';

/** How a pairing attempt went (our own list). Only `connected` can fertilise a sac. */
export type PairingOutcome = 'connected' | 'interest-only' | 'female-refused' | 'aggression' | 'male-lost';

export const PAIRING_OUTCOMES: readonly PairingOutcome[] = ['connected', 'interest-only', 'female-refused', 'aggression', 'male-lost'];

export interface PairingFact {
  on: CalendarDate;
  outcome: PairingOutcome;
}

/**
 * How a sac fares, as the stage derivation sees it: `developing` until it fails; a sac whose young died
 * or were eaten later is `failed` / `eaten` too. (The stored state of a sac is `SacOutcomeState`.)
 */
export type SacFate = 'developing' | 'failed' | 'eaten';

export interface SacFact {
  id?: string;
  layDate: CalendarDate;
  /** Day the sac was taken from the mother; null/absent while she keeps it. */
  pulledOn?: CalendarDate | null;
  fate: SacFate;
  /** Most advanced stage recorded for its young. */
  broodStage?: BroodStage | null;
}

/** What the terms say happens when a project fails: nothing is owed, or the deal carries over to the next sac. */
export type FailureClause = 'nothing-owed' | 'carries-over';
