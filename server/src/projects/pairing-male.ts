import { NotFoundException } from '@nestjs/common';
import type { EntityManager } from '@mikro-orm/postgresql';
import { mayStartProject } from '@broodsilk/shared';
import { Animal } from '../animals/animal.entity';
import { fieldError } from '../common/field-errors';
import type { Project } from './project.entity';
import { diedOn } from './project-males';

/**
 * The male a pairing that started on `startedOn` names. The project's first male was checked when
 * the project started; another one (a backup, a replacement after a death) must be a mature male in
 * the keeper's care: their own or on loan to them. Another keeper's animal is not found (its
 * existence is never revealed). No male pairs after the day he died; a pairing before it may be
 * recorded late. Needs `project.male` and `project.owner` loaded.
 */
export async function pairingMale(tx: EntityManager, project: Project, maleId: string, startedOn: string): Promise<Animal> {
  const male = maleId === project.male.id ? project.male : await tx.findOne(Animal, { id: maleId, recordedBy: project.owner.id });
  if (!male) throw new NotFoundException({ message: 'There is no such male in your collection.' });
  const refuse = (why: string) => fieldError('maleId', `${male.label} ${why}`);
  const died = diedOn(male);
  if (died && startedOn > died) throw refuse(`died on ${died}, so a pairing on ${startedOn} cannot be with him.`);
  if (male === project.male) return male;
  if (male.sex !== 'male') throw refuse(`is recorded as ${male.sex}, not male.`);
  if (!died && !mayStartProject(male)) throw refuse(`is marked ${male.status === 'returned' ? 'returned to its owner' : male.status}, so he cannot be paired.`);
  if (male.custody === 'loan-out') throw refuse('is out on loan to someone else; only a male in your care can be paired.');
  if (male.maturity !== 'mature') throw refuse('is not recorded as mature; only a male who has had his maturing molt can pair.');
  return male;
}
