import type { BroodCountResponse, OpeningResponse, PhotoRef } from '@broodsilk/shared';
import type { BroodCount } from './brood-count.entity';
import type { SacOpening } from './sac-opening.entity';

export const viableOf = (o: Pick<SacOpening, 'healthyEggs' | 'eggsWithLegs' | 'nymphs'>) => o.healthyEggs + o.eggsWithLegs + o.nymphs;

/** Needs `recordedBy` loaded on `o` and on each struck version (newest first). */
export function toOpeningResponse(o: SacOpening, photos: PhotoRef[], struck: SacOpening[] = []): OpeningResponse {
  return { ...openingFields(o), photos, struck: struck.map(openingFields) };
}

function openingFields(o: SacOpening): Omit<OpeningResponse, 'struck' | 'photos'> {
  const viable = viableOf(o);
  return {
    id: o.id,
    sacId: o.sac.id,
    openedAt: o.openedAt.toISOString(),
    healthyEggs: o.healthyEggs,
    eggsWithLegs: o.eggsWithLegs,
    nymphs: o.nymphs,
    darkEggs: o.darkEggs,
    spoiledEggs: o.spoiledEggs,
    keptBack: o.keptBack,
    viable,
    total: viable + o.darkEggs + o.spoiledEggs,
    notes: o.notes ?? null,
    estimated: o.estimated,
    warningReason: o.warningReason ?? null,
    recordedBy: { id: o.recordedBy.id, name: o.recordedBy.displayName },
    corrects: o.corrects?.id ?? null,
    reason: o.reason ?? null,
  };
}

/** Needs `recordedBy` loaded; `struckBy` is the id of the count that corrected this one. */
export function toBroodCountResponse(c: BroodCount, struckBy: string | null = null): BroodCountResponse {
  return {
    id: c.id,
    sacId: c.sac.id,
    at: c.at.toISOString(),
    stage: c.stage,
    alive: c.alive,
    lost: c.lost,
    lossReason: c.lossReason ?? null,
    note: c.note ?? null,
    source: c.source,
    recordedBy: c.recordedBy ? { id: c.recordedBy.id, name: c.recordedBy.displayName } : null,
    estimated: c.estimated,
    corrects: c.corrects?.id ?? null,
    reason: c.reason ?? null,
    struckBy,
    warningReason: c.warningReason ?? null,
  };
}
