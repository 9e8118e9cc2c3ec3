/**
 * Shares, ledger entries and balances through the API against real PostgreSQL. Expected figures
 * are worked by hand from the terms (largest remainder, checked against hare-niemeyer in shared).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BalancesResponse, LedgerEntryResponse, PartyBalanceView, SharesResponse, KeysetPage } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { accountScenario, api, recordCount, type AccountScenario } from './accounts.fixtures';
import { Project } from '../src/projects/project.entity';
import { loadAccountFacts, loadAccounts } from '../src/accounts/account-loader';
import { accountTodos } from '../src/accounts/account-todos';
import { isSettled } from '../src/accounts/balances.mapper';

let t: TestApp;
let s: AccountScenario;

beforeAll(async () => {
  t = await createTestApp();
  s = await accountScenario(t.app, t.orm);
});
afterAll(async () => t?.close());

const balances = async (who = s.mira): Promise<BalancesResponse> =>
  (await api(t.app).get(`/api/projects/${s.projectId}/balances`).set('Authorization', who.bearer).expect(200)).body as BalancesResponse;
const party = (b: BalancesResponse, id: string): PartyBalanceView => b.parties.find((p) => p.memberId === id)!;
const post = (body: object, who = s.mira) => api(t.app).post(`/api/projects/${s.projectId}/entries`).set('Authorization', who.bearer).send(body);
const entry = async (body: object, who = s.mira): Promise<LedgerEntryResponse> => {
  const res = await post(body, who);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as LedgerEntryResponse;
};
const D = '2026-11-20';

describe('shares', () => {
  it('splits the sac of 62: Tomasz 2 fixed, then 60 by 2 : 1 : 1, with the plain-words explanation', async () => {
    const res = await api(t.app).get(`/api/projects/${s.projectId}/shares`).set('Authorization', s.tomasz.bearer).expect(200);
    const body = res.body as SharesResponse;
    expect(body.terms).toMatchObject({ number: 1, currency: 'EUR', pricePerSpiderlingMinor: 500, failureClause: 'carries-over' });
    expect(body.terms).not.toHaveProperty('failureClauseText'); // the code only: the client says it with the catalogue's failureClauseText
    expect(body.sacs).toHaveLength(1);
    expect(body.sacs[0]!.count).toBe(62);
    expect(body.sacs[0]!.parties.map((p) => [p.name, p.count])).toEqual([
      ['Mira Keeper', 30],
      ['Tomasz Partner', 17],
      ['Lena Outside', 15],
    ]);
    expect(body.sacs[0]!.explanation[0]).toBe('The sac counts 62 young.');
    expect(body.sacs[0]!.explanation.at(-1)).toBe('In all: Mira Keeper 30, Tomasz Partner 17, Lena Outside 15.');
    expect(body.sacs[0]!.change).toBeNull();
    expect(body.totals.map((x) => x.count)).toEqual([30, 17, 15]);
  });
});

describe('balances after every kind of entry', () => {
  let handOver: LedgerEntryResponse;
  let sale: LedgerEntryResponse;
  let saleCorrection: LedgerEntryResponse;

  it('starts with each party owed its share and nothing owed in money', async () => {
    const b = await balances();
    expect(b.parties.map((p) => [p.name, p.share, p.owedSpiderlings])).toEqual([
      ['Mira Keeper', 30, 30],
      ['Tomasz Partner', 17, 17],
      ['Lena Outside', 15, 15],
    ]);
    expect(b.debts).toEqual([]);
    expect(b.settled).toBe(false);
  });

  it('a shipment hand-over counts against the share and waits for the recipient', async () => {
    handOver = await entry({
      kind: 'hand-over',
      date: D,
      memberId: s.tomaszId,
      count: 10,
      method: 'shipment',
      carrier: 'Overnight courier',
      tracking: 'TRK-4471',
    });
    expect(handOver).toMatchObject({ kind: 'hand-over', count: 10, status: 'in-force', awaitingConfirmationBy: { memberId: s.tomaszId } });
    expect(handOver.recordedBy?.name).toBe('Mira Keeper');
    expect(party(await balances(), s.tomaszId)).toMatchObject({ handedOver: 10, owedSpiderlings: 7, unconfirmedHandOvers: 1 });
  });

  it('the recipient confirms the arrival; losses in transit stay his (the share is not given back)', async () => {
    const bad = await api(t.app)
      .post(`/api/projects/${s.projectId}/entries/${handOver.id}/confirm`)
      .set('Authorization', s.tomasz.bearer)
      .send({ arrivedAlive: 9, arrivedDead: 2 });
    expect(bad.status).toBe(400);
    expect(bad.body.message).toBe('The hand-over was of 10 young; arrived alive and arrived dead must add up to 10 (got 11).');
    const notHis = await api(t.app)
      .post(`/api/projects/${s.projectId}/entries/${handOver.id}/confirm`)
      .set('Authorization', s.mira.bearer)
      .send({ arrivedAlive: 9, arrivedDead: 1 });
    expect(notHis.status).toBe(403);
    const ok = await api(t.app)
      .post(`/api/projects/${s.projectId}/entries/${handOver.id}/confirm`)
      .set('Authorization', s.tomasz.bearer)
      .send({ arrivedAlive: 9, arrivedDead: 1 });
    expect(ok.status).toBe(201);
    expect(ok.body).toMatchObject({ kind: 'arrival', handOverId: handOver.id, arrivedAlive: 9, arrivedDead: 1 });
    expect(party(await balances(), s.tomaszId)).toMatchObject({ handedOver: 10, owedSpiderlings: 7, arrivedAlive: 9, arrivedDead: 1, unconfirmedHandOvers: 0 });
    const again = await api(t.app)
      .post(`/api/projects/${s.projectId}/entries/${handOver.id}/confirm`)
      .set('Authorization', s.tomasz.bearer)
      .send({ arrivedAlive: 9, arrivedDead: 1 });
    expect(again.status).toBe(409);
  });

  it('a sale counts against the seller; its price stays out of what parties owe each other', async () => {
    sale = await entry({ kind: 'sale', date: D, memberId: s.lenaId, count: 5, priceMinor: 4000 });
    const b = await balances();
    expect(party(b, s.lenaId)).toMatchObject({ sold: 5, owedSpiderlings: 10, salesMinor: 4000 });
    expect(b.debts).toEqual([]);
  });

  it('a cash-out makes the owner owe count × price (4 × EUR 5.00)', async () => {
    await entry({ kind: 'cash-out', date: D, memberId: s.lenaId, count: 4 });
    const b = await balances();
    expect(party(b, s.lenaId)).toMatchObject({ cashedOut: 4, owedSpiderlings: 6, cashOutValueMinor: 2000, moneyOwedToMinor: 2000 });
    expect(b.debts).toEqual([
      { fromPartyId: s.miraId, toPartyId: s.lenaId, amountMinor: 2000, currency: 'EUR', fromName: 'Mira Keeper', toName: 'Lena Outside' },
    ]);
  });

  it('the owner records a payment to a party without an account: it counts at once', async () => {
    const m = await entry({ kind: 'money', date: D, fromMemberId: s.miraId, toMemberId: s.lenaId, amountMinor: 1500 });
    expect(m.status).toBe('in-force');
    expect((await balances()).debts).toEqual([expect.objectContaining({ fromPartyId: s.miraId, toPartyId: s.lenaId, amountMinor: 500 })]);
  });

  it('a payment to a keeper counts only once the payee confirms it', async () => {
    await entry({ kind: 'cash-out', date: D, memberId: s.tomaszId, count: 3, pricePerSpiderlingMinor: 600 });
    let b = await balances();
    expect(b.debts).toContainEqual(expect.objectContaining({ fromPartyId: s.miraId, toPartyId: s.tomaszId, amountMinor: 1800 }));
    const paid = await entry({ kind: 'money', date: D, fromMemberId: s.miraId, toMemberId: s.tomaszId, amountMinor: 1800 });
    expect(paid).toMatchObject({ status: 'awaiting-confirmation', awaitingConfirmationBy: { memberId: s.tomaszId } });
    b = await balances();
    expect(b.debts).toContainEqual(expect.objectContaining({ fromPartyId: s.miraId, toPartyId: s.tomaszId, amountMinor: 1800 }));
    const byOwner = await api(t.app).post(`/api/projects/${s.projectId}/entries/${paid.id}/confirm`).set('Authorization', s.mira.bearer).send({});
    expect(byOwner.status).toBe(403);
    await api(t.app).post(`/api/projects/${s.projectId}/entries/${paid.id}/confirm`).set('Authorization', s.tomasz.bearer).send({}).expect(201);
    b = await balances();
    expect(b.debts.find((d) => d.toPartyId === s.tomaszId)).toBeUndefined();
    expect(party(b, s.tomaszId)).toMatchObject({ receivedMinor: 1800, cashedOut: 3, owedSpiderlings: 4 });
  });

  it('a partner records a payment he made outside the product; the owner confirms it', async () => {
    const m = await entry({ kind: 'money', date: D, fromMemberId: s.tomaszId, toMemberId: s.miraId, amountMinor: 700, note: 'Bank transfer' }, s.tomasz);
    expect(m.status).toBe('awaiting-confirmation');
    expect((await balances()).debts.find((d) => d.fromPartyId === s.tomaszId)).toBeUndefined();
    await api(t.app).post(`/api/projects/${s.projectId}/entries/${m.id}/confirm`).set('Authorization', s.mira.bearer).send({}).expect(201);
    expect((await balances()).debts).toContainEqual(expect.objectContaining({ fromPartyId: s.miraId, toPartyId: s.tomaszId, amountMinor: 700 }));
    // He overpaid towards nothing, so now Mira owes him 700 back; reverse it as entered by mistake.
    await entry({ kind: 'correction', date: D, reversesId: m.id, reason: 'entered by mistake' }, s.tomasz);
    expect((await balances()).debts.find((d) => d.toPartyId === s.tomaszId)).toBeUndefined();
  });

  it('a correction reverses the sale, and a correction of the correction reinstates it', async () => {
    saleCorrection = await entry({ kind: 'correction', date: D, reversesId: sale.id, reason: 'the buyer withdrew' });
    expect(party(await balances(), s.lenaId)).toMatchObject({ sold: 0, salesMinor: 0, owedSpiderlings: 11 });
    const list = (
      (await api(t.app).get(`/api/projects/${s.projectId}/entries`).set('Authorization', s.mira.bearer).expect(200)).body as KeysetPage<LedgerEntryResponse>
    ).items;
    expect(list.find((e) => e.id === sale.id)!.status).toBe('reversed');
    const twice = await post({ kind: 'correction', date: D, reversesId: sale.id, reason: 'again' });
    expect(twice.status).toBe(409);
    await entry({ kind: 'correction', date: D, reversesId: saleCorrection.id, reason: 'the buyer came back after all' });
    expect(party(await balances(), s.lenaId)).toMatchObject({ sold: 5, owedSpiderlings: 6 });
  });

  it('refuses a hand-over beyond what the party is owed, saying by how much', async () => {
    const res = await post({ kind: 'hand-over', date: D, memberId: s.tomaszId, count: 8, method: 'pick-up' });
    expect(res.status).toBe(409);
    expect(res.body.message).toBe('Tomasz Partner: This is 4 more than the 4 young still owed to this party (share 17; 10 handed over, 0 sold, 3 cashed out).');
  });

  it('refuses to take more young than are alive in care', async () => {
    // 62 counted; 10 + 5 + 4 + 3 = 22 taken since, so 40 are in care.
    const res = await post({ kind: 'hand-over', date: D, memberId: s.miraId, count: 41, method: 'pick-up' });
    expect(res.status).toBe(409);
    expect(res.body.message).toBe('Only 40 young of this sac are alive in care; this is 1 more than that.');
  });

  it('a new brood count changes the shares and the account says what changed and why', async () => {
    await recordCount(t.orm, s.sacId, 38); // 40 in care, 2 died
    const body = (await api(t.app).get(`/api/projects/${s.projectId}/shares`).set('Authorization', s.mira.bearer).expect(200)).body as SharesResponse;
    // 38 + 22 = 60; 2 fixed to Tomasz, 58 by 2:1:1 → 29, 14.5, 14.5; the tie goes to the earlier pick (Tomasz).
    expect(body.sacs[0]).toMatchObject({ count: 60, aliveInCare: 38, withdrawn: 22 });
    expect(body.sacs[0]!.parties.map((p) => p.count)).toEqual([29, 17, 14]);
    expect(body.sacs[0]!.change?.reasons).toEqual(['The count of young changed from 62 to 60.']);
    expect(body.sacs[0]!.change?.lines).toEqual(['The count of young changed from 62 to 60.', 'Mira Keeper: 30 → 29 (−1).', 'Lena Outside: 15 → 14 (−1).']);
    expect(party(await balances(), s.lenaId)).toMatchObject({ share: 14, owedSpiderlings: 5 });
  });

  // The same answer in the viewer's language: the catalogue's German `shares` words (shared/src/i18n/shares.ts).
  it('tells a partner who chose German the explanation and the change in German, while the keeper reads English', async () => {
    await api(t.app).patch('/api/users/me').set('Authorization', s.tomasz.bearer).send({ language: 'de' }).expect(200);
    try {
      const de = (await api(t.app).get(`/api/projects/${s.projectId}/shares`).set('Authorization', s.tomasz.bearer).expect(200)).body as SharesResponse;
      const sac = de.sacs[0]!;
      expect(sac.explanation[0]).toBe('Gezählt im Kokon: 60 Jungtiere.');
      expect(sac.explanation.at(-1)).toBe('Insgesamt: Mira Keeper 29, Tomasz Partner 17, Lena Outside 14.');
      expect(sac.change?.reasons).toEqual(['Die Zahl der Jungtiere hat sich von 62 auf 60 geändert.']);
      expect(sac.change?.lines).toEqual([
        'Die Zahl der Jungtiere hat sich von 62 auf 60 geändert.',
        'Mira Keeper: 30 → 29 (−1).',
        'Lena Outside: 15 → 14 (−1).',
      ]);
      for (const line of [...sac.explanation, ...sac.change!.lines]) expect(line).not.toMatch(/\{\{|shares\.|young/);
      const en = (await api(t.app).get(`/api/projects/${s.projectId}/shares`).set('Authorization', s.mira.bearer).expect(200)).body as SharesResponse;
      expect(en.sacs[0]!.explanation[0]).toBe('The sac counts 60 young.');
    } finally {
      await api(t.app).patch('/api/users/me').set('Authorization', s.tomasz.bearer).send({ language: 'en' }).expect(200);
    }
  });
});

describe('bad input and who may do what', () => {
  it('answers 400 with a readable message for incomplete entries', async () => {
    let res = await post({ kind: 'hand-over', date: D, memberId: s.tomaszId, count: 1, method: 'shipment' });
    expect(res.status).toBe(400);
    expect(res.body.message).toBe('A shipment needs the carrier and the tracking reference.');
    res = await post({ kind: 'gift', date: D });
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/kind must be one of: hand-over, sale, cash-out, money, correction/);
    res = await post({ kind: 'money', date: '2026-02-30', fromMemberId: s.miraId, toMemberId: s.lenaId, amountMinor: 1 });
    expect(res.status).toBe(400);
    expect(res.body.message).toMatch(/date must be a date written YYYY-MM-DD/);
    res = await post({ kind: 'money', date: D, fromMemberId: s.miraId, toMemberId: s.lenaId, amountMinor: 100, currency: 'USD' });
    expect(res.status).toBe(400);
    expect(res.body.message).toBe('This account is kept in EUR; USD cannot be recorded in it.');
    res = await post({ kind: 'cash-out', date: D, memberId: s.miraId, count: 1 });
    expect(res.status).toBe(400);
  });

  it('a partner cannot record hand-overs, nor payments between others', async () => {
    let res = await post({ kind: 'hand-over', date: D, memberId: s.tomaszId, count: 1, method: 'pick-up' }, s.tomasz);
    expect(res.status).toBe(403);
    res = await post({ kind: 'money', date: D, fromMemberId: s.miraId, toMemberId: s.lenaId, amountMinor: 100 }, s.tomasz);
    expect(res.status).toBe(403);
  });

  it('has no route that edits or deletes an entry, and the database refuses it too', async () => {
    const list = (
      (await api(t.app).get(`/api/projects/${s.projectId}/entries`).set('Authorization', s.mira.bearer).expect(200)).body as KeysetPage<LedgerEntryResponse>
    ).items;
    const id = list[0]!.id;
    await api(t.app).patch(`/api/projects/${s.projectId}/entries/${id}`).set('Authorization', s.mira.bearer).send({ count: 1 }).expect(404);
    await api(t.app).delete(`/api/projects/${s.projectId}/entries/${id}`).set('Authorization', s.mira.bearer).expect(404);
    const conn = t.orm.em.getConnection();
    await expect(conn.execute(`update ledger_entries set count = 1 where id = ?`, [id])).rejects.toThrow(/never changed or deleted/);
    await expect(conn.execute(`delete from ledger_entries where id = ?`, [id])).rejects.toThrow(/never changed or deleted/);
  });

  it('the hand-over form lists what each party is still owed (the client says the shipping cautions in its own words)', async () => {
    const res = await api(t.app).get(`/api/projects/${s.projectId}/entries/hand-over-form`).set('Authorization', s.mira.bearer).expect(200);
    expect(res.body.parties.map((p: { name: string; owedSpiderlings: number }) => [p.name, p.owedSpiderlings])).toEqual([
      ['Mira Keeper', 29],
      ['Tomasz Partner', 4],
      ['Lena Outside', 5],
    ]);
    expect(res.body).not.toHaveProperty('shippingCautions');
  });
});

describe('reinstating an entry', () => {
  it('refuses to bring back a hand-over by reversing its correction when the share is used up since', async () => {
    const h = await entry({ kind: 'hand-over', date: D, memberId: s.tomaszId, count: 3, method: 'pick-up' });
    const c = await entry({ kind: 'correction', date: D, reversesId: h.id, reason: 'recorded for the wrong day' });
    await entry({ kind: 'hand-over', date: D, memberId: s.tomaszId, count: 4, method: 'pick-up' }); // Tomasz: 17 − 10 − 3 − 4 = 0 owed
    const res = await post({ kind: 'correction', date: D, reversesId: c.id, reason: 'it was right after all' });
    expect(res.status).toBe(409);
    expect(res.body.message).toBe(
      'Reinstating that hand-over would take too many young. Tomasz Partner: This is 3 more than the 0 young still owed to this party (share 17; 14 handed over, 0 sold, 3 cashed out).',
    );
  });
});

describe('the plain-row ledger read (the dashboard’s)', () => {
  it('works out every account here exactly as the entities do: balances, pending entries, shares, settlement and each member’s to-dos', async () => {
    // Runs last: by now the project has hand-overs, an arrival, sales, cash-outs, payments awaiting
    // and confirmed, corrections of corrections and a changed brood count.
    const projects = await t.orm.em.fork().find(Project, {});
    const entities = await loadAccounts(t.orm.em.fork(), projects);
    const facts = await loadAccountFacts(t.orm.em.fork(), projects);
    expect(facts.get(s.projectId)!.data.rows.length).toBeGreaterThan(15);
    for (const p of projects) {
      const [a, b] = [entities.get(p.id)!, facts.get(p.id)!];
      expect(b.balances, p.title).toEqual(a.balances);
      expect([...b.pending], p.title).toEqual([...a.pending]);
      expect(b.entries, p.title).toEqual(a.entries);
      expect(b.sacs.map(({ count, aliveInCare, withdrawn, result }) => ({ count, aliveInCare, withdrawn, result }))).toEqual(
        a.sacs.map(({ count, aliveInCare, withdrawn, result }) => ({ count, aliveInCare, withdrawn, result })),
      );
      expect(isSettled(b)).toBe(isSettled(a));
      for (const m of a.data.members.filter((x) => x.user)) expect(accountTodos(b, m.user!.id)).toEqual(accountTodos(a, m.user!.id));
    }
    expect(entities.get(s.projectId)!.balances.debts.length + entities.get(s.projectId)!.pending.size).toBeGreaterThan(0);
  });
});
