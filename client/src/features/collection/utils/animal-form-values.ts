import {
  minorToMajor,
  toMinor,
  type AnimalResponse,
  type AnimalSex,
  type AnimalStatus,
  type CreateAnimalRequest,
  type Custody,
  type Maturity,
  type OwnerKind,
} from '@broodsilk/shared';
import { readDate } from '@/components/fields/typed-date';
import { readNumber } from '@/components/fields/typed-number';

/** The animal form's values: dates and numbers as the user typed them (see components/fields). */
export interface AnimalFormValues {
  speciesId: string | null;
  label: string;
  sex: AnimalSex;
  maturity: Maturity;
  maturedOn: string;
  acquiredOn: string;
  acquiredFrom: string;
  price: string;
  priceCurrency: string;
  ownerKind: OwnerKind;
  ownerEmail: string;
  ownerName: string;
  custody: Custody;
  custodyParty: string;
  dueBackOn: string;
  status: AnimalStatus;
  statusOn: string;
  enclosure: string;
  notes: string;
  premoltNote: string;
}

/** The form's starting values: empty for a new animal, the saved ones for an edit. */
export function animalFormValues(a?: AnimalResponse): AnimalFormValues {
  return {
    speciesId: a?.species.id ?? null,
    label: a?.label ?? '',
    sex: a?.sex ?? 'unsexed',
    maturity: a?.maturity ?? 'immature',
    maturedOn: a?.maturedOn ?? '',
    acquiredOn: a?.acquiredOn ?? '',
    acquiredFrom: a?.acquiredFrom ?? '',
    price: a?.pricePaidMinor != null ? String(minorToMajor(a.pricePaidMinor, a.priceCurrency ?? 'EUR')) : '',
    priceCurrency: a?.priceCurrency ?? '',
    ownerKind: a?.owner.kind ?? 'self',
    ownerEmail: a?.owner.kind === 'party' ? (a.owner.email ?? '') : '',
    ownerName: a?.owner.kind === 'party' ? a.owner.name : '',
    custody: a?.custody ?? 'with-owner',
    custodyParty: a?.custodyParty ?? '',
    dueBackOn: a?.dueBackOn ?? '',
    status: a?.status ?? 'active',
    statusOn: a?.statusOn ?? '',
    enclosure: a?.enclosure ?? '',
    notes: a?.notes ?? '',
    premoltNote: a?.premoltNote ?? '',
  };
}

const text = (s: string) => (s.trim() === '' ? null : s.trim());

/** The checked form's values as the create/edit request; fields that do not apply are cleared. */
export function toAnimalRequest(v: AnimalFormValues): CreateAnimalRequest {
  const currency = text(v.priceCurrency)?.toUpperCase() ?? null;
  const price = readNumber(v.price);
  const loan = v.custody !== 'with-owner';
  return {
    speciesId: v.speciesId ?? '',
    label: v.label.trim(),
    sex: v.sex,
    maturity: v.maturity,
    maturedOn: v.maturity === 'mature' ? readDate(v.maturedOn) : null,
    acquiredOn: readDate(v.acquiredOn),
    acquiredFrom: text(v.acquiredFrom),
    // The field allows no more decimals than the currency has, so the conversion is exact (shared money module).
    pricePaidMinor: price === null ? null : toMinor(String(price), currency ?? 'EUR'),
    priceCurrency: currency,
    ownerKind: v.ownerKind,
    // An edit of a keeper-owned animal may leave the e-mail empty: the owner stays as recorded.
    ownerEmail: v.ownerKind === 'self' ? null : (text(v.ownerEmail) ?? (v.ownerKind === 'keeper' ? undefined : null)),
    ownerName: v.ownerKind === 'party' ? text(v.ownerName) : null,
    custody: v.custody,
    custodyParty: loan ? text(v.custodyParty) : null,
    dueBackOn: loan ? readDate(v.dueBackOn) : null,
    status: v.status,
    statusOn: readDate(v.statusOn),
    enclosure: text(v.enclosure),
    notes: text(v.notes),
    premoltNote: v.sex === 'female' ? text(v.premoltNote) : null,
  };
}
