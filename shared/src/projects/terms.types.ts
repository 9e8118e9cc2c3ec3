import type { BroodStage } from '../breeding/brood-stage.js';
import type { FailureClause } from '../breeding/pairing.types.js';

export const FAILURE_CLAUSES: readonly FailureClause[] = ['nothing-owed', 'carries-over'];
export const SHIPPING_PAYERS = ['sender', 'recipient', 'split'] as const;
export type ShippingPayer = (typeof SHIPPING_PAYERS)[number];
export const DEFAULT_HAND_OVER_STAGE: BroodStage = 'second-instar';

export interface TermsLineInput {
  memberId: string;
  /** Whole number ≥ 0; shares are weight / sum of weights. */
  weight: number;
  /** Whole number ≥ 0 of young taken off the top for this party. */
  fixedCount?: number | null;
  /** 1 picks first; unique per version. */
  pickOrder: number;
}

export interface ProposeTermsRequest {
  /** One line per owner/partner party of the project, each exactly once. */
  lines: TermsLineInput[];
  /** Price of one spiderling in minor units (cents), for cash-outs. */
  pricePerSpiderlingMinor: number;
  /** ISO 4217 code, e.g. EUR. */
  currency: string;
  failureClause: FailureClause;
  handOverStage?: BroodStage;
  shippingPaidBy: ShippingPayer;
  note?: string | null;
}

/** A partner accepts for themselves with an empty body; the owner records an outside party's acceptance with `memberId` and a note. */
export interface AcceptTermsRequest {
  memberId?: string;
  note?: string | null;
}

/** `in-force`: the latest version every partner accepted; `proposed`: newer and still awaiting acceptance; `superseded`: older. */
export type TermsStatus = 'in-force' | 'proposed' | 'superseded';

export interface TermsAcceptanceResponse {
  memberId: string;
  memberName: string;
  acceptedAt: string;
  /** The user who recorded it; differs from the party when the owner recorded it on an outside party's behalf. */
  recordedBy: { id: string; name: string };
  onBehalf: boolean;
  note: string | null;
}

export interface TermsLineResponse {
  memberId: string;
  memberName: string;
  role: 'owner' | 'partner';
  weight: number;
  fixedCount: number;
  pickOrder: number;
  /** weight / sum of weights, reduced ("2/3"). */
  share: string;
  /** Whether this party must still accept (partners only; the owner proposed it). */
  mustAccept: boolean;
  accepted: boolean;
}

export interface TermsVersionResponse {
  number: number;
  status: TermsStatus;
  createdAt: string;
  createdBy: { id: string; name: string };
  pricePerSpiderlingMinor: number;
  currency: string;
  failureClause: FailureClause;
  handOverStage: BroodStage;
  shippingPaidBy: ShippingPayer;
  note: string | null;
  lines: TermsLineResponse[];
  acceptances: TermsAcceptanceResponse[];
  /** Partner parties still to accept; empty once in force (or superseded). */
  awaiting: { memberId: string; name: string }[];
}

export interface TermsListResponse {
  inForce: number | null;
  versions: TermsVersionResponse[];
}
