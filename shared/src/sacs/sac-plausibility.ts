import { diffDays, type CalendarDate } from '../breeding/calendar-day.js';
import { PAIRING_TO_SAC_MAX_DAYS } from '../breeding/pairing-warnings.js';
import type { PairingFact } from '../breeding/pairing.types.js';
import type { PlausibilityWarning } from '../errors/plausibility.js';

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
    return [
      {
        code: 'sac-without-pairing',
        message: `No successful pairing is recorded on or before ${f.layDate}. Record the pairing first, or save the sac with a reason (e.g. paired before she came to you).`,
      },
    ];
  }
  const days = diffDays(last, f.layDate);
  if (days < f.minDays) {
    return [
      {
        code: 'sac-soon-after-pairing',
        message: `The sac would be laid ${days} days after the last successful pairing (${last}); this species usually needs at least ${f.minDays} days. Check the dates.`,
      },
    ];
  }
  if (days > PAIRING_TO_SAC_MAX_DAYS) {
    return [
      {
        code: 'sac-long-after-pairing',
        message: `The sac would be laid ${days} days after the last successful pairing (${last}), more than a year. Check the dates, or record a later pairing.`,
      },
    ];
  }
  return [];
}

/** A pairing before the male's maturing molt: he could not have carried sperm (common practice). */
export function pairingBeforeMaturingWarnings(on: CalendarDate, maleMaturedOn: CalendarDate | null): PlausibilityWarning[] {
  if (!maleMaturedOn || on >= maleMaturedOn) return [];
  return [
    {
      code: 'pairing-before-male-matured',
      message: `The pairing (${on}) is dated before the male's maturing molt (${maleMaturedOn}); an immature male cannot pair. Check the dates.`,
    },
  ];
}
