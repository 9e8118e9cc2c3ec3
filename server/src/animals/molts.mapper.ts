import type { MoltResponse, PhotoRef } from '@broodsilk/shared';
import type { Molt } from './molt.entity';

export function toMoltResponse(m: Molt, photos: PhotoRef[]): MoltResponse {
  return {
    id: m.id,
    animalId: m.animal.id,
    moltedOn: m.moltedOn,
    exuviaSex: m.exuviaSex ?? null,
    sizeCm: m.sizeCm == null ? null : Number(m.sizeCm),
    maturing: m.maturing,
    notes: m.notes ?? null,
    photos,
    createdAt: m.createdAt.toISOString(),
  };
}
