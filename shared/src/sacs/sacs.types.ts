import type { ValueSource } from '../collection/species.types.js';
import type { AcknowledgedWarnings } from '../errors/plausibility.js';
import type { CalendarDate } from '../breeding/calendar-day.js';
import type { BroodStage } from '../breeding/brood-stage.js';
import type { PullWindowView } from '../breeding/pull-window.js';
import type { RollStatus } from '../breeding/roll-schedule.js';
import type { BandSide, IncubationBand, Range } from './incubation-band.js';

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
  /** The keeper leaves the sac with the mother on purpose: no pull window warnings; opened or emerged there. */
  leftWithMother?: boolean;
  /** Keep rolling after the legs have formed, until first instar. */
  rollPastLegs?: boolean;
  /** The incubator or container the sac sits in, in the keeper's words. */
  container?: string | null;
  /** The sac's own target band (°C); null falls back to the default band. */
  temperatureBand?: Range | null;
  /** The sac's own target band (% relative humidity); null falls back to the default band. */
  humidityBand?: Range | null;
}

/** Records the pull (now, or at an earlier instant); owner, or caretaker where the project allows it. */
export interface PullSacRequest {
  pulledAt?: string;
}

/** The project's switch: may caretakers record the pull and the opening? Owner only. */
export interface IncubatorRightsRequest {
  caretakersMayPullAndOpen: boolean;
}

export interface IncubatorRightsResponse {
  projectId: string;
  caretakersMayPullAndOpen: boolean;
}

export interface UpdateSacRequest {
  layDate?: CalendarDate;
  /** An instant sets the sac as pulled; null puts it back with the mother (a mistaken entry). */
  pulledAt?: string | null;
  outcome?: SacOutcomeState;
  failureReason?: SacFailureReason | null;
  /** Only with the outcome `failed`: the keeper's own words, sent to every partner with the facts. */
  partnerMessage?: string;
  /** Both set, or both null to fall back to the species / default window. */
  pullFromDay?: number | null;
  pullToDay?: number | null;
  rollIntervalHours?: number;
  rollingOff?: boolean;
  notes?: string | null;
  leftWithMother?: boolean;
  rollPastLegs?: boolean;
  container?: string | null;
  temperatureBand?: Range | null;
  humidityBand?: Range | null;
}

/** The latest reading of a kind (not struck) when it lies outside the sac's band. */
export interface ReadingAlert {
  kind: 'temperature' | 'humidity';
  /** °C or % relative humidity. */
  value: number;
  at: string;
  side: BandSide;
}

/** What the viewer may do with this sac; the interface offers nothing else. */
export interface SacPermissions {
  /** Change the sac's settings, outcome and choices (owner). */
  edit: boolean;
  /** Record the pull and the opening (owner; caretakers where the project allows it). */
  pullAndOpen: boolean;
  /** Add care log entries and brood counts (owner, caretakers). */
  log: boolean;
  /** Set the project's switch for caretakers (owner). */
  setIncubatorRights: boolean;
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
  /** The window in force; `origin` says whose it is (the keeper's for this sac, the species', the usual default) and `source` where a species or default figure comes from. */
  pullWindow: PullWindowView & { fromDay: number; toDay: number; origin: PullWindowOrigin; source: ValueSource | null };
  rollIntervalHours: number;
  rollingOff: boolean;
  /** Left with the mother by the keeper's choice (not pulled; no pull window warnings). */
  leftWithMother: boolean;
  /** Rolling goes on past eggs with legs, until first instar. */
  rollPastLegs: boolean;
  /** The stage at which rolling stops for this sac. */
  rollingStopsAt: BroodStage;
  container: string | null;
  /** The band in force; `origin` says whether the sac set it or the default applies (with its source). */
  band: IncubationBand & { origin: 'sac' | 'default'; source: string };
  /** The latest temperature and humidity readings that lie outside the band. */
  readingAlerts: ReadingAlert[];
  /** True while the sac sits in an incubator: pulled and neither failed nor emerged. */
  inIncubator: boolean;
  may: SacPermissions;
  /** The project's switch (see IncubatorRightsRequest). */
  caretakersMayPullAndOpen: boolean;
  /** Null when rolling does not apply (left with the mother, the legs formed, or turned off). */
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

/** Asks what the partners will read if the sac is recorded as failed now (nothing is written). */
export interface FailureNoticePreviewRequest {
  failureReason: SacFailureReason;
  partnerMessage?: string;
}

/** The update as a partner reads it, in the keeper's language, and how many will get it. */
export interface FailureNoticePreview {
  title: string;
  body: string;
  /** Partners with an account (in-app and e-mail as they chose). */
  members: number;
  /** Partners without an account who have an e-mail address (e-mail only). */
  outsideParties: number;
}
