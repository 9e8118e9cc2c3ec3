import { Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import type { FieldError, MoltResponse } from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import { PhotosService } from '../photos/photos.service';
import { AnimalsService } from './animals.service';
import { badRequest } from '../common/field-errors';
import { Molt } from './molt.entity';
import { toMoltResponse } from './molts.mapper';
import { MOLT_PHOTO } from './animal-photos.service';
import { AnimalMoltRegistry } from './animal-molt.registry';
import type { CreateMoltDto } from './dto/create-molt.dto';
import { fieldRefusal } from '../common/refusal';

@Injectable()
export class MoltsService {
  constructor(
    private readonly em: EntityManager,
    private readonly animals: AnimalsService,
    private readonly photos: PhotosService,
    private readonly molts: AnimalMoltRegistry,
  ) {}

  async list(viewer: AuthUser, animalId: string): Promise<MoltResponse[]> {
    const animal = await this.animals.readable(viewer, animalId);
    const molts = await this.em.find(Molt, { animal }, { orderBy: { moltedOn: 'desc', createdAt: 'desc' } });
    const photos = await this.photos.refsFor(
      MOLT_PHOTO,
      molts.map((m) => m.id),
    );
    return molts.map((m) => toMoltResponse(m, photos.get(m.id) ?? []));
  }

  /**
   * Records a molt and keeps the animal in step, in one transaction: its last molt date, its sex
   * when the exuvia settles it, and for a maturing molt his maturity and `maturedOn`.
   */
  async create(viewer: AuthUser, animalId: string, dto: CreateMoltDto): Promise<MoltResponse> {
    const today = this.animals.today(viewer);
    return this.em.transactional(async (tx) => {
      const animal = await this.animals.own(viewer, animalId, tx);
      const errors: FieldError[] = [];
      if (dto.moltedOn > today) errors.push(fieldRefusal('moltedOn', 'animal.futureMolt', { on: dto.moltedOn }));
      if (animal.acquiredOn && dto.moltedOn < animal.acquiredOn) {
        errors.push(fieldRefusal('moltedOn', 'animal.beforeAcquiredMolt', { on: dto.moltedOn, acquiredOn: animal.acquiredOn }));
      }
      const sex = animal.sex === 'unsexed' && (dto.exuviaSex === 'male' || dto.exuviaSex === 'female') ? dto.exuviaSex : animal.sex;
      if (dto.maturing && sex !== 'male') errors.push(fieldRefusal('maturing', 'animal.maturingOnlyMale'));
      if (dto.maturing && animal.maturity === 'mature' && animal.maturedOn && animal.maturedOn !== dto.moltedOn) {
        errors.push(fieldRefusal('maturing', 'animal.alreadyMatured', { on: animal.maturedOn }));
      }
      if (errors.length) throw badRequest(errors);

      const molt = tx.create(Molt, {
        animal,
        moltedOn: dto.moltedOn,
        exuviaSex: dto.exuviaSex ?? null,
        sizeCm: dto.sizeCm == null ? null : dto.sizeCm.toFixed(1),
        maturing: dto.maturing ?? false,
        notes: dto.notes ?? null,
      });
      animal.sex = sex;
      if (!animal.lastMoltOn || dto.moltedOn > animal.lastMoltOn) animal.lastMoltOn = dto.moltedOn;
      if (dto.maturing) {
        animal.maturity = 'mature';
        animal.maturedOn = dto.moltedOn;
      }
      await this.molts.molted(tx, { animal, moltedOn: dto.moltedOn, actorId: viewer.id });
      await tx.flush();
      return toMoltResponse(molt, []);
    });
  }
}
