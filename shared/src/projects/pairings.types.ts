import type { CalendarDate } from '../breeding/calendar-day.js';
import type { PairingOutcome } from '../breeding/pairing.types.js';

export interface CreatePairingRequest {
  /** ISO 8601 instant the male was introduced. */
  startedAt: string;
  durationMinutes: number;
  outcome: PairingOutcome;
  notes?: string | null;
}

export interface PairingResponse {
  id: string;
  startedAt: string;
  /** The calendar date in the project owner's time zone, as stages and warnings count it. */
  on: CalendarDate;
  durationMinutes: number;
  outcome: PairingOutcome;
  notes: string | null;
  recordedBy: { id: string; name: string };
  createdAt: string;
}
