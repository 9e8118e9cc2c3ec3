import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Invitation } from '../src/invitations/invitation.entity';
import { hashInvitationToken } from '../src/invitations/invitation-token';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { mailsTo, readableText, waitForMail } from './support/mail-sink';
import { createProject } from './support/projects';
import { JOBS_SCHEMA } from '../src/jobs/jobs.service';
import { COMPOSE_QUEUE } from '../src/mail/mail-outbox.service';

let t: TestApp;
let mira: SignedIn;
let tomasz: SignedIn;
const http = () => request(t.app.getHttpServer());

beforeAll(async () => {
  t = await createTestApp();
  mira = await registerKeeper(t.app, 'Mira');
  tomasz = await registerKeeper(t.app, 'Tomasz');
});
afterAll(async () => {
  await t.close();
});

const LINK = /\/invitations\/([A-Za-z0-9_-]{43})\b/;

/** The token of an invitation mail to `to` about `title`, other than `not` (an older link still in the sink). */
async function tokenFromMail(to: string, title: string, not?: string): Promise<string> {
  await waitForMail(to, new RegExp(title));
  for (let attempt = 0; attempt < 60; attempt += 1) {
    const tokens = (await mailsTo(to))
      .filter((m) => (m.subject ?? '').includes(title))
      .map((m) => LINK.exec(m.text ?? '')?.[1])
      .filter((x): x is string => !!x && x !== not);
    if (tokens.length) return tokens[0];
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error(`no new invitation mail to ${to} about ${title}`);
}

describe('invitations', () => {
  it('an e-mailed link shows the project, joins the invited keeper once, and then stops working', async () => {
    const p = await createProject(t.app, t.orm, mira, { title: `Invite test ${Date.now()}` });
    const res = await http()
      .post(`/api/projects/${p.id}/invitations`)
      .set('Authorization', mira.bearer)
      .send({ email: tomasz.user.email, role: 'partner' })
      .expect(201);
    expect(res.body).toMatchObject({ email: tomasz.user.email.toLowerCase(), role: 'partner', memberId: null });
    const mail = await waitForMail(tomasz.user.email, new RegExp(p.title));
    expect(mail.subject).toBe(`Mira invites you to the breeding project "${p.title}"`);
    const token = LINK.exec(mail.text ?? '')![1];
    // Only the hash is stored.
    const row = await t.orm.em.fork().findOneOrFail(Invitation, res.body.id);
    expect(row.tokenHash).toBe(hashInvitationToken(token));
    expect(row.tokenHash).not.toContain(token);

    const preview = await http().get(`/api/invitations/${token}`).expect(200);
    expect(preview.body).toMatchObject({ projectTitle: p.title, inviterName: 'Mira', role: 'partner', valid: true, problem: null });
    await http().get(`/api/projects/${p.id}`).set('Authorization', tomasz.bearer).expect(404);
    await http().post(`/api/invitations/${token}/accept`).expect(401);
    const joined = await http().post(`/api/invitations/${token}/accept`).set('Authorization', tomasz.bearer).expect(200);
    expect(joined.body).toEqual({ projectId: p.id, role: 'partner', status: 'joined' });
    const seen = await http().get(`/api/projects/${p.id}`).set('Authorization', tomasz.bearer).expect(200);
    expect(seen.body.myRole).toBe('partner');

    const again = await http().post(`/api/invitations/${token}/accept`).set('Authorization', tomasz.bearer).expect(410);
    expect(again.body.message).toBe('This invitation has already been used.');
    expect((await http().get(`/api/invitations/${token}`).expect(200)).body).toMatchObject({ valid: false, problem: 'This invitation has already been used.' });
    await http().get('/api/invitations/not-a-real-token').expect(404);
  });

  it('a link used to register is carried through the e-mail confirmation: confirming joins the new account (fails while registration ignores the invitation)', async () => {
    const p = await createProject(t.app, t.orm, mira, { title: `Carried invite ${Date.now()}` });
    const newcomer = `newcomer.${Date.now()}@example.test`;
    await http().post(`/api/projects/${p.id}/invitations`).set('Authorization', mira.bearer).send({ email: newcomer, role: 'partner' }).expect(201);
    const invitation = await tokenFromMail(newcomer, p.title);
    await http()
      .post('/api/auth/register')
      .send({ email: newcomer, password: 'joining by invitation', displayName: 'Newcomer', invitationToken: invitation })
      .expect(202);
    const mail = await waitForMail(newcomer, /Confirm your e-mail address/);
    const confirmation = /\/confirm-email\?token=([A-Za-z0-9_-]{43})\b/.exec(mail.text ?? '')![1];
    // The registration job's data carries only the invitation token's hash, never the token itself.
    const jobs = await t.orm.em
      .getConnection()
      .execute<{ data: string }[]>(`select data::text from ${JOBS_SCHEMA}.job where name = ? and data::text like ?`, [COMPOSE_QUEUE, `%${newcomer}%`]);
    expect(jobs.length).toBeGreaterThan(0);
    expect(jobs.every((j) => !j.data.includes(invitation))).toBe(true);

    const res = await http().post('/api/auth/confirm-email').send({ token: confirmation }).expect(200);
    expect(res.body.invitation).toEqual({ projectId: p.id, role: 'partner', status: 'joined' });
    const seen = await http()
      .get(`/api/projects/${p.id}`)
      .set('Authorization', `Bearer ${res.body.session.accessToken as string}`)
      .expect(200);
    expect(seen.body.myRole).toBe('partner');
    const used = await http().get(`/api/invitations/${invitation}`).expect(200);
    expect(used.body).toMatchObject({ valid: false, problem: 'This invitation has already been used.' });
  });

  it('an expired link is refused with a clear message', async () => {
    const p = await createProject(t.app, t.orm, mira, { title: `Expiry test ${Date.now()}` });
    const invitee = await registerKeeper(t.app, 'Late Reader');
    await http().post(`/api/projects/${p.id}/invitations`).set('Authorization', mira.bearer).send({ email: invitee.user.email, role: 'caretaker' }).expect(201);
    const token = await tokenFromMail(invitee.user.email, p.title);
    await t.orm.em.fork().nativeUpdate(Invitation, { tokenHash: hashInvitationToken(token) }, { expiresAt: new Date(Date.now() - 60_000) });
    const res = await http().post(`/api/invitations/${token}/accept`).set('Authorization', invitee.bearer).expect(410);
    expect(res.body.message).toMatch(/expired; ask the project owner to send a new one/);
    await http().get(`/api/projects/${p.id}`).set('Authorization', invitee.bearer).expect(404);
  });

  it('a re-send replaces the old link; accepting links the outside party to the account', async () => {
    const p = await createProject(t.app, t.orm, mira, { title: `Resend test ${Date.now()}` });
    const invitee = await registerKeeper(t.app, 'Jonas');
    const party = await http()
      .post(`/api/projects/${p.id}/members`)
      .set('Authorization', mira.bearer)
      .send({ name: 'Jonas (lends the male)', email: invitee.user.email, role: 'partner' })
      .expect(201);
    await http()
      .post(`/api/projects/${p.id}/invitations`)
      .set('Authorization', mira.bearer)
      .send({ email: invitee.user.email, role: 'caretaker', memberId: party.body.id })
      .expect(400);
    await http()
      .post(`/api/projects/${p.id}/invitations`)
      .set('Authorization', mira.bearer)
      .send({ email: invitee.user.email, role: 'partner', memberId: party.body.id })
      .expect(201);
    const first = await tokenFromMail(invitee.user.email, p.title);
    await http()
      .post(`/api/projects/${p.id}/invitations`)
      .set('Authorization', mira.bearer)
      .send({ email: invitee.user.email, role: 'partner', memberId: party.body.id })
      .expect(201);
    const second = await tokenFromMail(invitee.user.email, p.title, first);
    expect(second).not.toBe(first);
    const old = await http().post(`/api/invitations/${first}/accept`).set('Authorization', invitee.bearer).expect(410);
    expect(old.body.message).toMatch(/replaced by a newer one/);
    await http().post(`/api/invitations/${second}/accept`).set('Authorization', invitee.bearer).expect(200);
    const members = await http().get(`/api/projects/${p.id}/members`).set('Authorization', mira.bearer).expect(200);
    expect(members.body).toHaveLength(2);
    expect(members.body[1]).toMatchObject({ id: party.body.id, userId: invitee.user.id, hasAccount: true, role: 'partner' });
  });

  it('only the owner invites; a member cannot be invited twice', async () => {
    const p = await createProject(t.app, t.orm, mira, { title: `Owner only ${Date.now()}` });
    const partner = await registerKeeper(t.app, 'Partner');
    await http().post(`/api/projects/${p.id}/invitations`).set('Authorization', mira.bearer).send({ email: partner.user.email, role: 'partner' }).expect(201);
    await http()
      .post(`/api/invitations/${await tokenFromMail(partner.user.email, p.title)}/accept`)
      .set('Authorization', partner.bearer)
      .expect(200);
    const res = await http()
      .post(`/api/projects/${p.id}/invitations`)
      .set('Authorization', partner.bearer)
      .send({ email: 'friend@example.test', role: 'caretaker' })
      .expect(403);
    expect(res.body.message).toMatch(/Only the owner/);
    await http().post(`/api/projects/${p.id}/invitations`).set('Authorization', mira.bearer).send({ email: partner.user.email, role: 'partner' }).expect(409);
    const bad = await http().post(`/api/projects/${p.id}/invitations`).set('Authorization', mira.bearer).send({ email: 'nope', role: 'owner' }).expect(400);
    expect(bad.body.details.map((d: { field: string }) => d.field).sort()).toEqual(['email', 'role']);
  });

  it('another account than the invited address only asks to join; it joins once the owner approves', async () => {
    const p = await createProject(t.app, t.orm, mira, { title: `Forwarded link ${Date.now()}` });
    const invited = `invited.${Date.now()}@example.test`;
    const sent = await http().post(`/api/projects/${p.id}/invitations`).set('Authorization', mira.bearer).send({ email: invited, role: 'partner' }).expect(201);
    const token = await tokenFromMail(invited, p.title);
    const other = await registerKeeper(t.app, 'Holder Of The Link');
    const asked = await http().post(`/api/invitations/${token}/accept`).set('Authorization', other.bearer).expect(200);
    expect(asked.body).toEqual({ projectId: p.id, role: 'partner', status: 'awaiting-owner' });
    await http().get(`/api/projects/${p.id}`).set('Authorization', other.bearer).expect(404);

    const approve = (who: SignedIn) => http().post(`/api/projects/${p.id}/invitations/${sent.body.id}/approve`).set('Authorization', who.bearer);
    await approve(other).expect(404); // not a member
    await http().post(`/api/projects/${p.id}/invitations/${sent.body.id}/approve`).expect(401);
    const approved = await approve(mira).expect(200);
    expect(approved.body).toEqual({ projectId: p.id, role: 'partner', status: 'joined' });
    expect((await http().get(`/api/projects/${p.id}`).set('Authorization', other.bearer).expect(200)).body.myRole).toBe('partner');
    expect((await approve(mira).expect(410)).body.message).toBe('This invitation has already been used.');
  });

  it('the owner approves only an invitation someone asked to join with, and only the owner', async () => {
    const p = await createProject(t.app, t.orm, mira, { title: `Unclaimed ${Date.now()}` });
    const partner = await registerKeeper(t.app, 'Partner Two');
    await http().post(`/api/projects/${p.id}/invitations`).set('Authorization', mira.bearer).send({ email: partner.user.email, role: 'partner' }).expect(201);
    await http()
      .post(`/api/invitations/${await tokenFromMail(partner.user.email, p.title)}/accept`)
      .set('Authorization', partner.bearer)
      .expect(200);
    const open = await http()
      .post(`/api/projects/${p.id}/invitations`)
      .set('Authorization', mira.bearer)
      .send({ email: 'nobody.yet@example.test', role: 'caretaker' })
      .expect(201);
    const approve = (who: SignedIn) => http().post(`/api/projects/${p.id}/invitations/${open.body.id}/approve`).set('Authorization', who.bearer);
    expect((await approve(partner).expect(403)).body.message).toMatch(/Only the owner/);
    expect((await approve(mira).expect(409)).body.message).toBe('Nobody has asked to join with this invitation yet.');
  });
});

/**
 * The invitation in the invitee's language when the address has an account (its `language`
 * setting), else in English: the server has no other clue to a stranger's language. German words
 * from the catalogue's `mail.invitation` section (shared/src/i18n/mail.ts).
 */
describe("the invitation mail in the reader's language", () => {
  it('a German keeper is invited in German, an address without an account in English', async () => {
    const greta = await registerKeeper(t.app, 'Greta', 'de');
    const p = await createProject(t.app, t.orm, mira, { title: `Sprache ${Date.now()}` });
    await http().post(`/api/projects/${p.id}/invitations`).set('Authorization', mira.bearer).send({ email: greta.user.email, role: 'caretaker' }).expect(201);
    const de = await waitForMail(greta.user.email, new RegExp(p.title));
    expect(de.subject).toBe(`Mira lädt dich zum Zuchtprojekt „${p.title}“ ein`);
    const text = readableText(de);
    expect(text).toContain(`Hallo,\n\nMira lädt dich ein, beim Zuchtprojekt „${p.title}“ auf Broodsilk als Betreuer mitzumachen.`);
    expect(text).toContain('innerhalb von 7 Tagen');
    expect(text).toMatch(LINK);

    const stranger = `fremd.${Date.now()}@example.test`;
    await http().post(`/api/projects/${p.id}/invitations`).set('Authorization', mira.bearer).send({ email: stranger, role: 'partner' }).expect(201);
    const en = await waitForMail(stranger, new RegExp(p.title));
    expect(en.subject).toBe(`Mira invites you to the breeding project "${p.title}"`);
    expect(readableText(en)).toContain(`invites you to join the breeding project "${p.title}" on Broodsilk as partner.`);
    expect(en.text).toContain('Open this link within 7 days to accept');
  });
});
