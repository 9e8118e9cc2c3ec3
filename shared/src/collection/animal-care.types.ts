import type { BroodStage } from '../breeding/brood-stage.js';
import type { PairingOutcome, SacFate } from '../breeding/pairing.types.js';
import type { DerivedProjectStage } from '../breeding/project-stage.js';

/** ISO 8601 calendar date, `YYYY-MM-DD`. */
type DateString = string;

/**
 * One feeding. Never edited: a correction is a new entry that `strikes` the old one, with a reason
 * (each entry can be struck once).
 */
export interface CreateFeedingRequest {
  fedOn: DateString;
  /** The prey in the keeper's words, e.g. "2 adult crickets". */
  prey: string;
  /** True when she took it, false when she refused it. */
  taken: boolean;
  note?: string | null;
  /** Id of the entry this one corrects. */
  strikes?: string | null;
  /** Why the struck entry was wrong; required with `strikes`. */
  reason?: string | null;
}

export interface FeedingResponse {
  id: string;
  fedOn: DateString;
  prey: string;
  taken: boolean;
  note: string | null;
  /** The entry this one corrects, and why. */
  strikes: { id: string; reason: string } | null;
  /** Set when a later entry corrected this one: it no longer counts. */
  struckBy: string | null;
  createdAt: string;
}

/** A dated step in an animal's life: premolt flagged or over, a sperm web seen, back to the owner, death. */
export interface AnimalDateRequest {
  on: DateString;
}

/** `GET /api/animals/:id/breeding`: every project the animal is in, newest first. */
export interface AnimalBreedingRow {
  project: { id: string; title: string };
  /** The animal's part in the project. */
  role: 'female' | 'male';
  /** The other animal's label. */
  partnerLabel: string;
  stage: DerivedProjectStage;
  pairings: { on: DateString; outcome: PairingOutcome }[];
  sacs: { id: string | null; layDate: DateString; pulledOn: DateString | null; fate: SacFate; broodStage: BroodStage | null }[];
}
