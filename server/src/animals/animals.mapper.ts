import {
  femaleReadiness,
  maleClock,
  maturingWindow,
  premoltStands,
  type MaturingWindow,
  type AnimalOwner,
  type AnimalResponse,
  type PhotoRef,
  type AnimalSummary,
  type FemaleReadinessView,
  type MaleClockView,
} from '@broodsilk/shared';
import type { Animal } from './animal.entity';
import { effectiveBreeding } from '../species/effective-breeding';
import { ownBreeding } from '../species/species.mapper';

/** Needs `species` loaded; `recordedBy` and `ownerUser` too where they can be someone else. */
export function toAnimalSummary(a: Animal, viewerId: string): AnimalSummary {
  const s = a.species;
  return {
    id: a.id,
    label: a.label,
    species: {
      id: s.id,
      scientificName: s.scientificName,
      group: s.group,
      urticatingHairs: s.urticatingHairs,
      venom: s.venom,
    },
    sex: a.sex,
    maturity: a.maturity,
    maturedOn: a.maturedOn ?? null,
    status: a.status,
    statusOn: a.statusOn ?? null,
    custody: a.custody,
    custodyParty: a.custodyParty ?? null,
    dueBackOn: a.dueBackOn ?? null,
    enclosure: a.enclosure ?? null,
    lastMoltOn: lastMoltOf(a),
    createdAt: a.createdAt.toISOString(),
    heldBy: a.recordedBy.id === viewerId ? null : { id: a.recordedBy.id, name: a.recordedBy.displayName },
    lender: a.custody === 'loan-in' && a.ownerKind !== 'self' ? { name: ownerOf(a).name, email: a.ownerEmail ?? null } : null,
  };
}

/** The male clock of a mature male, against his species' effective lifespan; null otherwise. */
export function maleClockOf(a: Animal, today: string): MaleClockView | null {
  if (a.sex !== 'male' || a.maturity !== 'mature' || !a.maturedOn || a.maturedOn > today) return null;
  const life = effectiveBreeding(a.species.group, ownBreeding(a.species)).matureMaleLifespanMonths;
  const clock = maleClock(a.maturedOn, today, { minMonths: life.value.min, maxMonths: life.value.max });
  return { ...clock, maturedOn: a.maturedOn, lifespanMonths: { ...life.value, from: life.from } };
}

/** The last molt on record: a maturing molt is a molt too, even when only its day was entered with the animal. */
export function lastMoltOf(a: Pick<Animal, 'lastMoltOn' | 'maturedOn'>): string | null {
  const days = [a.lastMoltOn, a.maturedOn].filter((d): d is string => !!d);
  return days.length ? days.reduce((x, y) => (y > x ? y : x)) : null;
}

/** The premolt flag while it stands: a molt on or after it has ended it. */
export function premoltSinceOf(a: Animal): string | null {
  return premoltStands(a.premoltSince, lastMoltOf(a)) ? a.premoltSince! : null;
}

function readinessOf(a: Animal, today: string): FemaleReadinessView | null {
  if (a.sex !== 'female' || a.maturity !== 'mature') return null;
  const molted = lastMoltOf(a);
  const last = molted && molted <= today ? molted : null;
  const premoltSince = premoltSinceOf(a);
  return { ...femaleReadiness(last, today, premoltSince), lastMoltOn: last, premoltNote: a.premoltNote ?? null, premoltSince };
}

/** A penultimate male with a molt on record: when his maturing molt is expected. */
function maturingWindowOf(a: Animal, today: string): MaturingWindow | null {
  if (a.sex !== 'male' || a.maturity !== 'penultimate' || !a.lastMoltOn || a.lastMoltOn > today) return null;
  return maturingWindow(a.lastMoltOn, today);
}

function ownerOf(a: Animal): AnimalOwner {
  if (a.ownerKind === 'party') return { kind: 'party', name: a.ownerName ?? '', ...(a.ownerEmail ? { email: a.ownerEmail } : {}) };
  if (a.ownerKind === 'keeper' && !a.ownerUser) return { kind: 'keeper', name: a.ownerEmail ?? '', email: a.ownerEmail ?? '', awaitingAcceptance: true };
  const user = a.ownerKind === 'self' ? a.recordedBy : a.ownerUser;
  return { kind: a.ownerKind, ...(user ? { userId: user.id } : {}), name: user?.displayName ?? a.ownerName ?? '' };
}

/** Needs `species`, `recordedBy` and `ownerUser` loaded. */
export function toAnimalResponse(a: Animal, today: string, viewerId: string, photos: PhotoRef[] = []): AnimalResponse {
  return {
    ...toAnimalSummary(a, viewerId),
    recordedBy: { id: a.recordedBy.id, name: a.recordedBy.displayName },
    acquiredOn: a.acquiredOn ?? null,
    acquiredFrom: a.acquiredFrom ?? null,
    pricePaidMinor: a.pricePaidMinor ?? null,
    priceCurrency: a.priceCurrency ?? null,
    owner: ownerOf(a),
    notes: a.notes ?? null,
    premoltNote: a.premoltNote ?? null,
    maleClock: maleClockOf(a, today),
    readiness: readinessOf(a, today),
    premoltSince: premoltSinceOf(a),
    premoltEndedOn: a.premoltEndedOn ?? null,
    spermWebOn: a.spermWebOn ?? null,
    returnedOn: a.returnedOn ?? null,
    maturingWindow: maturingWindowOf(a, today),
    photos,
    editable: a.recordedBy.id === viewerId,
    updatedAt: a.updatedAt.toISOString(),
  };
}
