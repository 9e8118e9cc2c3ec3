/** Who may see an activity event: every member, or owner and partners only (money, terms). */
export const ACTIVITY_AUDIENCES = ['members', 'partners'] as const;
export type ActivityAudience = (typeof ACTIVITY_AUDIENCES)[number];

export interface ActivityEventResponse {
  id: string;
  projectId: string;
  projectTitle: string;
  /** Null for what the system did by itself. */
  actor: { id: string; name: string } | null;
  /** Dotted name, e.g. `pairing.recorded`, `terms.accepted`, `sac.laid`. */
  kind: string;
  subject: { type: string; id: string | null };
  summary: string;
  data: Record<string, unknown>;
  at: string;
}

/** Keyset paging of a project's timeline: the next page starts after the last event seen (`before` = its id). */
export interface ActivityTimelineQuery {
  before?: string;
  /** 1–200; 200 when left out. */
  limit?: number;
}
