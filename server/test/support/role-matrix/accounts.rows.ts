import request from 'supertest';
import { addDays, todayIn } from '@broodsilk/shared';
import { BroodCount } from '../../../src/sacs/brood-count.entity';
import { Sac } from '../../../src/sacs/sac.entity';
import { OWNER_AND_PARTNER, type Actor, type Expected, type MatrixFixture, type MatrixProject, type MatrixRequest, type MatrixRow } from './matrix.types';
import { ANY_PAIRING } from '../sacs';

const NOBODY = '00000000-0000-4000-8000-000000000000';
const api = (fx: MatrixFixture) => request(fx.app.getHttpServer());
const allowed = (a: Actor) => a === 'owner' || a === 'partner';

/** A fresh project whose account can take entries: terms in force (owner 2, partner 1) and a counted sac of 30. */
async function accountReady(fx: MatrixFixture): Promise<MatrixProject> {
  const p = await fx.freshProject();
  const terms = await api(fx)
    .post(`/api/projects/${p.id}/terms`)
    .set('Authorization', fx.users.owner.bearer)
    .send({
      lines: [
        { memberId: p.memberIds.owner, weight: 2, pickOrder: 1 },
        { memberId: p.memberIds.partner, weight: 1, pickOrder: 2 },
      ],
      pricePerSpiderlingMinor: 800,
      currency: 'EUR',
      failureClause: 'nothing-owed',
      shippingPaidBy: 'recipient',
    });
  if (terms.status !== 201) throw new Error(`propose terms answered ${terms.status}: ${JSON.stringify(terms.body)}`);
  const accepted = await api(fx).post(`/api/projects/${p.id}/terms/${terms.body.number}/accept`).set('Authorization', fx.users.partner.bearer).send({});
  if (accepted.status >= 300) throw new Error(`accept terms answered ${accepted.status}: ${JSON.stringify(accepted.body)}`);
  const sac = await api(fx)
    .post(`/api/projects/${p.id}/sacs`)
    .set('Authorization', fx.users.owner.bearer)
    .send({ layDate: addDays(todayIn('UTC', new Date()), -60), ...ANY_PAIRING });
  if (sac.status !== 201) throw new Error(`create sac answered ${sac.status}: ${JSON.stringify(sac.body)}`);
  const em = fx.orm.em.fork();
  const s = await em.findOneOrFail(Sac, sac.body.id);
  em.create(BroodCount, { sac: s, at: new Date(Date.now() - 3_600_000), stage: 'second-instar', alive: 30, source: 'count', recordedBy: s.recordedBy });
  await em.flush();
  return p;
}

async function entry(fx: MatrixFixture, p: MatrixProject, who: 'owner' | 'partner', body: object): Promise<string> {
  const res = await api(fx).post(`/api/projects/${p.id}/entries`).set('Authorization', fx.users[who].bearer).send(body);
  if (res.status !== 201) throw new Error(`entry answered ${res.status}: ${JSON.stringify(res.body)}`);
  return res.body.id as string;
}

const today = () => todayIn('UTC', new Date());
/** Partner's own statement: the owner may read it too; a partner may not read the owner's. */
const partnerStatement = (fx: MatrixFixture): MatrixRequest => ({ params: { memberId: fx.project.memberIds.partner } });
/** Reaches the rule after the guard: the shared project owes nobody anything, so 409 proves access was granted. */
const PAST_THE_GUARD: Record<Actor, Expected> = { anonymous: 401, stranger: 404, caretaker: 403, partner: 409, owner: 409 };

export const rows: MatrixRow[] = [
  { method: 'GET', path: '/api/projects/:projectId/shares', expect: OWNER_AND_PARTNER },
  { method: 'GET', path: '/api/projects/:projectId/balances', expect: OWNER_AND_PARTNER },
  { method: 'GET', path: '/api/projects/:projectId/entries', expect: OWNER_AND_PARTNER },
  { method: 'GET', path: '/api/projects/:projectId/entries/hand-over-form', expect: OWNER_AND_PARTNER },
  {
    method: 'POST',
    path: '/api/projects/:projectId/entries',
    expect: OWNER_AND_PARTNER,
    // The owner hands one young over; the partner records a payment he made to the owner.
    request: async (fx, actor): Promise<MatrixRequest> => {
      if (!allowed(actor)) return { body: { kind: 'hand-over', date: today(), memberId: fx.project.memberIds.partner, count: 1, method: 'pick-up' } };
      const p = await accountReady(fx);
      const body =
        actor === 'owner'
          ? { kind: 'hand-over', date: today(), memberId: p.memberIds.partner, count: 1, method: 'pick-up' }
          : { kind: 'money', date: today(), fromMemberId: p.memberIds.partner, toMemberId: p.memberIds.owner, amountMinor: 100 };
      return { params: { projectId: p.id }, body };
    },
  },
  {
    method: 'POST',
    path: '/api/projects/:projectId/entries/:entryId/confirm',
    expect: OWNER_AND_PARTNER,
    // The partner confirms a hand-over he received; the owner confirms a payment the partner recorded.
    request: async (fx, actor): Promise<MatrixRequest> => {
      if (!allowed(actor)) return { params: { entryId: NOBODY }, body: {} };
      const p = await accountReady(fx);
      if (actor === 'partner') {
        const id = await entry(fx, p, 'owner', {
          kind: 'hand-over',
          date: today(),
          memberId: p.memberIds.partner,
          count: 2,
          method: 'shipment',
          carrier: 'Courier',
          tracking: 'RM-1',
        });
        return { params: { projectId: p.id, entryId: id }, body: { arrivedAlive: 2, arrivedDead: 0 } };
      }
      const id = await entry(fx, p, 'partner', {
        kind: 'money',
        date: today(),
        fromMemberId: p.memberIds.partner,
        toMemberId: p.memberIds.owner,
        amountMinor: 100,
      });
      return { params: { projectId: p.id, entryId: id }, body: {} };
    },
  },
  { method: 'GET', path: '/api/projects/:projectId/statements/:memberId', expect: OWNER_AND_PARTNER, request: partnerStatement },
  { method: 'GET', path: '/api/projects/:projectId/statements/:memberId.csv', expect: OWNER_AND_PARTNER, request: partnerStatement },
  { method: 'GET', path: '/api/projects/:projectId/statements/:memberId.pdf', expect: OWNER_AND_PARTNER, request: partnerStatement },
  { method: 'POST', path: '/api/projects/:projectId/statements/:memberId/email', expect: OWNER_AND_PARTNER, request: partnerStatement },
  {
    method: 'POST',
    path: '/api/projects/:projectId/settlements/checkout',
    expect: PAST_THE_GUARD,
    request: (fx, actor) => ({ body: { toMemberId: actor === 'owner' ? fx.project.memberIds.partner : fx.project.memberIds.owner, amountMinor: 100 } }),
  },
];
