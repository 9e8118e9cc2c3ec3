import { diffDays, type CalendarDate } from '../breeding/calendar-day.js';
import { PAIRING_TO_SAC_MAX_DAYS } from '../breeding/pairing-warnings.js';
import type { PairingFact } from '../breeding/pairing.types.js';
import { plausibilityWarning, type PlausibilityWarning } from '../errors/plausibility.js';

export interface SacLayFacts {
  layDate: CalendarDate;
  /** The project's pairings in force (corrected ones left out). */
  pairings: readonly PairingFact[];
  /** The species' (or its group's) shortest usual time from pairing to sac, in days. */
  minDays: number;
}

/**
 * A sac is laid after a successful pairing: warn when none is recorded before it, when it comes
 * sooner than the species' minimum after the last one, or more than a year after it (TRADE-FACTS §3).
 */
export function sacLayWarnings(f: SacLayFacts): PlausibilityWarning[] {
  const last = f.pairings
    .filter((p) => p.outcome === 'connected' && p.on <= f.layDate)
    .map((p) => p.on)
    .sort()
    .at(-1);
  if (!last) {
    return [plausibilityWarning('sac-without-pairing', { layDate: f.layDate })];
  }
  const days = diffDays(last, f.layDate);
  if (days < f.minDays) {
    return [plausibilityWarning('sac-soon-after-pairing', { count: days, paired: last, minDays: f.minDays })];
  }
  if (days > PAIRING_TO_SAC_MAX_DAYS) {
    return [plausibilityWarning('sac-long-after-pairing', { days, paired: last })];
  }
  return [];
}

/** A pairing before the male's maturing molt: he could not have carried sperm (common practice). */
export function pairingBeforeMaturingWarnings(on: CalendarDate, maleMaturedOn: CalendarDate | null): PlausibilityWarning[] {
  if (!maleMaturedOn || on >= maleMaturedOn) return [];
  return [plausibilityWarning('pairing-before-male-matured', { on, matured: maleMaturedOn })];
}
