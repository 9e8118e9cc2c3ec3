import type { EntityManager } from '@mikro-orm/postgresql';
import type { FieldError } from '@broodsilk/shared';
import { Species } from '../species/species.entity';
import { User } from '../users/user.entity';
import type { AuthUser } from '../common/auth-user';
import { fieldRefusal } from '../common/refusal';
import { Animal } from './animal.entity';
import type { CreateAnimalDto } from './dto/create-animal.dto';
import { animalRuleErrors, type AnimalState } from './animal-rules';

export type AnimalValues = Partial<Omit<Animal, 'id' | 'createdAt' | 'updatedAt' | 'recordedBy'>>;

export interface ResolvedInput {
  errors: FieldError[];
  values: AnimalValues;
}

/**
 * Merges a create or edit request into the current record (if any), checks the rules across
 * fields and resolves the species and the owner. Nothing is written: the caller assigns `values`
 * only when `errors` is empty, so the CSV import can check every row before saving one.
 */
export async function resolveAnimalInput(
  em: EntityManager,
  viewer: AuthUser,
  dto: Partial<CreateAnimalDto>,
  current: Animal | null,
  today: string,
): Promise<ResolvedInput> {
  const errors: FieldError[] = [];
  const values: AnimalValues = {};
  for (const [k, v] of Object.entries(dto)) if (v !== undefined && k !== 'speciesId') (values as Record<string, unknown>)[k] = v;

  if (dto.speciesId !== undefined) {
    const species = await em.findOne(Species, { id: dto.speciesId });
    if (species) values.species = species;
    else errors.push(fieldRefusal('speciesId', 'species.choose'));
  }

  const merged: AnimalState = {
    sex: dto.sex ?? current?.sex ?? 'unsexed',
    maturity: dto.maturity ?? current?.maturity ?? 'immature',
    ownerKind: dto.ownerKind ?? current?.ownerKind ?? 'self',
    custody: dto.custody ?? current?.custody ?? 'with-owner',
    status: dto.status ?? current?.status ?? 'active',
  };
  for (const k of ['maturedOn', 'acquiredOn', 'pricePaidMinor', 'priceCurrency', 'ownerEmail', 'ownerName', 'custodyParty', 'dueBackOn', 'statusOn'] as const) {
    (merged as unknown as Record<string, unknown>)[k] = dto[k] !== undefined ? dto[k] : current?.[k];
  }
  errors.push(...animalRuleErrors(merged, today));

  // Owner: the recorder, another keeper of this instance (by e-mail), or an outside party.
  values.ownerKind = merged.ownerKind;
  if (merged.ownerKind === 'self') {
    values.ownerUser = em.getReference(User, viewer.id);
    values.ownerName = null;
    values.ownerEmail = null;
  } else if (merged.ownerKind === 'keeper' && merged.ownerEmail) {
    // Nothing is looked up: whether an account has this address, and its id and name, stay
    // hidden until that keeper accepts (AnimalOwnershipService), so the form cannot probe addresses.
    const email = merged.ownerEmail.toLowerCase();
    if (email === viewer.email.toLowerCase()) errors.push(fieldRefusal('ownerEmail', 'animal.ownEmail'));
    const unchanged = current?.ownerKind === 'keeper' && current.ownerEmail === email;
    values.ownerUser = unchanged ? (current.ownerUser ?? null) : null;
    values.ownerEmail = email;
    values.ownerName = null;
  } else if (merged.ownerKind === 'party') {
    values.ownerUser = null;
  }
  if (merged.custody === 'with-owner') values.custodyParty = dto.custodyParty ?? null;
  // A loan-in comes from the owner unless the keeper names someone else.
  if (merged.custody === 'loan-in' && !merged.custodyParty) {
    const accepted = values.ownerUser && 'displayName' in values.ownerUser ? values.ownerUser.displayName : null;
    values.custodyParty = accepted ?? (merged.ownerKind === 'keeper' ? (values.ownerEmail ?? null) : (merged.ownerName ?? null));
  }

  const label = dto.label;
  if (label !== undefined && label !== current?.label) {
    const taken = await em.count(Animal, { recordedBy: viewer.id, label });
    if (taken > 0) errors.push(fieldRefusal('label', 'animal.labelTaken', { label }));
  }
  return { errors, values };
}
