import type { AnimalSex, AnimalStatus, Custody, FieldError, Maturity, OwnerKind } from '@broodsilk/shared';

/** The animal as it will be saved, after the request is merged into it. */
export interface AnimalState {
  sex: AnimalSex;
  maturity: Maturity;
  maturedOn?: string | null;
  acquiredOn?: string | null;
  pricePaidMinor?: number | null;
  priceCurrency?: string | null;
  ownerKind: OwnerKind;
  ownerEmail?: string | null;
  ownerName?: string | null;
  custody: Custody;
  custodyParty?: string | null;
  dueBackOn?: string | null;
  status: AnimalStatus;
  statusOn?: string | null;
}

const CURRENCIES = new Set(Intl.supportedValuesOf('currency'));

const STATUS_DATE_WORDS = { sold: 'sold', deceased: 'found dead', returned: 'returned to its owner' } as const;

/**
 * Rules across fields, shared by the create and edit routes and the CSV import.
 * `today` is the keeper's calendar date; ISO dates compare correctly as strings.
 */
export function animalRuleErrors(a: AnimalState, today: string): FieldError[] {
  const e: FieldError[] = [];
  const add = (field: string, message: string) => e.push({ field, message });

  if (a.sex === 'male' && a.maturity === 'mature' && !a.maturedOn)
    add('maturedOn', 'A mature male needs the date of his maturing molt: his male clock counts from it.');
  if (a.maturedOn && a.maturity !== 'mature') add('maturedOn', 'Only a mature animal has a maturing date; set maturity to mature or clear the date.');
  if (a.maturedOn && a.maturedOn > today) add('maturedOn', `The maturing date ${a.maturedOn} is in the future.`);
  if (a.acquiredOn && a.acquiredOn > today) add('acquiredOn', `The acquisition date ${a.acquiredOn} is in the future.`);
  // A loaned male usually arrives already mature, so the check applies to the keeper's own stock only.
  if (a.maturedOn && a.acquiredOn && a.maturedOn < a.acquiredOn && a.custody !== 'loan-in') {
    add('maturedOn', `The maturing date ${a.maturedOn} is before the acquisition date ${a.acquiredOn}.`);
  }
  if (a.statusOn && a.statusOn > today) add('statusOn', `The status date ${a.statusOn} is in the future.`);

  if (a.pricePaidMinor != null && !a.priceCurrency) add('priceCurrency', 'Say which currency the price is in (e.g. EUR).');
  if (a.priceCurrency && !CURRENCIES.has(a.priceCurrency)) add('priceCurrency', `${a.priceCurrency} is not an ISO 4217 currency code.`);

  if (a.ownerKind === 'keeper' && !a.ownerEmail) add('ownerEmail', 'Give the e-mail of the keeper who owns the animal.');
  if (a.ownerKind === 'party' && !a.ownerName) add('ownerName', 'Give the name of the owner.');

  if (a.custody === 'loan-in' && a.ownerKind === 'self') add('custody', 'An animal on loan to you belongs to someone else: set its owner.');
  if (a.custody === 'loan-out' && a.ownerKind !== 'self') add('custody', 'Only an animal you own can be lent out from your collection.');
  if (a.custody === 'loan-out' && !a.custodyParty) add('custodyParty', 'Say who holds the animal while it is lent out.');
  if (a.custody === 'with-owner' && a.dueBackOn) add('dueBackOn', 'A due-back date belongs to a loan; set the custody to a loan or clear the date.');
  if (a.status === 'on-loan' && a.custody !== 'loan-out') add('status', 'An animal on loan is lent out: set custody to loan-out and say who holds it.');
  if (a.status === 'returned' && a.custody !== 'loan-in') add('status', 'Only an animal on loan to you can be returned to its owner.');
  if ((a.status === 'sold' || a.status === 'deceased' || a.status === 'returned') && !a.statusOn)
    add('statusOn', `Give the date the animal was ${STATUS_DATE_WORDS[a.status]}.`);
  return e;
}
