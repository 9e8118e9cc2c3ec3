import { ConflictException, Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import type { AnimalResponse, MaleDeparture } from '@broodsilk/shared';
import type { AuthUser } from '../common/auth-user';
import { fieldError } from '../common/field-errors';
import type { Animal } from './animal.entity';
import { AnimalsService, lockAnimal } from './animals.service';
import { AnimalDepartureRegistry } from './animal-departure.registry';
import { lastMoltOf, premoltSinceOf } from './animals.mapper';
import { refusal, type Refusal } from '../common/refusal';

const conflict = (why: Refusal) => new ConflictException(why);

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
  private assertPast(viewer: AuthUser, a: Animal, on: string, what: 'Premolt' | 'PremoltEnd' | 'SpermWeb' | 'Return' | 'Death'): void {
    if (on > this.animals.today(viewer)) throw fieldError('on', refusal(`animal.future${what}`, { on }));
    if (a.acquiredOn && on < a.acquiredOn) throw fieldError('on', refusal(`animal.beforeAcquired${what}`, { on, acquiredOn: a.acquiredOn }));
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
      if (since) throw conflict(refusal('animal.alreadyPremolt', { animal: a.label, since }));
      this.assertPast(viewer, a, on, 'Premolt');
      const molted = lastMoltOf(a);
      if (molted && on <= molted) throw fieldError('on', refusal('animal.premoltBeforeMolt', { animal: a.label, molted }));
      a.premoltSince = on;
    });
  }

  endPremolt(viewer: AuthUser, id: string, on: string): Promise<AnimalResponse> {
    return this.change(viewer, id, (_, a) => {
      const since = premoltSinceOf(a);
      if (!since) throw conflict(refusal('animal.notPremolt', { animal: a.label }));
      this.assertPast(viewer, a, on, 'PremoltEnd');
      if (on < since) throw fieldError('on', refusal('animal.premoltEndBefore', { since }));
      a.premoltSince = null;
      a.premoltEndedOn = on;
    });
  }

  spermWeb(viewer: AuthUser, id: string, on: string): Promise<AnimalResponse> {
    return this.change(viewer, id, (_, a) => {
      if (a.sex !== 'male' || a.maturity !== 'mature') throw conflict(refusal('animal.spermWebMatureMale'));
      this.assertPast(viewer, a, on, 'SpermWeb');
      if (a.maturedOn && on < a.maturedOn) throw fieldError('on', refusal('animal.spermWebBeforeMature', { animal: a.label, maturedOn: a.maturedOn }));
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
      if (a.status === 'deceased') throw conflict(refusal('animal.alreadyDead', { animal: a.label, on: a.statusOn ?? '' }));
      if (departure === 'returned') {
        if (a.status === 'returned') throw conflict(refusal('animal.alreadyReturned', { animal: a.label, on: a.returnedOn ?? '' }));
        if (a.custody !== 'loan-in' || a.status !== 'active') throw conflict(refusal('animal.notOnLoan', { animal: a.label }));
      }
      this.assertPast(viewer, a, on, departure === 'returned' ? 'Return' : 'Death');
      await this.departures.depart(tx, { animal: a, departure, on, actorId: viewer.id });
    });
  }
}
