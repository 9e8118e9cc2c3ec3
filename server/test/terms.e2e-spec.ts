import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ProjectResponse, ProposeTermsRequest, TermsListResponse } from '@broodsilk/shared';
import { RequestContext } from '@mikro-orm/core';
import { ActivityService } from '../src/activity/activity.service';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { addMember, createProject } from './support/projects';

let t: TestApp;
let mira: SignedIn;
let tomasz: SignedIn;
let ines: SignedIn;
let stranger: SignedIn;
let p: ProjectResponse;
let ids: { mira: string; tomasz: string; ines: string; outside: string };
const http = () => request(t.app.getHttpServer());

const terms = (over: Partial<ProposeTermsRequest> = {}): ProposeTermsRequest => ({
  lines: [
    { memberId: ids.mira, weight: 2, pickOrder: 1 },
    { memberId: ids.tomasz, weight: 1, pickOrder: 2, fixedCount: 5 },
    { memberId: ids.outside, weight: 1, pickOrder: 3 },
  ],
  pricePerSpiderlingMinor: 1500,
  currency: 'EUR',
  failureClause: 'carries-over',
  shippingPaidBy: 'recipient',
  ...over,
});
const list = async (who: SignedIn) => (await http().get(`/api/projects/${p.id}/terms`).set('Authorization', who.bearer).expect(200)).body as TermsListResponse;

beforeAll(async () => {
  t = await createTestApp();
  mira = await registerKeeper(t.app, 'Mira');
  tomasz = await registerKeeper(t.app, 'Tomasz');
  ines = await registerKeeper(t.app, 'Ines');
  stranger = await registerKeeper(t.app, 'Stranger');
  p = await createProject(t.app, t.orm, mira, { title: 'Terms pair' });
  const outside = await http()
    .post(`/api/projects/${p.id}/members`)
    .set('Authorization', mira.bearer)
    .send({ name: 'Ada Brandt', role: 'partner' })
    .expect(201);
  ids = {
    mira: p.members[0].id,
    tomasz: await addMember(t.orm, p.id, tomasz, 'partner'),
    ines: await addMember(t.orm, p.id, ines, 'caretaker'),
    outside: outside.body.id,
  };
});
afterAll(async () => {
  await t.close();
});

