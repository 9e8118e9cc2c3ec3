import type { PhotoRef } from '@broodsilk/shared';
import type { Photo } from './photo.entity';

export function toPhotoRef(p: Photo): PhotoRef {
  return {
    id: p.id,
    url: `/api/photos/${p.id}`,
    thumbUrl: `/api/photos/${p.id}/thumb`,
    width: p.width,
    height: p.height,
    createdAt: p.createdAt.toISOString(),
  };
}
