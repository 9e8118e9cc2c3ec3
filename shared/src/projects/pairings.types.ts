import type { CalendarDate } from '../breeding/calendar-day.js';
import type { PairingOutcome } from '../breeding/pairing.types.js';
import type { AcknowledgedWarnings } from '../errors/plausibility.js';

export interface CreatePairingRequest extends AcknowledgedWarnings {
  /** ISO 8601 instant the male was introduced. */
  startedAt: string;
  durationMinutes: number;
  outcome: PairingOutcome;
  notes?: string | null;
  /**
   * The male put in: the project's first male when left out. Another male must be mature and the
   * keeper's own or on loan to them (a backup male, a replacement after a death).
   */
  maleId?: string;
  /** Correcting a recorded pairing: its id (it stays, struck) and why it was wrong. */
  corrects?: string;
  reason?: string;
}

export interface PairingResponse {
  id: string;
  startedAt: string;
  /** The calendar date in the project owner's time zone, as stages and warnings count it. */
  on: CalendarDate;
  male: { id: string; label: string };
  durationMinutes: number;
  outcome: PairingOutcome;
  notes: string | null;
  recordedBy: { id: string; name: string };
  createdAt: string;
  corrects: string | null;
  reason: string | null;
  /** Set when a later pairing corrected this one: it no longer counts. */
  struckBy: string | null;
  /** Why an unusual pairing was saved despite a warning. */
  warningReason: string | null;
}
