import type { CalendarDate } from '../breeding/calendar-day.js';
import type { BroodStage } from '../breeding/brood-stage.js';
import type { FailureClause } from '../breeding/pairing.types.js';
import type { EndedEarlyReason, ProjectSetback, ProjectStage } from '../breeding/project-stage.js';
import type { PhotoRef } from '../collection/animals.types.js';
import type { SacFailureReason, SacOutcomeState } from '../sacs/sacs.types.js';
import type { ProjectRole } from './project.types.js';

/**
 * The activity kinds an outside party's progress page shows: facts about the animals and the sacs,
 * never names, terms negotiations or money (those events name other parties).
 */
export const PROGRESS_TIMELINE_KINDS = [
  'project.created',
  'project.ended',
  'project.reopened',
  'project.closed',
  'pairing.recorded',
  'sac.laid',
  'sac.pulled',
  'sac.left-with-mother',
  'sac.failed',
  'sac.opened',
  'brood.counted',
  'male.died',
] as const;
export type ProgressTimelineKind = (typeof PROGRESS_TIMELINE_KINDS)[number];

/** Answer of issuing (or rotating) a progress link: the address, shown once; only its hash is kept. */
export interface ProgressLinkResponse {
  url: string;
}

export interface ProgressTimelineEvent {
  id: string;
  /** One of PROGRESS_TIMELINE_KINDS; the page names it with the catalogue's `activityKind`. */
  kind: ProgressTimelineKind;
  at: string;
}

export interface ProgressSacView {
  id: string;
  layDate: CalendarDate;
  pulledOn: CalendarDate | null;
  /** The instant of the opening in force; null while the sac is closed. */
  openedAt: string | null;
  outcome: SacOutcomeState;
  failureReason: SacFailureReason | null;
  broodStage: BroodStage;
  /** Latest alive count of the brood; null before the opening. */
  currentCount: number | null;
  currentCountEstimated: boolean;
  /** Photos of the opening; their addresses work only through this link. */
  photos: PhotoRef[];
}

/** This party's part of the deal: its share per sac and in total, nothing of the other parties. */
export interface ProgressShareView {
  termsInForce: boolean;
  failureClause: FailureClause | null;
  sacs: { sacId: string; layDate: CalendarDate; count: number; failed: boolean }[];
  /** Young owed by the terms, summed over the sacs. */
  total: number;
  handedOver: number;
  /** total − handed over, sold and cashed out. */
  stillOwed: number;
  /** A count behind the share is an estimate: the share is "about" and may change. */
  provisional: boolean;
}

/** What `GET /api/progress/:token` answers: read-only, for one outside party of one project. */
export interface ProgressView {
  project: {
    title: string;
    stage: ProjectStage;
    endedEarlyReason: EndedEarlyReason | null;
    setback: ProjectSetback | null;
    female: { scientificName: string };
    male: { scientificName: string };
  };
  party: { name: string; role: ProjectRole };
  /** Newest first. */
  timeline: ProgressTimelineEvent[];
  sacs: ProgressSacView[];
  share: ProgressShareView;
  generatedAt: string;
}
