import type { PairingResponse } from '@broodsilk/shared';
import type { Pairing } from './pairing.entity';

/** Needs `recordedBy` loaded. */
export function toPairingResponse(p: Pairing): PairingResponse {
  return {
    id: p.id,
    startedAt: p.startedAt.toISOString(),
    on: p.startedOn,
    durationMinutes: p.durationMinutes,
    outcome: p.outcome,
    notes: p.notes ?? null,
    recordedBy: { id: p.recordedBy.id, name: p.recordedBy.displayName },
    createdAt: p.createdAt.toISOString(),
  };
}
