import { Injectable } from '@nestjs/common';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { MaleDeparture } from '@broodsilk/shared';
import type { Animal } from './animal.entity';

export interface AnimalDeparture {
  animal: Animal;
  departure: MaleDeparture;
  on: string;
  actorId: string;
}

/** Runs inside the transaction that records the departure, so both are written or neither. */
export type AnimalDepartureListener = (em: EntityManager, d: AnimalDeparture) => Promise<void>;

/**
 * An animal leaving for good (handed back to its owner, or dead). Other modules register listeners
 * here (the projects module writes an event on each project), so this module need not know them.
 */
@Injectable()
export class AnimalDepartureRegistry {
  private readonly listeners: AnimalDepartureListener[] = [];

  register(listener: AnimalDepartureListener): void {
    this.listeners.push(listener);
  }

  /** Sets the status and its date on `d.animal` and tells every listener, on the caller's transaction. */
  async depart(em: EntityManager, d: AnimalDeparture): Promise<void> {
    const a = d.animal;
    a.status = d.departure === 'returned' ? 'returned' : 'deceased';
    a.statusOn = d.on;
    if (d.departure === 'returned') a.returnedOn = d.on;
    for (const listener of this.listeners) await listener(em, d);
  }
}
