/**
 * Progress links for outside parties: the owner issues, rotates and revokes a private read-only
 * link; the page behind it shows the project's facts and that party's share, nothing of anyone
 * else; only the token's SHA-256 is stored.
 */
import { createHash } from 'node:crypto';
import sharp from 'sharp';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { ProgressView } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { projectWithRoles } from './support/projects';
import { createSac } from './support/sacs';
import { Clock } from '../src/common/clock';
import { ProgressLink } from '../src/progress-links/progress-link.entity';
import { ActivityEvent } from '../src/activity/activity-event.entity';
import { PROGRESS_NOT_FOUND } from '../src/progress-links/progress-links.service';

let t: TestApp;
let owner: SignedIn;
let partner: SignedIn;
let caretaker: SignedIn;
let stranger: SignedIn;
let projectId: string;
let memberIds: { partner: string; outA: string; outB: string };
let sacId: string;
let photoId: string;
let otherPhotoId: string;
const http = () => request(t.app.getHttpServer());
const NOW = '2025-10-20T18:00:00Z';
const OPENING = {
  openedAt: '2025-10-18T09:00:00Z',
  healthyEggs: 40,
  eggsWithLegs: 120,
  nymphs: 0,
  darkEggs: 12,
  spoiledEggs: 3,
  keptBack: 0,
  acknowledgedWarnings: ['eggs-outside-species-range'],
  warningReason: 'A small first sac.',
};
const linksUrl = (memberId: string) => `/api/projects/${projectId}/members/${memberId}/progress-links`;
const issue = (who: SignedIn, memberId: string) => http().post(linksUrl(memberId)).set('Authorization', who.bearer);
const revoke = (who: SignedIn, memberId: string) => http().delete(linksUrl(memberId)).set('Authorization', who.bearer);
const tokenOf = (url: string) => url.split('/progress/')[1];
const page = (token: string) => http().get(`/api/progress/${encodeURIComponent(token)}`);

async function outsideParty(name: string): Promise<string> {
  const res = await http().post(`/api/projects/${projectId}/members`).set('Authorization', owner.bearer).send({ name, role: 'partner' }).expect(201);
  return res.body.id as string;
}

async function openingPhoto(who: SignedIn, sac: string): Promise<string> {
  const png = await sharp({ create: { width: 32, height: 24, channels: 3, background: '#d9c9a3' } })
    .png()
    .toBuffer();
  const res = await http()
    .post(`/api/sacs/${sac}/opening/photos`)
    .set('Authorization', who.bearer)
    .attach('file', png, { filename: 'eggs.png', contentType: 'image/png' })
    .expect(201);
  return res.body.id as string;
}

beforeAll(async () => {
  t = await createTestApp();
  vi.spyOn(t.app.get(Clock), 'now').mockImplementation(() => new Date(NOW));
  ({ projectId, owner, partner, caretaker } = await projectWithRoles(t.app, t.orm, 'Progress pair', ['Odalys', 'Piet', 'Carla']));
  stranger = await registerKeeper(t.app, 'Stellan');
  const project = (await http().get(`/api/projects/${projectId}`).set('Authorization', owner.bearer).expect(200)).body;
  const partnerId = project.members.find((m: { userId: string | null }) => m.userId === partner.user.id).id as string;
  memberIds = { partner: partnerId, outA: await outsideParty('Aurelia Outside'), outB: await outsideParty('Bodo Elsewhere') };
  // Terms: owner 2, every partner 1; the owner records the outside parties' agreement.
  await http()
    .post(`/api/projects/${projectId}/terms`)
    .set('Authorization', owner.bearer)
    .send({
      lines: [
        { memberId: project.members[0].id, weight: 2, pickOrder: 1 },
        { memberId: memberIds.partner, weight: 1, pickOrder: 2 },
        { memberId: memberIds.outA, weight: 1, pickOrder: 3 },
        { memberId: memberIds.outB, weight: 1, pickOrder: 4 },
      ],
      pricePerSpiderlingMinor: 1200,
      currency: 'EUR',
      failureClause: 'nothing-owed',
      shippingPaidBy: 'split',
    })
    .expect(201);
  await http().post(`/api/projects/${projectId}/terms/1/accept`).set('Authorization', partner.bearer).send({}).expect(200);
  for (const m of [memberIds.outA, memberIds.outB])
    await http()
      .post(`/api/projects/${projectId}/terms/1/accept`)
      .set('Authorization', owner.bearer)
      .send({ memberId: m, note: 'Agreed by phone' })
      .expect(200);
  sacId = (await createSac(t.app, owner, projectId, { layDate: '2025-09-10', pulledAt: '2025-10-05T10:00:00Z' })).id;
  await http().post(`/api/sacs/${sacId}/opening`).set('Authorization', owner.bearer).send(OPENING).expect(201);
  photoId = await openingPhoto(owner, sacId);
  // A photo of another project of the same owner: the link must not reach it.
  const other = await projectWithRoles(t.app, t.orm, 'Other pair', ['Olaf', 'Pia', 'Cem']);
  const otherSac = (await createSac(t.app, other.owner, other.projectId, { layDate: '2025-09-10', pulledAt: '2025-10-05T10:00:00Z' })).id;
  await http().post(`/api/sacs/${otherSac}/opening`).set('Authorization', other.owner.bearer).send(OPENING).expect(201);
  otherPhotoId = await openingPhoto(other.owner, otherSac);
}, 60_000);
afterAll(async () => {
  vi.restoreAllMocks();
  await t.close();
});

