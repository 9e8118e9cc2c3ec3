import { Injectable } from '@nestjs/common';
import type { EntityManager } from '@mikro-orm/postgresql';

/** Says why an animal cannot be deleted (e.g. "It is the female of project P-3."), or null when it is not used. */
export type AnimalUsageCheck = (em: EntityManager, animalId: string) => Promise<string | null>;

/**
 * Other modules register here what makes an animal undeletable, so this module need not know them.
 * The projects module calls `register` in its `onModuleInit`; its FK to animals is the safety net
 * (a violation is answered with the same 409).
 */
@Injectable()
export class AnimalUsageRegistry {
  private readonly checks: AnimalUsageCheck[] = [];

  register(check: AnimalUsageCheck): void {
    this.checks.push(check);
  }

  async reasons(em: EntityManager, animalId: string): Promise<string[]> {
    const found = await Promise.all(this.checks.map((c) => c(em, animalId)));
    return found.filter((r): r is string => r !== null);
  }
}
