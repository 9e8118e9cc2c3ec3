import type { SpeciesGroup, ValueOrigin, VenomFlag } from './species.types.js';
import type { MaleClock } from './male-clock.js';
import type { FemaleReadiness } from './female-readiness.js';
import type { MaturingWindow } from './maturing-window.js';

export const ANIMAL_SEXES = ['female', 'male', 'unsexed'] as const;
export type AnimalSex = (typeof ANIMAL_SEXES)[number];

/** `penultimate`: one molt from mature (a subadult male whose next molt is expected to be his last). */
export const MATURITIES = ['immature', 'penultimate', 'mature'] as const;
export type Maturity = (typeof MATURITIES)[number];

/** `returned`: a loaned animal handed back to its owner (its `returnedOn` says when). */
export const ANIMAL_STATUSES = ['active', 'on-loan', 'returned', 'sold', 'deceased'] as const;
export type AnimalStatus = (typeof ANIMAL_STATUSES)[number];

/** `self`: the keeper who records it; `keeper`: another keeper of this instance; `party`: someone outside. */
export const OWNER_KINDS = ['self', 'keeper', 'party'] as const;
export type OwnerKind = (typeof OWNER_KINDS)[number];

export const CUSTODIES = ['with-owner', 'loan-in', 'loan-out'] as const;
export type Custody = (typeof CUSTODIES)[number];

export const ANIMAL_SORTS = ['label', 'species', 'sex', 'status', 'maturedOn', 'createdAt'] as const;
export type AnimalSort = (typeof ANIMAL_SORTS)[number];

/** ISO 8601 calendar date, `YYYY-MM-DD`. */
type DateString = string;

/**
 * Create an animal. Flat on purpose: a CSV row is exactly this object.
 * Owner: `ownerKind` self (default), keeper (`ownerEmail` of a keeper of this instance)
 * or party (`ownerName`, optional `ownerEmail`).
 */
export interface CreateAnimalRequest {
  speciesId: string;
  label: string;
  sex: AnimalSex;
  maturity?: Maturity;
  /** Date of the maturing molt; required for a mature male. */
  maturedOn?: DateString | null;
  acquiredOn?: DateString | null;
  acquiredFrom?: string | null;
  /** Integer minor units (cents) of `priceCurrency`. */
  pricePaidMinor?: number | null;
  /** ISO 4217 code, e.g. "EUR"; required with a price. */
  priceCurrency?: string | null;
  ownerKind?: OwnerKind;
  ownerEmail?: string | null;
  ownerName?: string | null;
  custody?: Custody;
  /** The other side of a loan: who holds it (loan-out) or who lent it (loan-in, defaults to the owner). */
  custodyParty?: string | null;
  dueBackOn?: DateString | null;
  status?: AnimalStatus;
  /** Date the status took effect; required for sold and deceased. */
  statusOn?: DateString | null;
  enclosure?: string | null;
  notes?: string | null;
  /** Female readiness: e.g. "stopped eating, dark abdomen" — pairing close to a molt wastes the pairing. */
  premoltNote?: string | null;
}

export type UpdateAnimalRequest = Partial<CreateAnimalRequest>;

export interface AnimalListQuery {
  limit?: number;
  offset?: number;
  sort?: AnimalSort;
  order?: 'asc' | 'desc';
  speciesId?: string;
  sex?: AnimalSex;
  status?: AnimalStatus;
  mature?: boolean;
  /** Case-insensitive text over label, enclosure and species names (current and former). */
  q?: string;
}

export interface AnimalOwner {
  kind: OwnerKind;
  /** For `self` and `keeper`. */
  userId?: string;
  /** Display name of the keeper, or the party's name. */
  name: string;
  /** For `party`, and for a `keeper` who has not accepted yet (then also the shown `name`). */
  email?: string;
  /** A keeper named by e-mail who has not accepted yet: no id or name is shown until they do. */
  awaitingAcceptance?: boolean;
}

/** An animal another keeper recorded as owned by the viewer, waiting for the viewer to accept. */
export interface OwnershipRequest {
  animalId: string;
  label: string;
  speciesName: string;
  recordedBy: string;
}

