import { BadRequestException, Injectable, NotFoundException, StreamableFile } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import type { PhotoRef } from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import { User } from '../users/user.entity';
import { Photo } from './photo.entity';
import { PhotoStorageService } from './photo-storage.service';
import { PhotoAccessRegistry } from './photo-access.registry';
import { processImage } from './image-processing';
import { toPhotoRef } from './photos.mapper';
import { fieldRefusal, refusal } from '../common/refusal';

export type PhotoVariant = 'full' | 'thumb';

@Injectable()
export class PhotosService {
  constructor(
    private readonly em: EntityManager,
    private readonly storage: PhotoStorageService,
    private readonly access: PhotoAccessRegistry,
  ) {}

  /** Re-encodes and stores an upload for a subject the caller has already checked the viewer may change. */
  async store(viewer: AuthUser, subjectType: string, subjectId: string, file: { buffer?: Buffer } | undefined): Promise<PhotoRef> {
    if (!file?.buffer?.length) throw new BadRequestException({ ...refusal('photo.attach'), details: [fieldRefusal('file', 'photo.attachField')] });
    const image = await processImage(file.buffer);
    const photo = this.em.create(Photo, {
      uploadedBy: this.em.getReference(User, viewer.id),
      subjectType,
      subjectId,
      storageKey: '',
      thumbKey: '',
      contentType: image.contentType,
      width: image.width,
      height: image.height,
      bytes: image.full.length,
    });
    photo.storageKey = `photos/${photo.id}.jpg`;
    photo.thumbKey = `photos/${photo.id}-thumb.jpg`;
    await this.storage.put(photo.storageKey, image.full, image.contentType);
    await this.storage.put(photo.thumbKey, image.thumb, image.contentType);
    try {
      await this.em.flush();
    } catch (e) {
      await Promise.allSettled([this.storage.delete(photo.storageKey), this.storage.delete(photo.thumbKey)]);
      throw e;
    }
    return toPhotoRef(photo);
  }

  /** Photos of many subjects at once, oldest first, keyed by subject id. */
  async refsFor(subjectType: string, subjectIds: string[]): Promise<Map<string, PhotoRef[]>> {
    const out = new Map<string, PhotoRef[]>();
    if (!subjectIds.length) return out;
    const photos = await this.em.find(Photo, { subjectType, subjectId: { $in: subjectIds } }, { orderBy: { createdAt: 'asc' } });
    for (const p of photos) out.set(p.subjectId, [...(out.get(p.subjectId) ?? []), toPhotoRef(p)]);
    return out;
  }

  async read(viewer: AuthUser, id: string, variant: PhotoVariant): Promise<StreamableFile> {
    const photo = await this.em.findOne(Photo, { id });
    if (!photo || !(await this.access.allows(this.em, viewer, photo.subjectType, photo.subjectId))) throw new NotFoundException(refusal('photo.notFound'));
    return this.file(photo, variant);
  }

  /**
   * A photo read through a link that carries its own secret (a progress page): served only when it
   * belongs to one of `subjectIds`, which the caller worked out from the link.
   */
  async readOfSubjects(subjectType: string, subjectIds: string[], id: string, variant: PhotoVariant): Promise<StreamableFile> {
    const photo = subjectIds.length ? await this.em.findOne(Photo, { id, subjectType, subjectId: { $in: subjectIds } }) : null;
    if (!photo) throw new NotFoundException(refusal('photo.notFound'));
    return this.file(photo, variant);
  }

  private async file(photo: Photo, variant: PhotoVariant): Promise<StreamableFile> {
    const body = await this.storage.get(variant === 'full' ? photo.storageKey : photo.thumbKey);
    return new StreamableFile(body, { type: photo.contentType, length: body.length });
  }
}
