import type { CalendarDate } from '../breeding/calendar-day.js';

/** Ledger entries of a project's account. Append-only: a mistake is undone by a `correction`. */
interface EntryBase {
  id: string;
  /** The day the thing happened (ISO 8601 calendar date). */
  date: CalendarDate;
}

export type HandOverMethod = 'pick-up' | 'shipment';

/** Young delivered to a party, counted against that party's share. Losses after it are the recipient's. */
export interface HandOverEntry extends EntryBase {
  kind: 'hand-over';
  partyId: string;
  count: number;
  method: HandOverMethod;
  carrier?: string;
  tracking?: string;
}

/** The recipient's count on arrival of an earlier hand-over. Recorded only; it does not change shares. */
export interface ArrivalEntry extends EntryBase {
  kind: 'arrival';
  handOverId: string;
  arrivedAlive: number;
  arrivedDead: number;
}

/** A party sold young from its share to an outside buyer. */
export interface SaleEntry extends EntryBase {
  kind: 'sale';
  partyId: string;
  count: number;
  /** Total price, integer minor units (cents), in `currency`. */
  priceMinor: number;
  currency: string;
}

/**
 * A party takes money instead of `count` young; the project owner owes it count × price per
 * spiderling (the terms' price, or `pricePerSpiderlingMinor` when the entry fixes its own).
 */
export interface CashOutEntry extends EntryBase {
  kind: 'cash-out';
  partyId: string;
  count: number;
  pricePerSpiderlingMinor?: number;
}

/** Money paid from one party to another (integer minor units). */
export interface MoneyEntry extends EntryBase {
  kind: 'money';
  fromPartyId: string;
  toPartyId: string;
  amountMinor: number;
  currency: string;
}

/** Reverses one earlier entry (a correction may itself be reversed, which reinstates the original). */
export interface CorrectionEntry extends EntryBase {
  kind: 'correction';
  reversesId: string;
  reason: string;
}

export type LedgerEntry = HandOverEntry | ArrivalEntry | SaleEntry | CashOutEntry | MoneyEntry | CorrectionEntry;
export type LedgerEntryKind = LedgerEntry['kind'];
