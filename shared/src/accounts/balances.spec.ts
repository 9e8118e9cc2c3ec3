import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkWithdrawal, computeBalances, type AccountBalances } from './balances.js';
import type { LedgerEntry } from './ledger.types.js';
import { computeShares } from './shares.js';

// An invented project: Ana owns the female and runs the project (owner), Ben lent the male,
// Cleo paid towards the female. Price per spiderling EUR 5.00 = 500 minor units (ISO 4217: EUR has 2 decimals).
const shares = computeShares(60, [
  { partyId: 'ana', weight: 2, pickOrder: 1 },
  { partyId: 'ben', weight: 1, pickOrder: 2, fixedCount: 10 },
  { partyId: 'cleo', weight: 1, pickOrder: 3 },
]).parties; // 50 left after Ben's 10: ana 25, ben 10 + 12.5 → 13 (tie, earlier pick) = 23, cleo 12
const PRICE = 500;
const bal = (entries: LedgerEntry[]) => computeBalances(shares, entries, PRICE, 'EUR', 'ana');
const of = (b: AccountBalances, id: string) => b.parties.find((p) => p.partyId === id)!;

const handOver = (id: string, partyId: string, count: number): LedgerEntry => ({
  kind: 'hand-over',
  id,
  date: '2026-05-02',
  partyId,
  count,
  method: 'shipment',
  carrier: 'Overnight courier',
  tracking: 'TRK-1',
});
const cashOut = (id: string, partyId: string, count: number): LedgerEntry => ({ kind: 'cash-out', id, date: '2026-05-03', partyId, count });
const money = (id: string, fromPartyId: string, toPartyId: string, amountMinor: number): LedgerEntry => ({
  kind: 'money',
  id,
  date: '2026-05-04',
  fromPartyId,
  toPartyId,
  amountMinor,
  currency: 'EUR',
});
const correction = (id: string, reversesId: string): LedgerEntry => ({ kind: 'correction', id, date: '2026-05-05', reversesId, reason: 'entered twice' });