describe('progress links', () => {
  it('the owner issues a link; its page opens without signing in and shows the project, its facts and photos', async () => {
    const res = await issue(owner, memberIds.outA).expect(201);
    // 32 random bytes in base64url without padding are 43 characters (RFC 4648 §5).
    expect(res.body.url).toMatch(/\/progress\/[A-Za-z0-9_-]{43}$/);
    const token = tokenOf(res.body.url);
    const view = (await page(token).expect(200)).body as ProgressView;
    expect(view.project).toMatchObject({
      title: 'Progress pair',
      // Pulled and opened with eggs with legs, not yet first instar: still "in the incubator" (shared/src/breeding/project-stage.ts rule 4).
      stage: 'in-incubator',
      female: { scientificName: 'Grammostola pulchripes' },
      male: { scientificName: 'Grammostola pulchripes' },
    });
    expect(view.party).toEqual({ name: 'Aurelia Outside', role: 'partner' });
    expect(view.timeline.map((e) => e.kind)).toEqual(expect.arrayContaining(['project.created', 'sac.laid', 'sac.opened']));
    // 40 healthy eggs + 120 eggs with legs are the viable young of the opening (none kept back).
    expect(view.sacs).toHaveLength(1);
    expect(view.sacs[0]).toMatchObject({ id: sacId, layDate: '2025-09-10', openedAt: '2025-10-18T09:00:00.000Z', currentCount: 160, outcome: 'in-progress' });
    expect(view.sacs[0].photos.map((p) => p.id)).toEqual([photoId]);
    const img = await http().get(view.sacs[0].photos[0].thumbUrl).expect(200);
    expect(img.headers['content-type']).toBe('image/jpeg');
    await http().get(view.sacs[0].photos[0].url).expect(200);
  });

  it('the page shows this party’s share only: weights 2:1:1:1 of 160 young give it 32, and no other party is named', async () => {
    const token = tokenOf((await issue(owner, memberIds.outA).expect(201)).body.url);
    const res = await page(token).expect(200);
    const view = res.body as ProgressView;
    // 160 × 1/5 = 32 exactly (the largest-remainder method has nothing to round; docs/product.md, shares).
    expect(view.share).toMatchObject({ termsInForce: true, failureClause: 'nothing-owed', total: 32, stillOwed: 32, handedOver: 0, provisional: false });
    expect(view.share.sacs).toEqual([{ sacId, layDate: '2025-09-10', count: 32, failed: false }]);
    const text = res.text;
    for (const other of ['Bodo Elsewhere', 'Odalys', 'Piet', 'Carla', owner.user.email, memberIds.outB, memberIds.partner]) expect(text).not.toContain(other);
    expect(text).not.toMatch(/Minor|price|amount|balance|debt/i);
  });

  it('stores only the SHA-256 of the token', async () => {
    const token = tokenOf((await issue(owner, memberIds.outB).expect(201)).body.url);
    const rows = await t.orm.em.fork().find(ProgressLink, { member: memberIds.outB, revokedAt: null });
    expect(rows).toHaveLength(1);
    // SHA-256 per FIPS 180-4, computed here with Node's own crypto, hexadecimal.
    expect(rows[0].tokenHash).toBe(createHash('sha256').update(token).digest('hex'));
    expect(rows[0].tokenHash).not.toContain(token);
    const raw = await t.orm.em.fork().getConnection().execute<{ n: number }[]>('select count(*)::int as n from progress_links where token_hash = ?', [token]);
    expect(raw[0].n).toBe(0);
  });

  it('a new link revokes the earlier one: the old address answers 404 with a message', async () => {
    const first = tokenOf((await issue(owner, memberIds.outA).expect(201)).body.url);
    const second = tokenOf((await issue(owner, memberIds.outA).expect(201)).body.url);
    expect(second).not.toBe(first);
    const gone = await page(first).expect(404);
    expect(gone.body.message).toBe(PROGRESS_NOT_FOUND);
    await page(second).expect(200);
    const live = await t.orm.em.fork().count(ProgressLink, { member: memberIds.outA, revokedAt: null });
    expect(live).toBe(1);
  });

  it('revoking closes the page and its photos; each issue and revoke is on the timeline', async () => {
    const token = tokenOf((await issue(owner, memberIds.outA).expect(201)).body.url);
    await revoke(owner, memberIds.outA).expect(204);
    await page(token).expect(404);
    await http().get(`/api/progress/${token}/photos/${photoId}`).expect(404);
    await revoke(owner, memberIds.outA).expect(204); // nothing live: still done
    const events = await t.orm.em
      .fork()
      .find(ActivityEvent, { project: projectId, kind: { $like: 'progress-link.%' } }, { orderBy: { at: 'asc', createdAt: 'asc' } });
    expect(events.filter((e) => e.kind === 'progress-link.revoked')).toHaveLength(1);
    expect(events.filter((e) => e.kind === 'progress-link.issued').length).toBeGreaterThanOrEqual(4);
    expect(events.at(-1)!.summary).toBe('Revoked the progress link of Aurelia Outside.');
  });

  it('removing the party removes their links', async () => {
    const gone = await outsideParty('Kurt Shortstay');
    const token = tokenOf((await issue(owner, gone).expect(201)).body.url);
    await page(token).expect(200);
    await http().delete(`/api/projects/${projectId}/members/${gone}`).set('Authorization', owner.bearer).expect(204);
    await page(token).expect(404);
    expect(await t.orm.em.fork().count(ProgressLink, { member: gone })).toBe(0);
  });

  it('a link reaches only the opening photos of its own project', async () => {
    const token = tokenOf((await issue(owner, memberIds.outA).expect(201)).body.url);
    await http().get(`/api/progress/${token}/photos/${otherPhotoId}`).expect(404);
    await http().get(`/api/progress/${token}/photos/${otherPhotoId}/thumb`).expect(404);
    await http().get(`/api/progress/${token}/photos/not-a-uuid`).expect(400);
  });

  it('made-up tokens are a 404, never a 500', async () => {
    for (const token of ['x', 'A'.repeat(43), '%00', '..', 'a'.repeat(2000)]) {
      const res = await page(token);
      expect(res.status, token.slice(0, 10)).toBe(404);
    }
  });

  it('a party with an account follows the project by signing in: 409 with a message', async () => {
    const res = await issue(owner, memberIds.partner).expect(409);
    expect(res.body.message).toContain('Piet has a Broodsilk account');
    await revoke(owner, memberIds.partner).expect(409);
  });

  it('only the owner issues or revokes: partner and caretaker 403, another keeper 404, nobody signed in 401', async () => {
    for (const who of [partner, caretaker]) {
      await issue(who, memberIds.outA).expect(403);
      await revoke(who, memberIds.outA).expect(403);
    }
    await issue(stranger, memberIds.outA).expect(404);
    await revoke(stranger, memberIds.outA).expect(404);
    await http().post(linksUrl(memberIds.outA)).expect(401);
  });

  it('a party of another project, or no party at all, is a 404 for the owner', async () => {
    const other = await projectWithRoles(t.app, t.orm, 'Third pair', ['Ola', 'Pep', 'Cid']);
    const outsider = await http()
      .post(`/api/projects/${other.projectId}/members`)
      .set('Authorization', other.owner.bearer)
      .send({ name: 'Elsewhere', role: 'partner' })
      .expect(201);
    await issue(owner, outsider.body.id as string).expect(404);
    await issue(owner, '00000000-0000-4000-8000-000000000000').expect(404);
    await issue(owner, 'not-a-uuid').expect(400);
  });
});
