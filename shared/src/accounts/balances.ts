import type { LedgerEntry } from './ledger.types.js';
import { ruleText, type RuleText } from '../errors/rule-text.js';

export interface PartyBalance {
  partyId: string;
  /** Young owed by the terms (the party's share, summed over sacs). */
  share: number;
  handedOver: number;
  sold: number;
  cashedOut: number;
  /** share − handedOver − sold − cashedOut; negative when more went out than the share. */
  owedSpiderlings: number;
  arrivedAlive: number;
  arrivedDead: number;
  /** Hand-overs with no arrival count yet. */
  unconfirmedHandOvers: number;
  /** Sum of this party's sale prices (money from outside buyers; not part of what parties owe each other). */
  salesMinor: number;
  /** Value of this party's cash-outs, which the owner owes it. */
  cashOutValueMinor: number;
  /** Money this party paid to / received from other parties. */
  paidMinor: number;
  receivedMinor: number;
  /** After netting: what other parties owe this party, and what it owes them. */
  moneyOwedToMinor: number;
  moneyOwesMinor: number;
}

/** After netting each pair of parties: `fromPartyId` owes `toPartyId` `amountMinor`. */
export interface Debt {
  fromPartyId: string;
  toPartyId: string;
  amountMinor: number;
  currency: string;
}

/** Why an entry is left out (or kept with a doubt): a `rule.ledger.*` sentence. */
export interface LedgerProblem extends RuleText {
  entryId: string;
}

export interface AccountBalances {
  currency: string;
  ownerPartyId: string;
  /** Parties of the shares first (in their order), then any other party named in the ledger. */
  parties: PartyBalance[];
  debts: Debt[];
  /** Ids of entries in force (not reversed). */
  inForce: string[];
  /** Entries that were left out, and why. */
  problems: LedgerProblem[];
}

const CURRENCY = /^[A-Z]{3}$/;
const isCount = (n: number) => Number.isSafeInteger(n) && n > 0;
const isMinor = (n: number) => Number.isSafeInteger(n) && n >= 0;

function emptyBalance(partyId: string, share: number): PartyBalance {
  return {
    partyId,
    share,
    handedOver: 0,
    sold: 0,
    cashedOut: 0,
    owedSpiderlings: share,
    arrivedAlive: 0,
    arrivedDead: 0,
    unconfirmedHandOvers: 0,
    salesMinor: 0,
    cashOutValueMinor: 0,
    paidMinor: 0,
    receivedMinor: 0,
    moneyOwedToMinor: 0,
    moneyOwesMinor: 0,
  };
}

/** Which entries are in force: walking back from the newest, a correction in force reverses its target. */
const problem = (entryId: string, key: string, values?: RuleText['values']): LedgerProblem => ({ entryId, ...ruleText(`ledger.${key}`, values) });

function entriesInForce(entries: readonly LedgerEntry[], problems: LedgerProblem[]): { valid: LedgerEntry[]; inForce: Set<string> } {
  const position = new Map<string, number>();
  const valid: LedgerEntry[] = [];
  for (const e of entries) {
    if (position.has(e.id)) {
      problems.push(problem(e.id, 'duplicate'));
      continue;
    }
    position.set(e.id, valid.length);
    valid.push(e);
  }
  const reversedBy = new Map<string, string>();
  for (const e of valid) {
    if (e.kind !== 'correction') continue;
    const target = position.get(e.reversesId);
    if (target === undefined || target >= position.get(e.id)!) {
      problems.push(problem(e.id, 'notEarlier'));
    } else if (reversedBy.has(e.reversesId)) {
      problems.push(problem(e.id, 'alreadyCorrected'));
    } else {
      reversedBy.set(e.reversesId, e.id);
    }
  }
  const inForce = new Set<string>();
  const reversed = new Set<string>();
  for (let i = valid.length - 1; i >= 0; i -= 1) {
    const e = valid[i]!;
    if (reversed.has(e.id)) continue;
    inForce.add(e.id);
    if (e.kind === 'correction' && reversedBy.get(e.reversesId) === e.id) reversed.add(e.reversesId);
  }
  return { valid, inForce };
}

