import type { KeptBackBatchResponse, KeptBackLogEntryResponse } from '@broodsilk/shared';
import type { KeptBackBatch } from './kept-back-batch.entity';
import type { KeptBackLogEntry } from './kept-back-log-entry.entity';
import type { SacOpening } from './sac-opening.entity';

const person = (u: { id: string; displayName: string } | null | undefined) => (u ? { id: u.id, name: u.displayName } : null);

/** Needs `recordedBy` loaded on the entries and `endedBy` on the batch; entries newest first. */
export function toKeptBackResponse(b: KeptBackBatch, opening: SacOpening, entries: KeptBackLogEntry[]): KeptBackBatchResponse {
  const struckBy = new Map(entries.filter((e) => e.strikes).map((e) => [e.strikes!.id, e.id]));
  const rolls = entries.filter((e) => e.kind === 'roll' && !struckBy.has(e.id));
  return {
    id: b.id,
    sacId: b.sac.id,
    eggs: opening.keptBack,
    keptAt: opening.openedAt.toISOString(),
    state: b.state,
    endedAt: b.endedAt?.toISOString() ?? null,
    joined: b.joined ?? null,
    reason: b.reason ?? null,
    endedBy: person(b.endedBy),
    rolls: rolls.length,
    lastRollAt: rolls[0]?.at.toISOString() ?? null,
    log: entries.map((e) => toKeptBackLogResponse(e, struckBy.get(e.id) ?? null)),
  };
}

export function toKeptBackLogResponse(e: KeptBackLogEntry, struckBy: string | null): KeptBackLogEntryResponse {
  return {
    id: e.id,
    kind: e.kind,
    at: e.at.toISOString(),
    note: e.note ?? null,
    recordedBy: person(e.recordedBy),
    strikes: e.strikes?.id ?? null,
    struckBy,
  };
}
