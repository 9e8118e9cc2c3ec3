/**
 * The eggs kept back at an opening for more incubation: their own batch under the same sac, with
 * its own rolls and checks, ending either in the brood (the count rule then lets the brood grow by
 * that many) or written off. Dates and reasons go in and come back as given.
 */
export const KEPT_BACK_STATES = ['incubating', 'joined', 'written-off'] as const;
export type KeptBackState = (typeof KEPT_BACK_STATES)[number];

/** The words every screen shows for a batch's state. */
export const KEPT_BACK_STATE_LABELS: Record<KeptBackState, string> = {
  incubating: 'Still incubating',
  joined: 'Joined the brood',
  'written-off': 'Written off',
};

export const KEPT_BACK_LOG_KINDS = ['roll', 'check', 'strike'] as const;
export type KeptBackLogKind = (typeof KEPT_BACK_LOG_KINDS)[number];

export interface KeptBackLogRequest {
  kind: KeptBackLogKind;
  /** Defaults to now; never in the future. */
  at?: string;
  /** What a check found (optional for a roll). */
  note?: string | null;
  /** A strike: the id of the entry it strikes (which stays, struck) and why. */
  strikes?: string;
  reason?: string;
}

export interface KeptBackLogEntryResponse {
  id: string;
  kind: KeptBackLogKind;
  at: string;
  note: string | null;
  recordedBy: { id: string; name: string } | null;
  strikes: string | null;
  /** Set when a later strike corrected this entry: it no longer counts. */
  struckBy: string | null;
}

export interface KeptBackEndRequest {
  outcome: Exclude<KeptBackState, 'incubating'>;
  /** When the batch ended; defaults to now, never in the future nor before the opening. */
  at?: string;
  /** For `joined`: how many of the batch joined the brood (the rest did not develop). */
  joined?: number;
  /** Why it ended so, e.g. "all five turned dark" or "hatched a week late". */
  reason: string;
}

export interface KeptBackBatchResponse {
  id: string;
  sacId: string;
  /** The eggs kept back at the opening in force. */
  eggs: number;
  keptAt: string;
  state: KeptBackState;
  endedAt: string | null;
  /** For `joined`: how many joined the brood. */
  joined: number | null;
  reason: string | null;
  endedBy: { id: string; name: string } | null;
  /** Rolls not struck, and the last of them. */
  rolls: number;
  lastRollAt: string | null;
  /** Newest first, struck entries included (flagged). */
  log: KeptBackLogEntryResponse[];
}

/** The batch's story in plain words for every member; `day` formats an instant as the reader's date. */
export function keptBackWords(b: KeptBackBatchResponse, day: (instant: string) => string): string {
  const reason = b.reason?.replace(/[.!]+$/, ''); // the sentence gives its own full stop
  const eggs = b.eggs === 1 ? '1 egg' : `${b.eggs} eggs`;
  const kept = `${eggs} kept back at the opening on ${day(b.keptAt)} for more incubation`;
  const rolled = b.rolls ? `rolled ${b.rolls === 1 ? 'once' : `${b.rolls} times`}${b.lastRollAt ? `, last on ${day(b.lastRollAt)}` : ''}` : 'not rolled yet';
  if (b.state === 'incubating') return `${kept}: still incubating, ${rolled}.`;
  if (b.state === 'written-off') return `The ${kept} did not develop: written off on ${day(b.endedAt!)} (${reason}). They are not part of the brood.`;
  const lost = b.eggs - b.joined!;
  return `Of the ${kept}, ${b.joined} joined the brood on ${day(b.endedAt!)}${lost ? ` and ${lost} did not develop` : ''} (${reason}).`;
}