/**
 * Balances of one project's account.
 *
 * Spiderlings: each party is owed its share less what was handed over to it, sold by it or cashed
 * out by it. Money: a cash-out makes the owner owe the party count × price; a payment from A to B
 * lowers what A owes B (or, past zero, makes B owe A). Each pair of parties is netted to one debt.
 * Entries that cannot count (bad numbers, another currency, a dangling reference) are left out and
 * listed in `problems` rather than thrown, so a stored ledger always shows.
 */
export function computeBalances(
  shares: readonly { partyId: string; count: number }[],
  entries: readonly LedgerEntry[],
  pricePerSpiderlingMinor: number,
  currency: string,
  ownerPartyId: string,
): AccountBalances {
  if (!CURRENCY.test(currency)) throw new RangeError(`"${currency}" is not an ISO 4217 currency code (three capital letters, e.g. EUR).`);
  if (!isMinor(pricePerSpiderlingMinor)) {
    throw new RangeError(`The price per spiderling must be a whole number of minor units, 0 or more (got ${pricePerSpiderlingMinor}).`);
  }
  const problems: LedgerProblem[] = [];
  const balances = new Map<string, PartyBalance>();
  for (const s of shares) {
    const b = balances.get(s.partyId) ?? emptyBalance(s.partyId, 0);
    b.share += s.count;
    b.owedSpiderlings = b.share;
    balances.set(s.partyId, b);
  }
  const known = new Set(balances.keys());
  const party = (id: string, entryId: string) => {
    if (!balances.has(id)) {
      balances.set(id, emptyBalance(id, 0));
      problems.push(problem(entryId, 'noShare'));
    }
    return balances.get(id)!;
  };
  const owes = new Map<string, number>(); // "a→b" → amount a owes b
  const addDebt = (from: string, to: string, amount: number) => owes.set(`${from}→${to}`, (owes.get(`${from}→${to}`) ?? 0) + amount);

  const { valid, inForce } = entriesInForce(entries, problems);
  const handOvers = new Map<string, { partyId: string; count: number }>();
  const arrived = new Set<string>();
  const skip = (entryId: string, key: string, values?: RuleText['values']) => problems.push(problem(entryId, key, values));

  for (const e of valid) {
    if (!inForce.has(e.id)) continue;
    switch (e.kind) {
      case 'hand-over': {
        if (!isCount(e.count)) {
          skip(e.id, 'handOverCount');
          inForce.delete(e.id);
          break;
        }
        const b = party(e.partyId, e.id);
        b.handedOver += e.count;
        handOvers.set(e.id, { partyId: e.partyId, count: e.count });
        break;
      }
      case 'arrival': {
        const h = handOvers.get(e.handOverId);
        if (!h) {
          skip(e.id, 'arrivalWithoutHandOver');
          inForce.delete(e.id);
          break;
        }
        if (!isMinor(e.arrivedAlive) || !isMinor(e.arrivedDead)) {
          skip(e.id, 'arrivalCounts');
          inForce.delete(e.id);
          break;
        }
        if (arrived.has(e.handOverId)) {
          skip(e.id, 'arrivalTwice');
          inForce.delete(e.id);
          break;
        }
        arrived.add(e.handOverId);
        const b = balances.get(h.partyId)!;
        b.arrivedAlive += e.arrivedAlive;
        b.arrivedDead += e.arrivedDead;
        if (e.arrivedAlive + e.arrivedDead !== h.count) {
          skip(e.id, 'arrivalMismatch', { counted: e.arrivedAlive + e.arrivedDead, count: h.count });
        }
        break;
      }
      case 'sale': {
        if (!isCount(e.count) || !isMinor(e.priceMinor)) {
          skip(e.id, 'saleNumbers');
          inForce.delete(e.id);
          break;
        }
        if (e.currency !== currency) {
          skip(e.id, 'otherCurrency', { currency: e.currency, accountCurrency: currency });
          inForce.delete(e.id);
          break;
        }
        const b = party(e.partyId, e.id);
        b.sold += e.count;
        b.salesMinor += e.priceMinor;
        break;
      }
      case 'cash-out': {
        const price = e.pricePerSpiderlingMinor ?? pricePerSpiderlingMinor;
        if (!isCount(e.count) || !isMinor(price)) {
          skip(e.id, 'cashOutNumbers');
          inForce.delete(e.id);
          break;
        }
        if (e.partyId === ownerPartyId) {
          skip(e.id, 'ownerCashOut');
          inForce.delete(e.id);
          break;
        }
        const b = party(e.partyId, e.id);
        b.cashedOut += e.count;
        b.cashOutValueMinor += e.count * price;
        addDebt(ownerPartyId, e.partyId, e.count * price);
        break;
      }
      case 'money': {
        if (!isCount(e.amountMinor)) {
          skip(e.id, 'paymentAmount');
          inForce.delete(e.id);
          break;
        }
        if (e.currency !== currency) {
          skip(e.id, 'otherCurrency', { currency: e.currency, accountCurrency: currency });
          inForce.delete(e.id);
          break;
        }
        if (e.fromPartyId === e.toPartyId) {
          skip(e.id, 'paymentToItself');
          inForce.delete(e.id);
          break;
        }
        party(e.fromPartyId, e.id).paidMinor += e.amountMinor;
        party(e.toPartyId, e.id).receivedMinor += e.amountMinor;
        addDebt(e.fromPartyId, e.toPartyId, -e.amountMinor);
        break;
      }
      case 'correction':
        break;
    }
  }
  if (!balances.has(ownerPartyId) && owes.size > 0) balances.set(ownerPartyId, emptyBalance(ownerPartyId, 0));

  for (const [id, h] of handOvers) if (!arrived.has(id)) balances.get(h.partyId)!.unconfirmedHandOvers += 1;
  for (const b of balances.values()) b.owedSpiderlings = b.share - b.handedOver - b.sold - b.cashedOut;

  const order = [...known, ...[...balances.keys()].filter((id) => !known.has(id))];
  const debts: Debt[] = [];
  for (let i = 0; i < order.length; i += 1) {
    for (let j = i + 1; j < order.length; j += 1) {
      const a = order[i]!;
      const b = order[j]!;
      const net = (owes.get(`${a}→${b}`) ?? 0) - (owes.get(`${b}→${a}`) ?? 0);
      if (net === 0) continue;
      const [from, to, amountMinor] = net > 0 ? [a, b, net] : [b, a, -net];
      debts.push({ fromPartyId: from, toPartyId: to, amountMinor, currency });
      balances.get(from)!.moneyOwesMinor += amountMinor;
      balances.get(to)!.moneyOwedToMinor += amountMinor;
    }
  }
  return {
    currency,
    ownerPartyId,
    parties: order.map((id) => balances.get(id)!),
    debts,
    inForce: valid.filter((e) => inForce.has(e.id)).map((e) => e.id),
    problems,
  };
}

/** How many young more than the party is owed a withdrawal would take, and the sentence that says so (none when it fits). */
export type WithdrawalCheck = { excess: 0; message: null } | ({ excess: number } & RuleText);

/** Whether a hand-over, sale or cash-out of `count` young fits within what the party is still owed. */
export function checkWithdrawal(balance: PartyBalance, count: number): WithdrawalCheck {
  if (!isCount(count)) throw new RangeError(`The number of young must be a whole number above 0 (got ${count}).`);
  const available = Math.max(0, balance.owedSpiderlings);
  const excess = Math.max(0, count - available);
  if (excess === 0) return { excess, message: null };
  const { share, handedOver, sold, cashedOut } = balance;
  return { excess, ...ruleText('withdrawal.excess', { excess, available, share, handedOver, sold, cashedOut }) };
}
