/**
 * Partner updates (docs/product.md, Partner updates): what the keeper or a caretaker records in a
 * shared project reaches its partners in-app at once and by e-mail (through the outbox, after the
 * write commits), once per event and partner, never to the one who recorded it. Bad news (a failed
 * sac, an early end) carries the counts, what the failure clause means for each partner and the
 * keeper's own words, and reaches partners without an account by e-mail too. E-mails are read from
 * the mail sink and parsed with mailparser (a general-purpose RFC 5322 / MIME parser).
 */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addDays, TEXT_LIMITS, todayIn, serverWordsFor, type FailureNoticePreview, type NotificationPage, type ProjectResponse } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { addMember, createProject } from './support/projects';
import { createSac } from './support/sacs';
import { mailsTo, waitForMail } from './support/mail-sink';
import { ActivityEvent } from '../src/activity/activity-event.entity';
import { PartnerUpdates } from '../src/partner-updates/partner-updates.service';

let t: TestApp;
let owner: SignedIn;
let partner: SignedIn;
let german: SignedIn;
let caretaker: SignedIn;
let p: ProjectResponse;
const OUTSIDE = { name: 'Odile Marchetti', email: `odile-${Date.now()}@outside.test` };
const MESSAGE = 'I am sorry: the sac went mouldy on day 20. We will pair her again in spring.';
const http = () => request(t.app.getHttpServer());
const today = () => todayIn('UTC', new Date());
const inbox = async (who: SignedIn): Promise<NotificationPage> =>
  (await http().get('/api/notifications?limit=100').set('Authorization', who.bearer).expect(200)).body;
const updatesOf = async (who: SignedIn) => (await inbox(who)).items.filter((n) => n.kind === 'partner-update');

beforeAll(async () => {
  t = await createTestApp();
  owner = await registerKeeper(t.app, 'Oona');
  partner = await registerKeeper(t.app, 'Piet');
  german = await registerKeeper(t.app, 'Gerda');
  caretaker = await registerKeeper(t.app, 'Cato');
  await http().patch('/api/users/me').set('Authorization', german.bearer).send({ language: 'de' }).expect(200);
  p = await createProject(t.app, t.orm, owner, { title: 'Update pair' });
  const ids = {
    owner: p.members[0].id,
    partner: await addMember(t.orm, p.id, partner, 'partner'),
    german: await addMember(t.orm, p.id, german, 'partner'),
    outside: (
      await http()
        .post(`/api/projects/${p.id}/members`)
        .set('Authorization', owner.bearer)
        .send({ ...OUTSIDE, role: 'partner' })
        .expect(201)
    ).body.id as string,
  };
  await addMember(t.orm, p.id, caretaker, 'caretaker');
  await http()
    .post(`/api/projects/${p.id}/terms`)
    .set('Authorization', owner.bearer)
    .send({
      lines: [
        { memberId: ids.owner, weight: 2, pickOrder: 1 },
        { memberId: ids.partner, weight: 1, pickOrder: 2 },
        { memberId: ids.german, weight: 1, pickOrder: 3 },
        { memberId: ids.outside, weight: 1, pickOrder: 4 },
      ],
      pricePerSpiderlingMinor: 1500,
      currency: 'EUR',
      failureClause: 'carries-over',
      shippingPaidBy: 'recipient',
    })
    .expect(201);
  await http().post(`/api/projects/${p.id}/terms/1/accept`).set('Authorization', partner.bearer).send({}).expect(200);
  await http().post(`/api/projects/${p.id}/terms/1/accept`).set('Authorization', german.bearer).send({}).expect(200);
  await http()
    .post(`/api/projects/${p.id}/terms/1/accept`)
    .set('Authorization', owner.bearer)
    .send({ memberId: ids.outside, note: 'Agreed by phone' })
    .expect(200);
});
afterAll(async () => {
  await t.close();
});

