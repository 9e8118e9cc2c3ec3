import type { PairingResponse } from '@broodsilk/shared';
import type { Pairing } from './pairing.entity';

/** Needs `recordedBy` and `male` loaded; `struckBy` is the id of the pairing that corrected this one. */
export function toPairingResponse(p: Pairing, struckBy: string | null = null): PairingResponse {
  return {
    id: p.id,
    startedAt: p.startedAt.toISOString(),
    on: p.startedOn,
    male: { id: p.male.id, label: p.male.label },
    durationMinutes: p.durationMinutes,
    outcome: p.outcome,
    notes: p.notes ?? null,
    recordedBy: { id: p.recordedBy.id, name: p.recordedBy.displayName },
    createdAt: p.createdAt.toISOString(),
    corrects: p.corrects?.id ?? null,
    reason: p.reason ?? null,
    struckBy,
    warningReason: p.warningReason ?? null,
  };
}

/** Which pairing corrected which: struck pairing id → the correcting pairing's id. */
export const struckPairings = (rows: readonly Pick<Pairing, 'id' | 'corrects'>[]) => new Map(rows.filter((p) => p.corrects).map((p) => [p.corrects!.id, p.id]));
