import { Injectable } from '@nestjs/common';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { Animal } from './animal.entity';

export interface AnimalMolted {
  animal: Animal;
  moltedOn: string;
  actorId: string;
}

/** Runs inside the transaction that records the molt, so both are written or neither. */
export type AnimalMoltListener = (em: EntityManager, m: AnimalMolted) => Promise<void>;

/**
 * A molt on record. Other modules register listeners here (the projects module writes an event on
 * each open project whose pairing the molt undoes), so this module need not know them.
 */
@Injectable()
export class AnimalMoltRegistry {
  private readonly listeners: AnimalMoltListener[] = [];

  register(listener: AnimalMoltListener): void {
    this.listeners.push(listener);
  }

  async molted(em: EntityManager, m: AnimalMolted): Promise<void> {
    for (const listener of this.listeners) await listener(em, m);
  }
}
