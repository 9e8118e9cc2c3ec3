import type { BroodStage } from '../breeding/brood-stage.js';
import type { PhotoRef } from '../collection/animals.types.js';
import type { AcknowledgedWarnings } from '../errors/plausibility.js';

export const BROOD_LOSS_REASONS = ['died', 'failed-molt', 'cannibalism', 'mould', 'escaped', 'other'] as const;
export type BroodLossReason = (typeof BROOD_LOSS_REASONS)[number];

/** Upper bound on any one count: far above the largest sacs reported (about 2000, docs/trade-facts.md §6). */
export const BROOD_COUNT_MAX = 5000;

/** What the keeper counts when a sac is opened; the same numbers go in and come back. */
export interface OpeningCounts {
  healthyEggs: number;
  eggsWithLegs: number;
  nymphs: number;
  /** Dark, non-viable eggs. */
  darkEggs: number;
  spoiledEggs: number;
  /**
   * How many of the viable ones (healthy eggs, eggs with legs, nymphs) are kept back as their own
   * batch for more incubation (doubtful eggs); they join the brood's count only when the batch does.
   */
  keptBack: number;
}

export interface OpeningRequest extends OpeningCounts, AcknowledgedWarnings {
  /** The numbers are an estimate (not counted one by one): the brood's first count is "about". */
  estimated?: boolean;
  /** Instant the sac was opened; defaults to now. */
  openedAt?: string;
  notes?: string | null;
  /** Correcting a recorded opening: its id (it stays, struck) and why it was wrong. */
  corrects?: string;
  reason?: string;
}

export interface OpeningResponse extends OpeningCounts {
  id: string;
  sacId: string;
  openedAt: string;
  /** Healthy eggs + eggs with legs + nymphs; less `keptBack`, the brood's first alive count. */
  viable: number;
  estimated: boolean;
  /** Why counts outside the species' usual range were saved. */
  warningReason: string | null;
  total: number;
  notes: string | null;
  photos: PhotoRef[];
  recordedBy: { id: string; name: string };
  /** The opening this one corrects, and why. */
  corrects: string | null;
  reason: string | null;
  /** Earlier versions this one (or its predecessors) struck, newest first. */
  struck: Omit<OpeningResponse, 'struck' | 'photos'>[];
}

export interface BroodCountRequest extends AcknowledgedWarnings {
  /** Defaults to now; a correction defaults to the instant of the count it corrects. */
  at?: string;
  stage: BroodStage;
  alive: number;
  lost?: number;
  lossReason?: BroodLossReason;
  note?: string | null;
  /** An estimate, not a count one by one. */
  estimated?: boolean;
  /** The id of the count this one corrects (it stays, struck); needs `reason`. */
  corrects?: string;
  reason?: string;
}

export interface BroodCountResponse {
  id: string;
  sacId: string;
  at: string;
  stage: BroodStage;
  alive: number;
  lost: number;
  lossReason: BroodLossReason | null;
  note: string | null;
  /** `opening` for the count the opening starts the brood with. */
  source: 'opening' | 'count';
  recordedBy: { id: string; name: string } | null;
  estimated: boolean;
  /** The count this one corrects, and why. */
  corrects: string | null;
  reason: string | null;
  /** Set when a later count corrected this one: it no longer counts. */
  struckBy: string | null;
  /** Why an unusual count was saved despite a warning. */
  warningReason: string | null;
}

export interface BroodCountsResponse {
  /** Latest alive count not struck: the sac's count of young in care, for shares. */
  current: number | null;
  /** Whether that count is an estimate (shown "about N"; shares from it are provisional). */
  currentEstimated: boolean;
  counts: BroodCountResponse[];
}
