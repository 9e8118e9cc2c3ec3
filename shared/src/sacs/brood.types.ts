import type { BroodStage } from '../breeding/brood-stage.js';
import type { PhotoRef } from '../collection/animals.types.js';

export const BROOD_LOSS_REASONS = ['died', 'failed-molt', 'cannibalism', 'mould', 'escaped', 'other'] as const;
export type BroodLossReason = (typeof BROOD_LOSS_REASONS)[number];

/** Upper bound on any one count: far above the largest sacs reported (about 2000, docs/trade-facts.md §6). */
export const BROOD_COUNT_MAX = 5000;

export interface OpeningRequest {
  /** Instant the sac was opened; defaults to now. */
  openedAt?: string;
  healthyEggs: number;
  eggsWithLegs: number;
  nymphs: number;
  /** Dark, non-viable eggs. */
  darkEggs: number;
  spoiledEggs: number;
  /** How many of the viable ones (healthy eggs, eggs with legs, nymphs) go back into incubation. */
  keptBack: number;
  notes?: string | null;
}

export interface OpeningResponse {
  id: string;
  sacId: string;
  openedAt: string;
  healthyEggs: number;
  eggsWithLegs: number;
  nymphs: number;
  darkEggs: number;
  spoiledEggs: number;
  keptBack: number;
  /** Healthy eggs + eggs with legs + nymphs: the brood's first alive count. */
  viable: number;
  total: number;
  notes: string | null;
  photos: PhotoRef[];
  recordedBy: { id: string; name: string };
}

export interface BroodCountRequest {
  at?: string;
  stage: BroodStage;
  alive: number;
  lost?: number;
  lossReason?: BroodLossReason;
  note?: string | null;
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
}

export interface BroodCountsResponse {
  /** Latest alive count: the sac's count of young in care, for shares. */
  current: number | null;
  counts: BroodCountResponse[];
}
