import type { BroodStage } from '../breeding/brood-stage.js';
import type { CalendarDate } from '../breeding/calendar-day.js';
import type { ShippingPayer } from '../projects/terms.types.js';
import type { FailureClause } from '../breeding/pairing.types.js';
import type { SacOutcomeState } from '../sacs/sacs.types.js';
import type { ShareChange } from './shares.js';
import type { Debt, LedgerProblem, PartyBalance } from './balances.js';
import type { RuleText } from '../errors/rule-text.js';
import type { HandOverMethod, LedgerEntryKind } from './ledger.types.js';

/** Kinds a person records through `POST …/entries` (arrivals and confirmations come from `…/confirm`). */
export const RECORDABLE_ENTRY_KINDS = ['hand-over', 'sale', 'cash-out', 'money', 'correction'] as const;
export type RecordableEntryKind = (typeof RECORDABLE_ENTRY_KINDS)[number];
export const HAND_OVER_METHODS: readonly HandOverMethod[] = ['pick-up', 'shipment'];

/** One flat body for every kind; which fields are needed depends on `kind`. Money is integer minor units. */
export interface CreateEntryRequest {
  kind: RecordableEntryKind;
  date: CalendarDate;
  /** The party of a hand-over, sale or cash-out. */
  memberId?: string;
  /** Which sac the young come from; defaults to the project's only (or latest) counted sac. */
  sacId?: string;
  count?: number;
  method?: HandOverMethod;
  carrier?: string;
  tracking?: string;
  /** Sale: total price, minor units. */
  priceMinor?: number;
  /** Cash-out: its own price per spiderling instead of the terms' price. */
  pricePerSpiderlingMinor?: number;
  /** Money: payer and payee; `currency` must be the account's. */
  fromMemberId?: string;
  toMemberId?: string;
  amountMinor?: number;
  currency?: string;
  /** Correction: the entry reversed and why. */
  reversesId?: string;
  reason?: string;
  note?: string;
}

/** Confirming a hand-over needs the arrival counts; confirming a money entry needs nothing. */
export interface ConfirmEntryRequest {
  arrivedAlive?: number;
  arrivedDead?: number;
  date?: CalendarDate;
}

export type EntryStatus = 'in-force' | 'reversed' | 'awaiting-confirmation' | 'left-out';
export type EntrySource = 'manual' | 'payment-provider';

export interface PartyRef {
  memberId: string;
  name: string;
}

export interface LedgerEntryResponse {
  id: string;
  /** Order in the ledger, 1, 2, … per project. */
  seq: number;
  /** `confirmation`: the other party confirmed a money entry (`confirmsId`). */
  kind: LedgerEntryKind | 'confirmation';
  date: CalendarDate;
  sacId: string | null;
  party: PartyRef | null;
  from: PartyRef | null;
  to: PartyRef | null;
  count: number | null;
  method: HandOverMethod | null;
  carrier: string | null;
  tracking: string | null;
  priceMinor: number | null;
  pricePerSpiderlingMinor: number | null;
  amountMinor: number | null;
  currency: string | null;
  handOverId: string | null;
  arrivedAlive: number | null;
  arrivedDead: number | null;
  reversesId: string | null;
  confirmsId: string | null;
  reason: string | null;
  note: string | null;
  source: EntrySource;
  recordedBy: { id: string; name: string } | null;
  recordedAt: string;
  status: EntryStatus;
  /** Why the entry does not count, when `left-out` (a `rule.ledger.*` sentence). */
  problem: RuleText | null;
  /** Who still has to confirm (a hand-over's recipient, a money entry's other party). */
  awaitingConfirmationBy: PartyRef | null;
}

export interface SacShareParty extends PartyRef {
  count: number;
  fixed: number;
  proportional: number;
  exactQuota: string;
  roundedUp: boolean;
}

export interface SacShareChange {
  /** When the basis last changed. */
  changedAt: string;
  /** Why: the count, the terms version, or both. */
  reasons: string[];
  lines: string[];
  changes: (ShareChange & { name: string })[];
}

export interface SacSharesView {
  sacId: string;
  layDate: CalendarDate;
  outcome: SacOutcomeState;
  /** Count of young: alive in care + handed over, sold or cashed out from this sac. */
  count: number;
  aliveInCare: number;
  withdrawn: number;
  /** The count is an estimate: shown "about N", its shares provisional (no cash-out, not settled). */
  estimated: boolean;
  parties: SacShareParty[];
  explanation: string[];
  change: SacShareChange | null;
  /** The failure clause in plain words when the sac failed. */
  failure: string | null;
}

export interface TermsSummary {
  number: number;
  pricePerSpiderlingMinor: number;
  currency: string;
  /** Said by the catalogue's `failureClauseText.<clause>` in the reader's language. */
  failureClause: FailureClause;
  handOverStage: string;
  shippingPaidBy: string;
  lines: { memberId: string; name: string; weight: number; fixedCount: number; pickOrder: number }[];
}

export interface SharesResponse {
  projectId: string;
  /** Null while no version of the terms is in force; then there are no shares. */
  terms: TermsSummary | null;
  sacs: SacSharesView[];
  /** The project's account: each party's share summed over its sacs. */
  totals: (PartyRef & { count: number })[];
  notices: string[];
}

export interface PartyBalanceView extends PartyBalance, PartyRef {}

export interface BalancesResponse {
  projectId: string;
  currency: string | null;
  ownerMemberId: string;
  parties: PartyBalanceView[];
  debts: (Debt & { fromName: string; toName: string })[];
  problems: LedgerProblem[];
  /** Nothing owed in young or money, with at least one counted sac and terms in force. */
  settled: boolean;
  /** A count behind the shares is an estimate: shares are "about" and provisional. */
  provisional: boolean;
}

/** What the hand-over form shows before recording. */
export interface HandOverFormResponse {
  parties: (PartyRef & { owedSpiderlings: number })[];
  methods: readonly HandOverMethod[];
  /** The terms' hand-over stage and who pays shipping, as codes the client names in the reader's words. */
  handOverStage: BroodStage | null;
  shippingPaidBy: ShippingPayer | null;
}

export interface StatementResponse {
  project: { id: string; title: string };
  party: PartyRef & { role: string };
  generatedAt: string;
  terms: TermsSummary | null;
  sacs: SacSharesView[];
  entries: LedgerEntryResponse[];
  balance: PartyBalanceView | null;
  /** A count behind the shares is an estimate: the share is provisional. */
  provisional: boolean;
  debts: BalancesResponse['debts'];
  failureNotes: string[];
  /** Young of this account were shipped: the statement adds the shipping cautions. */
  hasShipment: boolean;
}

export interface CreatePayoutAccountRequest {
  /** ISO 3166-1 alpha-2 country of the keeper's bank account, e.g. DE. */
  country: string;
}

export interface PayoutAccountResponse {
  linked: boolean;
  accountId: string | null;
  chargesEnabled: boolean;
  payoutsEnabled: boolean;
  detailsSubmitted: boolean;
  /** Present right after linking (or re-linking): where to finish onboarding. */
  onboardingUrl: string | null;
}

export interface CreateCheckoutRequest {
  toMemberId: string;
  amountMinor: number;
}

export interface CheckoutResponse {
  sessionId: string;
  url: string;
  amountMinor: number;
  currency: string;
}