export interface AnimalSpeciesRef {
  id: string;
  scientificName: string;
  group: SpeciesGroup;
  urticatingHairs: boolean;
  venom: VenomFlag;
}

/** The male clock of a mature male (`maleClock` of shared/collection/male-clock.ts) and what it ran against. */
export interface MaleClockView extends MaleClock {
  maturedOn: DateString;
  lifespanMonths: { min: number; max: number; from: ValueOrigin };
}

/** Readiness of a mature female for pairing (`femaleReadiness`), with the keeper's premolt note. */
export interface FemaleReadinessView extends FemaleReadiness {
  lastMoltOn: DateString | null;
  premoltNote: string | null;
  /** Day the keeper flagged her as in premolt; null when not flagged (or a molt since ended it). */
  premoltSince: DateString | null;
}

export interface AnimalSummary {
  id: string;
  label: string;
  species: AnimalSpeciesRef;
  sex: AnimalSex;
  maturity: Maturity;
  maturedOn: DateString | null;
  status: AnimalStatus;
  statusOn: DateString | null;
  custody: Custody;
  /** Who the animal is on loan from or to, and when it goes back (loans only). */
  custodyParty: string | null;
  dueBackOn: DateString | null;
  enclosure: string | null;
  lastMoltOn: DateString | null;
  createdAt: string;
  /** The keeper who keeps this record, when it is not the viewer (an owner sees her male on loan to them); read-only then. */
  heldBy: { id: string; name: string } | null;
  /** Who lent an animal on loan to the viewer (custody `loan-in`), to offer them as a project partner. */
  lender: { name: string; email: string | null } | null;
}

export interface AnimalResponse extends AnimalSummary {
  recordedBy: { id: string; name: string };
  acquiredOn: DateString | null;
  acquiredFrom: string | null;
  pricePaidMinor: number | null;
  priceCurrency: string | null;
  owner: AnimalOwner;
  custodyParty: string | null;
  dueBackOn: DateString | null;
  notes: string | null;
  premoltNote: string | null;
  /** Only for mature males with a maturing date. */
  maleClock: MaleClockView | null;
  /** Only for mature females. */
  readiness: FemaleReadinessView | null;
  /** Day the keeper flagged premolt, while the flag stands (any animal). */
  premoltSince: DateString | null;
  /** The last day the keeper cleared a premolt flag. */
  premoltEndedOn: DateString | null;
  /** Last day a sperm web was seen (males). */
  spermWebOn: DateString | null;
  /** Day a loaned animal went back to its owner (status `returned`). */
  returnedOn: DateString | null;
  /** Only for a penultimate male with a molt on record: when his maturing molt is expected. */
  maturingWindow: MaturingWindow | null;
  /** Photos of the animal itself (molt photos come with the molts), oldest first. */
  photos: PhotoRef[];
  /** True when the viewer recorded it and may edit it. */
  editable: boolean;
  updatedAt: string;
}

/** `GET /api/animals/males/clock`: mature males, the most urgent first. */
export interface MaleClockRow {
  animal: AnimalSummary;
  clock: MaleClockView;
}

export const EXUVIA_SEXES = ['female', 'male', 'not-sure'] as const;
export type ExuviaSex = (typeof EXUVIA_SEXES)[number];

export interface CreateMoltRequest {
  moltedOn: DateString;
  exuviaSex?: ExuviaSex | null;
  /** Diagonal leg span in cm, one decimal. */
  sizeCm?: number | null;
  /** The maturing (last) molt of a male: sets his `maturedOn`. */
  maturing?: boolean;
  notes?: string | null;
}

export interface PhotoRef {
  id: string;
  url: string;
  thumbUrl: string;
  width: number;
  height: number;
  createdAt: string;
}

export interface MoltResponse {
  id: string;
  animalId: string;
  moltedOn: DateString;
  exuviaSex: ExuviaSex | null;
  sizeCm: number | null;
  maturing: boolean;
  notes: string | null;
  photos: PhotoRef[];
  createdAt: string;
}

/** One bad row of a CSV import: `field` is "line N". */
export interface ImportResult {
  imported: number;
}