describe('balances', () => {
  it('starts with every party owed its share', () => {
    expect(shares.map((s) => s.count)).toEqual([25, 23, 12]);
    const b = bal([]);
    expect(b.parties.map((p) => [p.partyId, p.share, p.owedSpiderlings])).toEqual([
      ['ana', 25, 25],
      ['ben', 23, 23],
      ['cleo', 12, 12],
    ]);
    expect(b.debts).toEqual([]);
    expect(b.problems).toEqual([]);
  });

  it('counts a hand-over against the share and records the arrival count without giving losses back', () => {
    let b = bal([handOver('h1', 'ben', 10)]);
    expect(of(b, 'ben')).toMatchObject({ handedOver: 10, owedSpiderlings: 13, unconfirmedHandOvers: 1 });
    b = bal([handOver('h1', 'ben', 10), { kind: 'arrival', id: 'a1', date: '2026-05-03', handOverId: 'h1', arrivedAlive: 9, arrivedDead: 1 }]);
    expect(of(b, 'ben')).toMatchObject({ handedOver: 10, owedSpiderlings: 13, arrivedAlive: 9, arrivedDead: 1, unconfirmedHandOvers: 0 });
    expect(b.problems).toEqual([]);
  });

  it('counts a sale against the seller and keeps its price out of what parties owe each other', () => {
    const b = bal([{ kind: 'sale', id: 's1', date: '2026-05-02', partyId: 'cleo', count: 5, priceMinor: 4_000, currency: 'EUR' }]);
    expect(of(b, 'cleo')).toMatchObject({ sold: 5, owedSpiderlings: 7, salesMinor: 4_000 });
    expect(b.debts).toEqual([]);
  });

  it('makes the owner owe a cash-out at the terms price, or at the entry price when it has one', () => {
    let b = bal([cashOut('c1', 'ben', 4)]);
    expect(of(b, 'ben')).toMatchObject({ cashedOut: 4, owedSpiderlings: 19, cashOutValueMinor: 2_000, moneyOwedToMinor: 2_000 });
    expect(of(b, 'ana')).toMatchObject({ moneyOwesMinor: 2_000 });
    expect(b.debts).toEqual([{ fromPartyId: 'ana', toPartyId: 'ben', amountMinor: 2_000, currency: 'EUR' }]);
    b = bal([{ kind: 'cash-out', id: 'c1', date: '2026-05-03', partyId: 'ben', count: 4, pricePerSpiderlingMinor: 650 }]);
    expect(b.debts).toEqual([{ fromPartyId: 'ana', toPartyId: 'ben', amountMinor: 2_600, currency: 'EUR' }]);
  });

  it('nets payments against debts, and an overpayment turns the debt round', () => {
    expect(bal([cashOut('c1', 'ben', 4), money('m1', 'ana', 'ben', 1_500)]).debts).toEqual([
      { fromPartyId: 'ana', toPartyId: 'ben', amountMinor: 500, currency: 'EUR' },
    ]);
    expect(bal([cashOut('c1', 'ben', 4), money('m1', 'ana', 'ben', 2_000)]).debts).toEqual([]);
    const b = bal([cashOut('c1', 'ben', 4), money('m1', 'ana', 'ben', 3_000)]);
    expect(b.debts).toEqual([{ fromPartyId: 'ben', toPartyId: 'ana', amountMinor: 1_000, currency: 'EUR' }]);
    expect(of(b, 'ana')).toMatchObject({ paidMinor: 3_000, moneyOwedToMinor: 1_000, moneyOwesMinor: 0 });
    expect(of(b, 'ben')).toMatchObject({ receivedMinor: 3_000, moneyOwesMinor: 1_000 });
  });

  it('nets each pair separately with three parties', () => {
    const b = bal([cashOut('c1', 'ben', 2), cashOut('c2', 'cleo', 3), money('m1', 'cleo', 'ben', 700)]);
    expect(b.debts).toEqual([
      { fromPartyId: 'ana', toPartyId: 'ben', amountMinor: 1_000, currency: 'EUR' },
      { fromPartyId: 'ana', toPartyId: 'cleo', amountMinor: 1_500, currency: 'EUR' },
      { fromPartyId: 'ben', toPartyId: 'cleo', amountMinor: 700, currency: 'EUR' }, // Cleo paid Ben 700 it did not owe
    ]);
  });

  it('undoes an entry with a correction, and reinstates it when the correction is itself corrected', () => {
    const entries = [handOver('h1', 'ben', 10), handOver('h2', 'ben', 10), correction('x1', 'h2')];
    let b = bal(entries);
    expect(of(b, 'ben')).toMatchObject({ handedOver: 10, owedSpiderlings: 13 });
    expect(b.inForce).toEqual(['h1', 'x1']);
    b = bal([...entries, correction('x2', 'x1')]);
    expect(of(b, 'ben')).toMatchObject({ handedOver: 20, owedSpiderlings: 3 });
    expect(b.inForce).toEqual(['h1', 'h2', 'x2']);
    b = bal([cashOut('c1', 'ben', 4), money('m1', 'ana', 'ben', 2_000), correction('x1', 'c1')]);
    expect(b.debts).toEqual([{ fromPartyId: 'ben', toPartyId: 'ana', amountMinor: 2_000, currency: 'EUR' }]);
    expect(of(b, 'ben')).toMatchObject({ cashedOut: 0, owedSpiderlings: 23 });
  });

  it('corrects sales, arrivals and payments too', () => {
    const b = bal([
      { kind: 'sale', id: 's1', date: '2026-05-02', partyId: 'cleo', count: 5, priceMinor: 4_000, currency: 'EUR' },
      handOver('h1', 'cleo', 2),
      { kind: 'arrival', id: 'a1', date: '2026-05-03', handOverId: 'h1', arrivedAlive: 1, arrivedDead: 1 },
      money('m1', 'ben', 'ana', 100),
      correction('x1', 's1'),
      correction('x2', 'a1'),
      correction('x3', 'm1'),
    ]);
    expect(of(b, 'cleo')).toMatchObject({ sold: 0, salesMinor: 0, handedOver: 2, owedSpiderlings: 10, arrivedAlive: 0, unconfirmedHandOvers: 1 });
    expect(b.debts).toEqual([]);
  });

  it('leaves out entries that cannot count and says why', () => {
    const b = bal([
      handOver('h1', 'ben', 3),
      handOver('h1', 'ben', 3), // same id again
      correction('x1', 'nope'),
      correction('x2', 'h1'),
      correction('x3', 'h1'), // second correction of the same entry
      { kind: 'money', id: 'm1', date: '2026-05-04', fromPartyId: 'ana', toPartyId: 'ben', amountMinor: 100, currency: 'USD' },
      money('m2', 'ana', 'ana', 100),
      money('m3', 'ana', 'ben', 0),
      cashOut('c1', 'ana', 2),
      handOver('h2', 'dora', 1),
      { kind: 'arrival', id: 'a1', date: '2026-05-03', handOverId: 'h2', arrivedAlive: 2, arrivedDead: 0 },
      { kind: 'arrival', id: 'a2', date: '2026-05-03', handOverId: 'h2', arrivedAlive: 1, arrivedDead: 0 },
    ]);
    expect(b.problems.map((p) => `${p.entryId}: ${p.key}`)).toEqual([
      'h1: rule.ledger.duplicate',
      'x1: rule.ledger.notEarlier',
      'x3: rule.ledger.alreadyCorrected',
      'm1: rule.ledger.otherCurrency',
      'm2: rule.ledger.paymentToItself',
      'm3: rule.ledger.paymentAmount',
      'c1: rule.ledger.ownerCashOut',
      'h2: rule.ledger.noShare',
      'a1: rule.ledger.arrivalMismatch',
      'a2: rule.ledger.arrivalTwice',
    ]);
    // the values a sentence takes, and its English rendering
    expect(b.problems[3]).toMatchObject({
      values: { currency: 'USD', accountCurrency: 'EUR' },
      message: 'This entry is in USD, but the account is kept in EUR.',
    });
    expect(b.problems[8]).toMatchObject({
      values: { counted: 2, count: 1 },
      message: 'This arrival counts 2 young for a hand-over of 1; it is kept, but check the counts.',
    });
    expect(of(b, 'ben').handedOver).toBe(0);
    expect(of(b, 'dora')).toMatchObject({ share: 0, handedOver: 1, owedSpiderlings: -1 });
    expect(b.debts).toEqual([]);
  });

  it('rejects a bad currency or price', () => {
    expect(() => computeBalances(shares, [], PRICE, 'euro', 'ana')).toThrow(/ISO 4217/);
    expect(() => computeBalances(shares, [], 4.5, 'EUR', 'ana')).toThrow(/price per spiderling/);
  });
});

