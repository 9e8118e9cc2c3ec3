import { Injectable, type OnModuleInit } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import type { PhotoRef } from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import { PhotosService } from '../photos/photos.service';
import { PhotoAccessRegistry } from '../photos/photo-access.registry';
import { ANIMAL_PHOTO, AnimalsService } from './animals.service';
import { Animal } from './animal.entity';
import { Molt } from './molt.entity';

export const MOLT_PHOTO = 'molt';

/** Photos of animals and molts: only the recording keeper adds them; the same keeper sees them. */
@Injectable()
export class AnimalPhotosService implements OnModuleInit {
  constructor(
    private readonly em: EntityManager,
    private readonly animals: AnimalsService,
    private readonly photos: PhotosService,
    private readonly access: PhotoAccessRegistry,
  ) {}

  onModuleInit(): void {
    // Projects may register further checks for 'animal' (members read a project's two animals).
    this.access.register(ANIMAL_PHOTO, async (em, viewer, id) => (await em.count(Animal, { id, recordedBy: viewer.id })) > 0);
    this.access.register(MOLT_PHOTO, async (em, viewer, id) => (await em.count(Molt, { id, animal: { recordedBy: viewer.id } })) > 0);
  }

  async addToAnimal(viewer: AuthUser, animalId: string, file: { buffer?: Buffer } | undefined): Promise<PhotoRef> {
    const animal = await this.animals.own(viewer, animalId);
    return this.photos.store(viewer, ANIMAL_PHOTO, animal.id, file);
  }

  async addToMolt(viewer: AuthUser, animalId: string, moltId: string, file: { buffer?: Buffer } | undefined): Promise<PhotoRef> {
    const animal = await this.animals.own(viewer, animalId);
    const molt = await this.em.findOneOrFail(Molt, { id: moltId, animal });
    return this.photos.store(viewer, MOLT_PHOTO, molt.id, file);
  }
}
