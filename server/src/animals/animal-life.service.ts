import { ConflictException, Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import type { AnimalResponse, MaleDeparture } from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import { fieldError } from '../common/field-errors';
import type { Animal } from './animal.entity';
import { AnimalsService, lockAnimal } from './animals.service';
import { AnimalDepartureRegistry } from './animal-departure.registry';
import { lastMoltOf, premoltSinceOf } from './animals.mapper';

const conflict = (message: string) => new ConflictException({ message });

/**
 * Dated steps in an animal's life besides molts: the premolt flag, a sperm web seen, the return of
 * a loaned animal to its owner, death. Each is one transaction with whatever it sets off.
 */
@Injectable()
export class AnimalLifeService {
  constructor(
    private readonly em: EntityManager,
    private readonly animals: AnimalsService,
    private readonly departures: AnimalDepartureRegistry,
  ) {}

  /** Refuses a date in the future or before the animal came into the keeper's hands. */
  private assertPast(viewer: AuthUser, a: Animal, on: string, what: string): void {
    if (on > this.animals.today(viewer)) throw fieldError('on', `The ${what} date ${on} is in the future.`);
    if (a.acquiredOn && on < a.acquiredOn) throw fieldError('on', `The ${what} date ${on} is before you acquired the animal (${a.acquiredOn}).`);
  }

  private async change(viewer: AuthUser, id: string, step: (tx: EntityManager, a: Animal) => Promise<void> | void): Promise<AnimalResponse> {
    await this.em.transactional(async (tx) => {
      await lockAnimal(tx, id);
      const a = await this.animals.ownOrForbid(viewer, id, tx);
      await step(tx, a);
    });
    return this.animals.get(viewer, id);
  }

  setPremolt(viewer: AuthUser, id: string, on: string): Promise<AnimalResponse> {
    return this.change(viewer, id, (_, a) => {
      const since = premoltSinceOf(a);
      if (since) throw conflict(`${a.label} is already flagged as in premolt since ${since}.`);
      this.assertPast(viewer, a, on, 'premolt');
      const molted = lastMoltOf(a);
      if (molted && on <= molted) throw fieldError('on', `${a.label} molted on ${molted}; premolt can only start after her last molt.`);
      a.premoltSince = on;
    });
  }

  endPremolt(viewer: AuthUser, id: string, on: string): Promise<AnimalResponse> {
    return this.change(viewer, id, (_, a) => {
      const since = premoltSinceOf(a);
      if (!since) throw conflict(`${a.label} is not flagged as in premolt.`);
      this.assertPast(viewer, a, on, 'end of premolt');
      if (on < since) throw fieldError('on', `The premolt began on ${since}; it cannot end before that.`);
      a.premoltSince = null;
      a.premoltEndedOn = on;
    });
  }

  spermWeb(viewer: AuthUser, id: string, on: string): Promise<AnimalResponse> {
    return this.change(viewer, id, (_, a) => {
      if (a.sex !== 'male' || a.maturity !== 'mature') throw conflict('Only a mature male builds sperm webs: record his maturing molt first.');
      this.assertPast(viewer, a, on, 'sperm web');
      if (a.maturedOn && on < a.maturedOn) throw fieldError('on', `${a.label} matured on ${a.maturedOn}; a sperm web comes after that.`);
      a.spermWebOn = on;
    });
  }

  returnToOwner(viewer: AuthUser, id: string, on: string): Promise<AnimalResponse> {
    return this.depart(viewer, id, 'returned', on);
  }

  recordDeath(viewer: AuthUser, id: string, on: string): Promise<AnimalResponse> {
    return this.depart(viewer, id, 'died', on);
  }

  private depart(viewer: AuthUser, id: string, departure: MaleDeparture, on: string): Promise<AnimalResponse> {
    return this.change(viewer, id, async (tx, a) => {
      if (a.status === 'deceased') throw conflict(`${a.label} is already recorded as dead (${a.statusOn}).`);
      if (departure === 'returned') {
        if (a.status === 'returned') throw conflict(`${a.label} already went back to the owner on ${a.returnedOn}.`);
        if (a.custody !== 'loan-in' || a.status !== 'active') throw conflict(`${a.label} is not on loan to you, so there is no owner to return it to.`);
      }
      this.assertPast(viewer, a, on, departure === 'returned' ? 'return' : 'death');
      await this.departures.depart(tx, { animal: a, departure, on, actorId: viewer.id });
    });
  }
}
