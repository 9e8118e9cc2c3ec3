import type { BroodStage } from '../breeding/brood-stage.js';
import type { TemperatureUnit } from '../auth/auth.types.js';

export const CARE_LOG_KINDS = ['roll', 'temperature', 'humidity', 'check', 'stage', 'note', 'strike'] as const;
export type CareLogKind = (typeof CARE_LOG_KINDS)[number];

/** Plausible incubator readings; outside them an entry is refused as a likely typo. */
export const TEMPERATURE_LIMITS_C = Object.freeze({ min: 5, max: 45 });
export const HUMIDITY_LIMITS = Object.freeze({ min: 0, max: 100 });
/** Clocks disagree a little; an entry up to a minute ahead of the server is still "now". */
export const LOG_FUTURE_TOLERANCE_MS = 60_000;

export interface CareLogRequest {
  kind: CareLogKind;
  /** Instant (ISO 8601 with offset); defaults to now. */
  at?: string;
  temperature?: { value: number; unit: TemperatureUnit };
  humidityPercent?: number;
  stage?: BroodStage;
  /** Note text; the reason for a strike. */
  text?: string;
  /** For `strike`: the entry it corrects. */
  strikes?: string;
  reason?: string;
}

export interface CareLogEntryResponse {
  id: string;
  sacId: string;
  kind: CareLogKind;
  at: string;
  author: { id: string; name: string } | null;
  /** Stored in °C. */
  temperatureC: number | null;
  /** What the person typed, for the record. */
  entered: { value: number; unit: TemperatureUnit } | null;
  humidityPercent: number | null;
  stage: BroodStage | null;
  text: string | null;
  /** A temperature or humidity reading outside the sac's band in force: which side; null inside or for other kinds. */
  outsideBand: 'below' | 'above' | null;
  /** For a strike: the entry it strikes. */
  strikes: string | null;
  /** Set when a later strike entry corrected this one; the entry stays visible. */
  struck: { byEntryId: string; reason: string | null; at: string } | null;
  createdAt: string;
}
