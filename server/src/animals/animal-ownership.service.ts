import { Injectable, NotFoundException } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import type { OwnershipRequest } from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import { User } from '../users/user.entity';
import { Animal } from './animal.entity';
import { refusal } from '../common/refusal';

/**
 * A keeper named as an animal's owner by e-mail sees the request and accepts it; only then is
 * their account linked (and their name shown to the recorder).
 */
@Injectable()
export class AnimalOwnershipService {
  constructor(private readonly em: EntityManager) {}

  async requests(viewer: AuthUser): Promise<OwnershipRequest[]> {
    const animals = await this.em.find(Animal, this.waitingFor(viewer), { populate: ['species', 'recordedBy'], orderBy: { createdAt: 'asc' } });
    return animals.map((a) => ({ animalId: a.id, label: a.label, speciesName: a.species.scientificName, recordedBy: a.recordedBy.displayName }));
  }

  async accept(viewer: AuthUser, animalId: string): Promise<void> {
    const animal = await this.em.findOne(Animal, { ...this.waitingFor(viewer), id: animalId });
    if (!animal) throw new NotFoundException(refusal('animal.noneWaiting'));
    animal.ownerUser = this.em.getReference(User, viewer.id);
    await this.em.flush();
  }

  private waitingFor(viewer: AuthUser) {
    return { ownerKind: 'keeper' as const, ownerEmail: viewer.email.toLowerCase(), ownerUser: null };
  }
}
