import { NotFoundException } from '@nestjs/common';
import type { EntityManager } from '@mikro-orm/postgresql';
import { mayStartProject } from '@broodsilk/shared';
import { Animal } from '../animals/animal.entity';
import { fieldError } from '../common/field-errors';
import type { Project } from './project.entity';
import { diedOn } from './project-males';
import { refusal, term, type RefusalKey, type RefusalValues } from '../common/refusal';

/**
 * The male a pairing that started on `startedOn` names. The project's first male was checked when
 * the project started; another one (a backup, a replacement after a death) must be a mature male in
 * the keeper's care: their own or on loan to them. Another keeper's animal is not found (its
 * existence is never revealed). No male pairs after the day he died; a pairing before it may be
 * recorded late. Needs `project.male` and `project.owner` loaded.
 */
export async function pairingMale(tx: EntityManager, project: Project, maleId: string, startedOn: string): Promise<Animal> {
  const male = maleId === project.male.id ? project.male : await tx.findOne(Animal, { id: maleId, recordedBy: project.owner.id });
  if (!male) throw new NotFoundException(refusal('pairing.noSuchMale'));
  const refuse = (key: RefusalKey, values: RefusalValues = {}) => fieldError('maleId', refusal(key, { male: male.label, ...values }));
  const died = diedOn(male);
  if (died && startedOn > died) throw refuse('pairing.maleDied', { died, on: startedOn });
  if (male === project.male) return male;
  if (male.sex !== 'male') throw refuse(male.sex === 'female' ? 'pairing.maleIsFemale' : 'pairing.maleIsUnsexed');
  if (!died && !mayStartProject(male)) throw refuse('pairing.maleStatus', { status: term(`refusal.animalStatusWord.${male.status}`) });
  if (male.custody === 'loan-out') throw refuse('pairing.maleLentOut');
  if (male.maturity !== 'mature') throw refuse('pairing.maleNotMature');
  return male;
}