describe('terms versions', () => {
  it('refuses terms the share rule would refuse, with messages a person understands', async () => {
    const dupPick = await http()
      .post(`/api/projects/${p.id}/terms`)
      .set('Authorization', mira.bearer)
      .send(
        terms({
          lines: [
            { memberId: ids.mira, weight: 2, pickOrder: 1 },
            { memberId: ids.tomasz, weight: 1, pickOrder: 1 },
            { memberId: ids.outside, weight: 1, pickOrder: 3 },
          ],
        }),
      )
      .expect(400);
    expect(dupPick.body.details).toEqual([{ field: 'lines.1.pickOrder', message: 'Pick order 1 is used twice; each party needs its own place.' }]);
    const zero = await http()
      .post(`/api/projects/${p.id}/terms`)
      .set('Authorization', mira.bearer)
      .send(
        terms({
          lines: [
            { memberId: ids.mira, weight: 0, pickOrder: 1 },
            { memberId: ids.tomasz, weight: 0, pickOrder: 2 },
            { memberId: ids.outside, weight: 0, pickOrder: 3 },
          ],
        }),
      )
      .expect(400);
    expect(zero.body.details[0].message).toMatch(/weight above 0/);
    const missing = await http()
      .post(`/api/projects/${p.id}/terms`)
      .set('Authorization', mira.bearer)
      .send(terms({ lines: [{ memberId: ids.mira, weight: 1, pickOrder: 1 }] }))
      .expect(400);
    expect(missing.body.details[0].message).toBe('Every party needs a line; missing: Ada Brandt, Tomasz.');
    const caretakerLine = await http()
      .post(`/api/projects/${p.id}/terms`)
      .set('Authorization', mira.bearer)
      .send(terms({ lines: [...terms().lines, { memberId: ids.ines, weight: 1, pickOrder: 4 }] }))
      .expect(400);
    expect(caretakerLine.body.details[0]).toMatchObject({ field: 'lines.3.memberId', message: expect.stringMatching(/caretakers hold no share/) });
    const money = await http()
      .post(`/api/projects/${p.id}/terms`)
      .set('Authorization', mira.bearer)
      .send(terms({ pricePerSpiderlingMinor: 12.5, currency: 'EUO' }))
      .expect(400);
    expect(money.body.details.map((d: { field: string }) => d.field)).toEqual(['pricePerSpiderlingMinor']);
    const currency = await http()
      .post(`/api/projects/${p.id}/terms`)
      .set('Authorization', mira.bearer)
      .send(terms({ currency: 'EUO' }))
      .expect(400);
    expect(currency.body.details).toEqual([{ field: 'currency', message: 'EUO is not an ISO 4217 currency code.' }]);
    const neg = await http()
      .post(`/api/projects/${p.id}/terms`)
      .set('Authorization', mira.bearer)
      .send(
        terms({
          lines: [
            { memberId: ids.mira, weight: -1, pickOrder: 1 },
            { memberId: ids.tomasz, weight: 1.5, pickOrder: 2 },
            { memberId: ids.outside, weight: 1, pickOrder: 3 },
          ],
        }),
      )
      .expect(400);
    expect(neg.body.details.map((d: { field: string }) => d.field).sort()).toEqual(['lines.0.weight', 'lines.1.weight']);
    expect((await list(mira)).versions).toEqual([]);
  });

  it('a partner cannot propose terms (403); a caretaker cannot read them at all (403); a stranger gets 404', async () => {
    const res = await http().post(`/api/projects/${p.id}/terms`).set('Authorization', tomasz.bearer).send(terms()).expect(403);
    expect(res.body.message).toMatch(/Only the owner/);
    const care = await http().get(`/api/projects/${p.id}/terms`).set('Authorization', ines.bearer).expect(403);
    expect(care.body).not.toHaveProperty('versions');
    await http().get(`/api/projects/${p.id}/terms`).set('Authorization', stranger.bearer).expect(404);
    await http().post(`/api/projects/${p.id}/terms/1/accept`).set('Authorization', ines.bearer).send({}).expect(403);
  });

  it('version 1 is proposed until every partner accepted it (the outside party through the owner), then in force', async () => {
    const v1 = await http().post(`/api/projects/${p.id}/terms`).set('Authorization', mira.bearer).send(terms()).expect(201);
    expect(v1.body).toMatchObject({ number: 1, status: 'proposed', handOverStage: 'second-instar', currency: 'EUR', pricePerSpiderlingMinor: 1500 });
    // weights 2:1:1 → 1/2, 1/4, 1/4
    expect(v1.body.lines.map((l: { share: string }) => l.share)).toEqual(['1/2', '1/4', '1/4']);
    expect(v1.body.awaiting.map((a: { name: string }) => a.name).sort()).toEqual(['Ada Brandt', 'Tomasz']);

    const mine = await http().post(`/api/projects/${p.id}/terms/1/accept`).set('Authorization', tomasz.bearer).send({}).expect(200);
    expect(mine.body).toMatchObject({ status: 'proposed', awaiting: [{ name: 'Ada Brandt' }] });
    await http().post(`/api/projects/${p.id}/terms/1/accept`).set('Authorization', tomasz.bearer).send({}).expect(409);
    // A partner cannot accept for someone else; the owner must say how the outside party agreed.
    await http()
      .post(`/api/projects/${p.id}/terms/1/accept`)
      .set('Authorization', tomasz.bearer)
      .send({ memberId: ids.outside, note: 'she said yes' })
      .expect(403);
    const noNote = await http().post(`/api/projects/${p.id}/terms/1/accept`).set('Authorization', mira.bearer).send({ memberId: ids.outside }).expect(400);
    expect(noNote.body.details[0].field).toBe('note');
    await http().post(`/api/projects/${p.id}/terms/1/accept`).set('Authorization', mira.bearer).send({ memberId: ids.tomasz, note: 'x' }).expect(400);
    const all = await http()
      .post(`/api/projects/${p.id}/terms/1/accept`)
      .set('Authorization', mira.bearer)
      .send({ memberId: ids.outside, note: 'Agreed by phone' })
      .expect(200);
    expect(all.body).toMatchObject({ status: 'in-force', awaiting: [] });
    expect(all.body.acceptances.find((a: { memberId: string }) => a.memberId === ids.outside)).toMatchObject({
      onBehalf: true,
      note: 'Agreed by phone',
      recordedBy: { id: mira.user.id },
    });
    expect((await list(tomasz)).inForce).toBe(1);
  });

  it('version 2 stays proposed while version 1 stays in force, until Tomasz accepts it', async () => {
    const v2 = await http()
      .post(`/api/projects/${p.id}/terms`)
      .set('Authorization', mira.bearer)
      .send(
        terms({
          failureClause: 'nothing-owed',
          lines: [
            { memberId: ids.mira, weight: 3, pickOrder: 2 },
            { memberId: ids.tomasz, weight: 1, pickOrder: 1 },
            { memberId: ids.outside, weight: 0, pickOrder: 3 },
          ],
        }),
      )
      .expect(201);
    expect(v2.body).toMatchObject({ number: 2, status: 'proposed' });
    let now = await list(mira);
    expect(now.inForce).toBe(1);
    expect(now.versions.map((v) => [v.number, v.status])).toEqual([
      [2, 'proposed'],
      [1, 'in-force'],
    ]);
    await http().post(`/api/projects/${p.id}/terms/2/accept`).set('Authorization', tomasz.bearer).send({}).expect(200);
    now = await list(mira);
    expect(now.versions.map((v) => [v.number, v.status])).toEqual([
      [2, 'proposed'],
      [1, 'in-force'],
    ]);
    await http()
      .post(`/api/projects/${p.id}/terms/2/accept`)
      .set('Authorization', mira.bearer)
      .send({ memberId: ids.outside, note: 'Agreed by e-mail' })
      .expect(200);
    now = await list(tomasz);
    expect(now.inForce).toBe(2);
    expect(now.versions.map((v) => [v.number, v.status])).toEqual([
      [2, 'in-force'],
      [1, 'superseded'],
    ]);
    await http().post(`/api/projects/${p.id}/terms/1/accept`).set('Authorization', tomasz.bearer).send({}).expect(409);
    await http().post(`/api/projects/${p.id}/terms/9/accept`).set('Authorization', tomasz.bearer).send({}).expect(404);
  });

  it('terms events reach partners but not the caretaker; the dashboard feed shows what others did', async () => {
    const forMira = await http().get(`/api/projects/${p.id}/activity`).set('Authorization', mira.bearer).expect(200);
    expect(forMira.body.map((e: { kind: string }) => e.kind)).toContain('terms.in-force');
    const forInes = await http().get(`/api/projects/${p.id}/activity`).set('Authorization', ines.bearer).expect(200);
    expect(forInes.body.length).toBeGreaterThan(0);
    expect(forInes.body.filter((e: { kind: string }) => e.kind.startsWith('terms.'))).toEqual([]);
    const feedOf = (userId: string) => RequestContext.create(t.orm.em, () => t.app.get(ActivityService).recentFromOthers(userId));
    const feed = await feedOf(mira.user.id);
    expect(feed.length).toBeGreaterThan(0);
    expect(feed.every((e) => e.actor?.id !== mira.user.id)).toBe(true);
    expect(feed.map((e) => e.summary)).toContain('Tomasz accepted terms version 2.');
    const inesFeed = await feedOf(ines.user.id);
    expect(inesFeed.filter((e) => e.kind.startsWith('terms.'))).toEqual([]);
  });
});