describe('partner updates', () => {
  it('a change of terms reaches the partners, not the one who made it', async () => {
    const mine = await updatesOf(partner);
    // Proposed (by the owner), then in force once everyone accepted (the last acceptance was the owner's).
    expect(mine.map((n) => n.title)).toEqual(
      expect.arrayContaining([
        `Update pair: ${serverWordsFor('en')('activityKind.terms.in-force')}`,
        `Update pair: ${serverWordsFor('en')('activityKind.terms.proposed')}`,
      ]),
    );
    expect(mine.every((n) => n.subject?.type === 'project' && n.subject.id === p.id)).toBe(true);
    expect(await updatesOf(owner)).toEqual([]);
    expect(await updatesOf(caretaker)).toEqual([]);
  });

  it('the keeper previews the bad news before recording it; partners and caretakers may not, and bad input is a 400', async () => {
    const sac = await createSac(t.app, owner, p.id, { layDate: addDays(today(), -20) });
    const preview = await http()
      .post(`/api/sacs/${sac.id}/failure-notice-preview`)
      .set('Authorization', owner.bearer)
      .send({ failureReason: 'spoiled', partnerMessage: MESSAGE })
      .expect(200);
    const body = preview.body as FailureNoticePreview;
    expect(body).toMatchObject({ members: 2, outsideParties: 1, title: 'Update pair: Sac failed' });
    expect(body.body).toContain(MESSAGE);
    expect(body.body).toContain('Piet');
    await http().post(`/api/sacs/${sac.id}/failure-notice-preview`).set('Authorization', partner.bearer).send({ failureReason: 'spoiled' }).expect(403);
    await http().post(`/api/sacs/${sac.id}/failure-notice-preview`).set('Authorization', caretaker.bearer).send({ failureReason: 'spoiled' }).expect(403);
    const bad = await http().post(`/api/sacs/${sac.id}/failure-notice-preview`).set('Authorization', owner.bearer).send({ failureReason: 'lost' }).expect(400);
    expect(bad.body.message).toMatch(/infertile/);
    const long = await http()
      .post(`/api/sacs/${sac.id}/failure-notice-preview`)
      .set('Authorization', owner.bearer)
      .send({ failureReason: 'spoiled', partnerMessage: 'x'.repeat(TEXT_LIMITS.partnerMessage + 1) })
      .expect(400);
    expect(JSON.stringify(long.body)).toMatch(new RegExp(`at most ${TEXT_LIMITS.partnerMessage}`));
    // A message goes only with the failure itself.
    await http().patch(`/api/sacs/${sac.id}`).set('Authorization', owner.bearer).send({ notes: 'x', partnerMessage: MESSAGE }).expect(400);
  });

  it('a failed sac reaches a member partner in-app and by e-mail with the facts and the keeper’s words; the keeper gets nothing', async () => {
    const sac = (await http().get(`/api/projects/${p.id}/sacs`).set('Authorization', owner.bearer).expect(200)).body[0] as { id: string; layDate: string };
    const before = (await updatesOf(partner)).length;
    await http()
      .patch(`/api/sacs/${sac.id}`)
      .set('Authorization', owner.bearer)
      .send({ outcome: 'failed', failureReason: 'spoiled', partnerMessage: MESSAGE })
      .expect(200);
    const mine = await updatesOf(partner);
    expect(mine.length).toBe(before + 1);
    const failed = mine[0];
    expect(failed).toMatchObject({ title: 'Update pair: Sac failed', subject: { type: 'sac', id: sac.id }, projectId: p.id, readAt: null });
    expect(failed.body).toContain(`The sac laid ${sac.layDate} failed. Reason: ${serverWordsFor('en')('sacFailure.spoiled')}.`);
    expect(failed.body).toContain('No count was recorded for this sac.');
    expect(failed.body).toContain(serverWordsFor('en')('failureClauseText.carries-over'));
    expect(failed.body).toContain('Piet (weight 1): the share carries over to the next sac or pairing of this deal.');
    expect(failed.body).toContain(`${OUTSIDE.name} (weight 1)`);
    expect(failed.body).toContain('Oona (weight 2)');
    expect(failed.body).toContain(`A message from Oona`);
    expect(failed.body).toContain(MESSAGE);

    // RFC 8058 one-click unsubscribe headers; HTML and text parts (mailparser).
    const mail = await waitForMail(partner.user.email, /Sac failed/);
    expect(mail.subject).toBe('Broodsilk: Update pair: Sac failed');
    expect(mail.text).toContain(MESSAGE);
    expect(mail.text).toContain(`/sacs/${sac.id}`);
    expect(String(mail.html)).toContain('I am sorry: the sac went mouldy on day 20.');
    // RFC 8058 §3.1: a List-Unsubscribe http(s) URI and List-Unsubscribe-Post with exactly this value.
    const header = (name: string) => mail.headerLines.find((h) => h.key === name)?.line.replace(/^[^:]+:\s*/, '');
    expect(header('list-unsubscribe')).toMatch(/^<http:\/\/[^>]+\/api\/unsubscribe\/[^>]+\.partner-update\.[^>]+>$/);
    expect(header('list-unsubscribe-post')).toBe('List-Unsubscribe=One-Click');

    expect(await updatesOf(owner)).toEqual([]);
    expect(await updatesOf(caretaker)).toEqual([]);
    expect((await mailsTo(owner.user.email)).filter((m) => /Sac failed/.test(m.subject ?? ''))).toEqual([]);
  });

  it('a German partner reads it in German', async () => {
    const [failed] = await updatesOf(german);
    expect(failed.title).toBe(`Update pair: ${serverWordsFor('de')('activityKind.sac.failed')}`);
    expect(failed.body).toContain('Eine Nachricht von Oona:');
    expect(failed.body).toContain(MESSAGE);
    const mail = await waitForMail(german.user.email, /Kokon verdorben/);
    expect(String(mail.html)).toContain('lang="de"');
  });

  it('an outside party (no account, an e-mail address) gets the bad news by e-mail with the keeper’s message', async () => {
    const mail = await waitForMail(OUTSIDE.email, /Sac failed/);
    expect(mail.text).toContain(MESSAGE);
    // With a working link to their progress page (no account needed).
    const url = new URL(/https?:\/\/\S+\/progress\/\S+/.exec(mail.text ?? '')![0]);
    const page = await http()
      .get(`/api/progress/${url.pathname.split('/').pop()}`)
      .expect(200);
    expect(JSON.stringify(page.body)).toContain('Update pair');
    expect(mail.text).toContain('Oona named you as a partner in “Update pair”');
    expect(mail.headerLines.find((h) => h.key === 'list-unsubscribe')).toBeUndefined();
  });

  it('the same event handled again tells nobody twice', async () => {
    const em = t.orm.em.fork();
    const event = await em.findOneOrFail(ActivityEvent, { project: p.id, kind: 'sac.failed' });
    // Mails about this event only: another test's mail may still be on its way to the same address.
    const aboutIt = async (address: string) => (await mailsTo(address)).filter((m) => /Sac failed/.test(m.subject ?? '')).length;
    const before = {
      partner: (await updatesOf(partner)).length,
      mails: await aboutIt(partner.user.email),
      outside: await aboutIt(OUTSIDE.email),
    };
    const written = await em.transactional((tx) => t.app.get(PartnerUpdates).write(tx, [event.id]));
    expect(written).toBe(0);
    await new Promise((r) => setTimeout(r, 1500));
    expect((await updatesOf(partner)).length).toBe(before.partner);
    expect(await aboutIt(partner.user.email)).toBe(before.mails);
    expect(await aboutIt(OUTSIDE.email)).toBe(before.outside);
    // Recording the same outcome again is no new event: still one update.
    const sac = (await http().get(`/api/projects/${p.id}/sacs`).set('Authorization', owner.bearer).expect(200)).body[0] as { id: string };
    await http().patch(`/api/sacs/${sac.id}`).set('Authorization', owner.bearer).send({ outcome: 'failed', failureReason: 'spoiled' }).expect(200);
    expect((await updatesOf(partner)).filter((n) => n.title.endsWith('Sac failed')).length).toBe(1);
  });

  it('a partner who chose in-app only gets no e-mail; a caretaker’s record reaches the partners too', async () => {
    await http()
      .patch('/api/reminder-preferences')
      .set('Authorization', partner.bearer)
      .send({ channels: { 'partner-update': 'in-app' } })
      .expect(200);
    const sac = await createSac(t.app, owner, p.id, { layDate: addDays(today(), -3) });
    await http().put(`/api/projects/${p.id}/incubator-rights`).set('Authorization', owner.bearer).send({ caretakersMayPullAndOpen: true }).expect(200);
    await http().post(`/api/sacs/${sac.id}/pull`).set('Authorization', caretaker.bearer).send({}).expect(201);
    const pulled = (await updatesOf(partner)).find((n) => n.title.endsWith(serverWordsFor('en')('activityKind.sac.pulled')));
    expect(pulled?.body).toContain('Recorded by Cato');
    await waitForMail(german.user.email, /Kokon entnommen/);
    expect((await mailsTo(partner.user.email)).filter((m) => /Sac pulled/.test(m.subject ?? ''))).toEqual([]);
    expect(await updatesOf(caretaker)).toEqual([]);
  });

  it('a female’s molt after a successful pairing is on the timeline and reaches the partners', async () => {
    await http()
      .post(`/api/projects/${p.id}/pairings`)
      .set('Authorization', owner.bearer)
      .send({ startedAt: `${addDays(today(), -30)}T18:00:00Z`, durationMinutes: 30, outcome: 'connected', acknowledgedWarnings: [], warningReason: null })
      .expect((res) => {
        if (res.status !== 201) throw new Error(`pairing answered ${res.status}: ${JSON.stringify(res.body)}`);
      });
    await http()
      .post(`/api/animals/${p.female.id}/molts`)
      .set('Authorization', owner.bearer)
      .send({ moltedOn: addDays(today(), -2) })
      .expect(201);
    const molted = (await updatesOf(partner)).find((n) => n.title.endsWith(serverWordsFor('en')('activityKind.female.molted')));
    expect(molted?.body).toContain(`molted on ${addDays(today(), -2)}, after the pairing on ${addDays(today(), -30)}`);
    expect(molted?.subject).toEqual({ type: 'project', id: p.id });
  });

  it('an early end with the keeper’s words reaches the partners and the outside party', async () => {
    await http()
      .post(`/api/projects/${p.id}/end`)
      .set('Authorization', owner.bearer)
      .send({ reason: 'female-molted', partnerMessage: 'She molted; we start again next season.' })
      .expect(200);
    const ended = (await updatesOf(german)).find((n) => n.title.endsWith(serverWordsFor('de')('activityKind.project.ended')));
    expect(ended?.body).toContain('She molted; we start again next season.');
    const mail = await waitForMail(OUTSIDE.email, /Project ended early/);
    expect(mail.text).toContain('She molted; we start again next season.');
  });
});