describe('balances: invariants over random ledgers', () => {
  const ids = ['ana', 'ben', 'cleo'];
  const arbEntry = fc.oneof(
    fc.record({
      kind: fc.constant('hand-over' as const),
      partyId: fc.constantFrom(...ids),
      count: fc.integer({ min: 1, max: 20 }),
      method: fc.constantFrom('pick-up' as const, 'shipment' as const),
    }),
    fc.record({
      kind: fc.constant('sale' as const),
      partyId: fc.constantFrom(...ids),
      count: fc.integer({ min: 1, max: 20 }),
      priceMinor: fc.integer({ min: 0, max: 10_000 }),
      currency: fc.constant('EUR'),
    }),
    fc.record({ kind: fc.constant('cash-out' as const), partyId: fc.constantFrom('ben', 'cleo'), count: fc.integer({ min: 1, max: 20 }) }),
    fc.record({
      kind: fc.constant('money' as const),
      fromPartyId: fc.constantFrom(...ids),
      toPartyId: fc.constantFrom(...ids),
      amountMinor: fc.integer({ min: 1, max: 20_000 }),
      currency: fc.constant('EUR'),
    }),
  );
  const arbLedger = fc
    .array(arbEntry, { maxLength: 25 })
    .map((rows) =>
      rows.map((r, i) => ({ ...r, id: `e${i}`, date: '2026-05-01' }) as LedgerEntry).filter((e) => !(e.kind === 'money' && e.fromPartyId === e.toPartyId)),
    );

  it('keeps spiderlings and money consistent', () => {
    fc.assert(
      fc.property(arbLedger, (entries) => {
        const b = bal(entries);
        expect(b.problems).toEqual([]);
        let totalCashOut = 0;
        for (const p of b.parties) totalCashOut += p.cashOutValueMinor;
        for (const p of b.parties) {
          expect(p.owedSpiderlings).toBe(p.share - p.handedOver - p.sold - p.cashedOut);
          // net money position = own cash-outs − (owner: all cash-outs) + paid − received
          const expected = p.cashOutValueMinor - (p.partyId === 'ana' ? totalCashOut : 0) + p.paidMinor - p.receivedMinor;
          expect(p.moneyOwedToMinor - p.moneyOwesMinor).toBe(expected);
        }
        const owedTo = b.parties.reduce((s, p) => s + p.moneyOwedToMinor, 0);
        const owes = b.parties.reduce((s, p) => s + p.moneyOwesMinor, 0);
        expect(owedTo).toBe(owes);
        expect(b.debts.every((d) => d.amountMinor > 0 && d.fromPartyId !== d.toPartyId)).toBe(true);
      }),
      { numRuns: 500 },
    );
  });

  it('an entry followed by its correction leaves the balances as they were', () => {
    fc.assert(
      fc.property(arbLedger, arbEntry, (entries, extra) => {
        fc.pre(!(extra.kind === 'money' && extra.fromPartyId === extra.toPartyId));
        const added = { ...extra, id: 'extra', date: '2026-05-09' } as LedgerEntry;
        const withCorrection = bal([...entries, added, correction('undo', 'extra')]);
        const without = bal(entries);
        expect(withCorrection.parties).toEqual(without.parties);
        expect(withCorrection.debts).toEqual(without.debts);
      }),
      { numRuns: 300 },
    );
  });
});

describe('withdrawal check', () => {
  it('says by how much a withdrawal would exceed what is owed', () => {
    const b = of(bal([handOver('h1', 'ben', 20)]), 'ben'); // 3 left of 23
    expect(checkWithdrawal(b, 3)).toEqual({ excess: 0, message: null });
    const over = checkWithdrawal(b, 5);
    expect(over.excess).toBe(2);
    expect(over).toMatchObject({
      key: 'rule.withdrawal.excess',
      values: { excess: 2, available: 3, share: 23, handedOver: 20, sold: 0, cashedOut: 0 },
      message: 'This is 2 more than the 3 young still owed to this party (share 23; 20 handed over, 0 sold, 0 cashed out).',
    });
    const drawn = of(bal([handOver('h1', 'ben', 25)]), 'ben'); // already 2 over
    expect(checkWithdrawal(drawn, 1).excess).toBe(1);
    expect(() => checkWithdrawal(b, 0)).toThrow(/above 0/);
  });
});
