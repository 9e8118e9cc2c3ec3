import { Injectable } from '@nestjs/common';
import type { EntityManager } from '@mikro-orm/postgresql';

/** True when `userId` may read the animal through something else (e.g. a project it is in). */
export type AnimalReaderCheck = (em: EntityManager, animalId: string, userId: string) => Promise<boolean>;

/**
 * Who besides its recorder may see an animal. The projects module registers its members here, so
 * a member who tries to change the animal hears 403 (no right) rather than 404 (no such animal).
 */
@Injectable()
export class AnimalReadersRegistry {
  private readonly checks: AnimalReaderCheck[] = [];

  register(check: AnimalReaderCheck): void {
    this.checks.push(check);
  }

  async canRead(em: EntityManager, animalId: string, userId: string): Promise<boolean> {
    for (const check of this.checks) if (await check(em, animalId, userId)) return true;
    return false;
  }
}
