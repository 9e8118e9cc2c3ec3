import { Injectable } from '@nestjs/common';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { RefusalKey, RefusalValues } from '../common/refusal';

/** Why an animal cannot be deleted: a whole refusal sentence (`animal.femaleOfProject`) and its values. */
export interface AnimalUsage {
  key: Extract<RefusalKey, `animal.${string}`>;
  values?: RefusalValues;
}

/** Says why an animal cannot be deleted, or null when it is not used. */
export type AnimalUsageCheck = (em: EntityManager, animalId: string) => Promise<AnimalUsage | null>;

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

  async reasons(em: EntityManager, animalId: string): Promise<AnimalUsage[]> {
    const found = await Promise.all(this.checks.map((c) => c(em, animalId)));
    return found.filter((r): r is AnimalUsage => r !== null);
  }
}
