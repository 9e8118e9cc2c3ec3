import { ConflictException, Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import type { FeedingResponse } from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import { fieldError } from '../common/field-errors';
import { User } from '../users/user.entity';
import type { Animal } from './animal.entity';
import { AnimalsService } from './animals.service';
import { FeedingEntry } from './feeding-entry.entity';
import type { CreateFeedingDto } from './dto/create-feeding.dto';
import { refusal } from '../common/refusal';

function toFeedingResponse(e: FeedingEntry, struckBy: FeedingEntry | undefined): FeedingResponse {
  return {
    id: e.id,
    fedOn: e.fedOn,
    prey: e.prey,
    taken: e.taken,
    note: e.note ?? null,
    strikes: e.strikes ? { id: e.strikes.id, reason: e.reason ?? '' } : null,
    struckBy: struckBy?.id ?? null,
    createdAt: e.createdAt.toISOString(),
  };
}

/** An animal's feeding log: newest first; a correction strikes the entry it replaces. */
@Injectable()
export class FeedingsService {
  constructor(
    private readonly em: EntityManager,
    private readonly animals: AnimalsService,
  ) {}

  async list(viewer: AuthUser, animalId: string): Promise<FeedingResponse[]> {
    const animal = await this.animals.ownOrForbid(viewer, animalId);
    const entries = await this.em.find(FeedingEntry, { animal }, { orderBy: { fedOn: 'desc', createdAt: 'desc' } });
    const struckBy = new Map(entries.filter((e) => e.strikes).map((e) => [e.strikes!.id, e]));
    return entries.map((e) => toFeedingResponse(e, struckBy.get(e.id)));
  }

  async add(viewer: AuthUser, animalId: string, dto: CreateFeedingDto): Promise<FeedingResponse> {
    if (dto.fedOn > this.animals.today(viewer)) throw fieldError('fedOn', refusal('feeding.future', { on: dto.fedOn }));
    const prey = dto.prey.trim();
    if (!prey) throw fieldError('prey', refusal('feeding.preyNeeded'));
    return this.em.transactional(async (tx) => {
      const animal = await this.animals.ownOrForbid(viewer, animalId, tx);
      const strikes = dto.strikes ? await this.strikeTarget(tx, animal, dto) : null;
      if (!strikes && dto.reason) throw fieldError('reason', refusal('feeding.reasonOnlyCorrection'));
      const entry = tx.create(FeedingEntry, {
        animal,
        fedOn: dto.fedOn,
        prey,
        taken: dto.taken,
        note: dto.note?.trim() || null,
        strikes,
        reason: strikes ? dto.reason!.trim() : null,
        recordedBy: tx.getReference(User, viewer.id),
      });
      await tx.flush();
      return toFeedingResponse(entry, undefined);
    });
  }

  private async strikeTarget(tx: EntityManager, animal: Animal, dto: CreateFeedingDto): Promise<FeedingEntry> {
    if (!dto.reason?.trim()) throw fieldError('reason', refusal('feeding.correctionWhy'));
    const target = await tx.findOne(FeedingEntry, { id: dto.strikes!, animal });
    if (!target) throw fieldError('strikes', refusal('feeding.noSuchEntry'));
    if (await tx.count(FeedingEntry, { strikes: target })) throw new ConflictException(refusal('feeding.alreadyCorrected'));
    return target;
  }
}
