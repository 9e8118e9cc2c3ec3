/**
 * Reminders planned from the facts: each write that changes a sac re-plans its pg-boss jobs (start
 * times checked here), the job handler sends what is still true once, by the channels chosen, and
 * the e-mail carries a one-click unsubscribe (RFC 8058) that works signed out.
 */
import request from 'supertest';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { DateTime } from 'luxon';
import { addDays, todayIn, type NotificationPage, type ReminderPreferences } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { addMember, createProject } from './support/projects';
import { createSac, setTimeZone } from './support/sacs';
import type { ParsedMail } from 'mailparser';
import { mailsTo, readableText, waitForMail } from './support/mail-sink';
import { rowCounts } from './support/row-counts';
import { JOBS_SCHEMA } from '../src/jobs/jobs.service';
import { REMINDER_QUEUE, type ReminderJob } from '../src/reminders/reminder-planner.service';
import { ReminderDelivery } from '../src/reminders/reminder-delivery.service';
import { Clock } from '../src/common/clock';
import { ProjectMember } from '../src/projects/project-member.entity';

let t: TestApp;
let owner: SignedIn;
let caretaker: SignedIn;
let partner: SignedIn;
let projectId: string;
const http = () => request(t.app.getHttpServer());
const HOUR = 3_600_000;

interface WaitingJob {
  id: string;
  data: ReminderJob;
  startAfter: Date;
}

/** The reminder jobs waiting for a sac, by start time then key. */
async function waiting(plannedFor: string): Promise<WaitingJob[]> {
  const rows = await t.orm.em
    .getConnection()
    .execute<{ id: string; data: ReminderJob; start_after: Date }[]>(
      `select id, data, start_after from ${JOBS_SCHEMA}.job where name = ? and state = 'created' and data->>'plannedFor' = ? order by start_after, data->>'key'`,
      [REMINDER_QUEUE, plannedFor],
    );
  return rows.map((r) => ({ id: r.id, data: r.data, startAfter: new Date(r.start_after) }));
}
const kindOf = (j: WaitingJob) => j.data.key.split(':')[0];
const userOf = (j: WaitingJob) => j.data.key.split(':')[2];
const summary = (jobs: WaitingJob[]) => jobs.map((j) => [kindOf(j), userOf(j), j.startAfter.toISOString()]);
const deliver = (job: ReminderJob) => t.app.get(ReminderDelivery).deliver(job);
const inbox = async (who: SignedIn): Promise<NotificationPage> => (await http().get('/api/notifications').set('Authorization', who.bearer).expect(200)).body;
const prefs = async (who: SignedIn): Promise<ReminderPreferences> =>
  (await http().get('/api/reminder-preferences').set('Authorization', who.bearer).expect(200)).body;

beforeAll(async () => {
  t = await createTestApp();
  owner = await registerKeeper(t.app, 'Ortrud');
  caretaker = await registerKeeper(t.app, 'Cyrus');
  partner = await registerKeeper(t.app, 'Pia');
  await setTimeZone(t.app, owner, 'Europe/Berlin');
  await setTimeZone(t.app, caretaker, 'America/New_York');
  projectId = (await createProject(t.app, t.orm, owner, { title: 'Plan pair' })).id;
  await addMember(t.orm, projectId, caretaker, 'caretaker');
  await addMember(t.orm, projectId, partner, 'partner');
});
afterAll(async () => {
  await t.close();
});
afterEach(() => {
  vi.restoreAllMocks();
});

describe('planning on each fact change (pg-boss start times)', () => {
  it('a sac with the mother plans the window opening at 08:00 and the closing warning 2 days ahead, in each recipient’s zone; partners get none', async () => {
    const layDate = addDays(todayIn('UTC', new Date()), -10);
    const sac = await createSac(t.app, owner, projectId, { layDate, pullFromDay: 21, pullToDay: 40 });
    const opensOn = addDays(layDate, 21);
    const warnOn = addDays(layDate, 38);
    // Reference: luxon on the IANA tz database gives 08:00 local as an instant.
    const at8 = (date: string, zone: string) => DateTime.fromISO(`${date}T08:00`, { zone }).toUTC().toISO();
    const jobs = await waiting(`sac:${sac.id}`);
    expect(summary(jobs).sort()).toEqual(
      [
        ['pull-window-opens', owner.user.id, at8(opensOn, 'Europe/Berlin')],
        ['pull-window-opens', caretaker.user.id, at8(opensOn, 'America/New_York')],
        ['pull-window-closes', owner.user.id, at8(warnOn, 'Europe/Berlin')],
        ['pull-window-closes', caretaker.user.id, at8(warnOn, 'America/New_York')],
      ].sort(),
    );
    expect(jobs.some((j) => userOf(j) === partner.user.id)).toBe(false);

    // The pull ends the window reminders; rolling starts (first roll due at the pull).
    const pulledAt = new Date(Date.now() - HOUR);
    await http().patch(`/api/sacs/${sac.id}`).set('Authorization', owner.bearer).send({ pulledAt: pulledAt.toISOString() }).expect(200);
    const after = await waiting(`sac:${sac.id}`);
    expect(after.filter((j) => kindOf(j).startsWith('pull-window'))).toEqual([]);
    expect(summary(after).filter(([, u]) => u === owner.user.id)).toEqual([
      ['roll-due', owner.user.id, pulledAt.toISOString()],
      ['roll-overdue', owner.user.id, new Date(pulledAt.getTime() + 3 * HOUR).toISOString()],
    ]);
  });

  it('a roll logged moves the next roll 12 h on; striking it restores the earlier plan; an entry that changes no reminder leaves the jobs as they were', async () => {
    const pulledAt = new Date(Date.now() - 2 * HOUR);
    const sac = await createSac(t.app, owner, projectId, { layDate: addDays(todayIn('UTC', new Date()), -30), pulledAt: pulledAt.toISOString() });
    const first = await waiting(`sac:${sac.id}`);
    expect(first.filter((j) => kindOf(j) === 'roll-due').map((j) => j.startAfter.toISOString())).toEqual([pulledAt.toISOString(), pulledAt.toISOString()]);

    const rolledAt = new Date(Date.now() - HOUR);
    const roll = await http()
      .post(`/api/sacs/${sac.id}/log`)
      .set('Authorization', caretaker.bearer)
      .send({ kind: 'roll', at: rolledAt.toISOString() })
      .expect(201);
    const moved = await waiting(`sac:${sac.id}`);
    expect(summary(moved).filter(([, u]) => u === caretaker.user.id)).toEqual([
      ['roll-due', caretaker.user.id, new Date(rolledAt.getTime() + 12 * HOUR).toISOString()],
      ['roll-overdue', caretaker.user.id, new Date(rolledAt.getTime() + 15 * HOUR).toISOString()],
    ]);

    await http()
      .post(`/api/sacs/${sac.id}/log`)
      .set('Authorization', owner.bearer)
      .send({ kind: 'strike', strikes: roll.body.id, reason: 'Logged on the wrong sac.' })
      .expect(201);
    const restored = await waiting(`sac:${sac.id}`);
    expect(summary(restored)).toEqual(summary(first));

    await http().post(`/api/sacs/${sac.id}/log`).set('Authorization', owner.bearer).send({ kind: 'note', text: 'Eggs look pale yellow.' }).expect(201);
    expect((await waiting(`sac:${sac.id}`)).map((j) => j.id)).toEqual(restored.map((j) => j.id));
  });
});

describe('members', () => {
  it('a caretaker who joins gets the open sacs’ reminders; one who leaves no longer does', async () => {
    const who = await registerKeeper(t.app, 'Jonas');
    const p = await createProject(t.app, t.orm, owner, { title: 'Member pair' });
    const pulledAt = new Date(Date.now() - HOUR).toISOString();
    const sac = await createSac(t.app, owner, p.id, { layDate: addDays(todayIn('UTC', new Date()), -30), pulledAt });
    expect((await waiting(`sac:${sac.id}`)).some((j) => userOf(j) === who.user.id)).toBe(false);
    const memberId = await addMember(t.orm, p.id, who, 'caretaker');
    expect(summary(await waiting(`sac:${sac.id}`)).filter(([, u]) => u === who.user.id)).toEqual([
      ['roll-due', who.user.id, pulledAt],
      ['roll-overdue', who.user.id, new Date(Date.parse(pulledAt) + 3 * HOUR).toISOString()],
    ]);
    const em = t.orm.em.fork();
    em.remove(await em.findOneOrFail(ProjectMember, memberId));
    await em.flush();
    expect((await waiting(`sac:${sac.id}`)).some((j) => userOf(j) === who.user.id)).toBe(false);
  });
});

describe('the handler: still true, once, by the chosen channels', () => {
  let job: ReminderJob;
  let sacId: string;

  beforeAll(async () => {
    const pulledAt = new Date(Date.now() - 30 * 60_000);
    sacId = (await createSac(t.app, owner, projectId, { layDate: addDays(todayIn('UTC', new Date()), -28), pulledAt: pulledAt.toISOString() })).id;
    job = (await waiting(`sac:${sacId}`)).find((j) => kindOf(j) === 'roll-due' && userOf(j) === owner.user.id)!.data;
  });

  it('two workers at once send the roll reminder once: one notification, one e-mail in the sink, times in the recipient’s zone', async () => {
    const outcomes = await Promise.all([deliver(job), deliver(job)]);
    expect(outcomes.sort()).toEqual(['already-sent', 'sent']);
    const mail = await waitForMail(owner.user.email, /Roll due: Plan pair/);
    // Reference for the wall time: luxon on the IANA tz database.
    const due = DateTime.fromISO(job.sendAt).setZone('Europe/Berlin');
    expect(mail.text).toContain(`${due.toFormat('HH:mm')} (Europe/Berlin)`);
    expect(mail.html).toContain('<h1');
    expect(mail.html).toContain(`/sacs/${sacId}`);
    // RFC 8058 §3.1: a List-Unsubscribe https/http URI and List-Unsubscribe-Post with exactly this value.
    const header = (name: string) => mail.headerLines.find((h) => h.key === name)?.line.replace(/^[^:]+:\s*/, '');
    expect(header('list-unsubscribe')).toMatch(/^<http:\/\/[^>]+\/api\/unsubscribe\/[^>]+>$/);
    expect(header('list-unsubscribe-post')).toBe('List-Unsubscribe=One-Click');
    expect((await mailsTo(owner.user.email)).filter((m) => /Roll due/.test(m.subject ?? ''))).toHaveLength(1);
    const page = await inbox(owner);
    expect(page.items.filter((n) => n.kind === 'roll-due' && n.subject?.id === sacId)).toHaveLength(1);
    expect(await deliver(job)).toBe('already-sent');
  });

  it('a reminder that stopped being true is not sent (the roll logged before the job ran)', async () => {
    const other = (await waiting(`sac:${sacId}`)).find((j) => kindOf(j) === 'roll-due' && userOf(j) === caretaker.user.id)!.data;
    await http().post(`/api/sacs/${sacId}/log`).set('Authorization', caretaker.bearer).send({ kind: 'roll', at: new Date().toISOString() }).expect(201);
    expect(await deliver(other)).toBe('no-longer-true');
    expect((await inbox(caretaker)).items.filter((n) => n.subject?.id === sacId)).toEqual([]);
  });

  it('the unsubscribe link works signed out (one-click POST) and stops that kind’s e-mails only; a changed link is a 400 and changes nothing', async () => {
    const mail = await waitForMail(owner.user.email, /Roll due: Plan pair/);
    const url = new URL(/<([^>]+)>/.exec(mail.headerLines.find((h) => h.key === 'list-unsubscribe')!.line)![1]);
    const tampered = url.pathname.replace(/.$/, (c) => (c === 'A' ? 'B' : 'A'));
    const before = await rowCounts(t.orm);
    const bad = await http().post(tampered).type('form').send('List-Unsubscribe=One-Click').expect(400);
    expect(bad.body.message).toMatch(/not valid/);
    await http().get(tampered).expect(400);
    expect(await rowCounts(t.orm)).toEqual(before);
    expect((await prefs(owner)).channels['roll-due']).toBe('both');

    const page = await http().get(url.pathname).expect(200);
    expect(page.text).toContain('<form method="post">');
    expect((await prefs(owner)).channels['roll-due']).toBe('both'); // a GET changes nothing (RFC 8058 §3.2)
    await http().post(url.pathname).type('form').send('List-Unsubscribe=One-Click').expect(200);
    const after = await prefs(owner);
    expect(after.channels['roll-due']).toBe('in-app');
    expect(after.channels['roll-overdue']).toBe('both');
  });

  it('in-app only: the next reminder is stored but not e-mailed', async () => {
    const pulledAt = new Date(Date.now() - 10 * 60_000);
    const sac = await createSac(t.app, owner, projectId, { layDate: addDays(todayIn('UTC', new Date()), -27), pulledAt: pulledAt.toISOString() });
    const j = (await waiting(`sac:${sac.id}`)).find((x) => kindOf(x) === 'roll-due' && userOf(x) === owner.user.id)!.data;
    expect(await deliver(j)).toBe('sent');
    expect((await inbox(owner)).items.filter((n) => n.subject?.id === sac.id)).toHaveLength(1);
    await new Promise((r) => setTimeout(r, 1_500)); // the mail worker polls every 0.5 s
    expect((await mailsTo(owner.user.email)).filter((m) => /Roll due/.test(m.subject ?? ''))).toHaveLength(1);
  });
});

describe('animals: planned for their keeper at 08:00 local', () => {
  it('a male’s clock reaching prime and a molt after pairing are planned for the keeper’s morning, and sent when due', async () => {
    const who = await registerKeeper(t.app, 'Amos');
    await setTimeZone(t.app, who, 'Australia/Sydney');
    const p = await createProject(t.app, t.orm, who, { title: 'Animal pair', maleAgeDays: 21 }); // male-clock.ts: prime from day 21
    const today = todayIn('Australia/Sydney', new Date());
    const at8 = (date: string) => DateTime.fromISO(`${date}T08:00`, { zone: 'Australia/Sydney' }).toUTC().toISO();
    const male = await waiting(`animal:${p.male.id}`);
    // He matured 21 days before the UTC date the fixture used, so prime starts on that date.
    expect(summary(male).filter(([k]) => k === 'male-clock')[0]).toEqual(['male-clock', who.user.id, at8(todayIn('UTC', new Date()))]);

    await http()
      .post(`/api/projects/${p.id}/pairings`)
      .set('Authorization', who.bearer)
      .send({ startedAt: new Date(Date.now() - 3 * 24 * HOUR).toISOString(), durationMinutes: 20, outcome: 'connected' })
      .expect((r) => expect(r.body).toMatchObject({ outcome: 'connected' }));
    await http().post(`/api/animals/${p.female.id}/molts`).set('Authorization', who.bearer).send({ moltedOn: today }).expect(201);
    const female = await waiting(`animal:${p.female.id}`);
    expect(summary(female)).toEqual([['female-molted', who.user.id, at8(today)]]);

    vi.spyOn(t.app.get(Clock), 'now').mockReturnValue(new Date(Math.max(Date.now(), female[0].startAfter.getTime())));
    expect(await deliver(female[0].data)).toBe('sent');
    const mail = await waitForMail(who.user.email, /Molted after pairing/);
    expect(mail.text).toMatch(/sheds the stored sperm/);
  });
});

describe('preferences', () => {
  it('reads the defaults with the zone from settings, changes only what is sent, and re-plans with quiet hours', async () => {
    const who = await registerKeeper(t.app, 'Quinn');
    await setTimeZone(t.app, who, 'Europe/Berlin');
    const defaults = await prefs(who);
    expect(defaults).toMatchObject({ quietHours: null, overdueBreaksQuiet: false, digestHour: null, timeZone: 'Europe/Berlin' });
    expect(Object.values(defaults.channels).every((c) => c === 'both')).toBe(true);
    const p = await createProject(t.app, t.orm, who, { title: 'Quiet pair' });
    // Pulled at 23:30 Berlin time yesterday: its roll fell due inside 22–07 quiet hours.
    const yesterday = addDays(todayIn('Europe/Berlin', new Date()), -1);
    const pulledAt = DateTime.fromISO(`${yesterday}T23:30`, { zone: 'Europe/Berlin' }).toJSDate();
    const sac = await createSac(t.app, who, p.id, { layDate: addDays(yesterday, -30), pulledAt: pulledAt.toISOString() });
    const res = await http()
      .patch('/api/reminder-preferences')
      .set('Authorization', who.bearer)
      .send({ quietHours: { from: 22, to: 7 }, channels: { 'pull-window-opens': 'off' } })
      .expect(200);
    expect(res.body.quietHours).toEqual({ from: 22, to: 7 });
    expect(res.body.channels['pull-window-opens']).toBe('off');
    expect(res.body.channels['roll-due']).toBe('both');
    const seven = DateTime.fromISO(`${todayIn('Europe/Berlin', new Date())}T07:00`, { zone: 'Europe/Berlin' })
      .toUTC()
      .toISO();
    expect(summary(await waiting(`sac:${sac.id}`))).toEqual([
      ['roll-due', who.user.id, seven],
      ['roll-overdue', who.user.id, seven],
    ]);
  });

  it('the daily digest is planned at the chosen local hour, sent then with the day’s plan, and the next one planned', async () => {
    const who = await registerKeeper(t.app, 'Dana');
    await setTimeZone(t.app, who, 'Asia/Tokyo');
    await http().patch('/api/reminder-preferences').set('Authorization', who.bearer).send({ digestHour: 6 }).expect(200);
    const [digest] = await waiting(`digest:${who.user.id}`);
    expect(DateTime.fromJSDate(digest.startAfter).setZone('Asia/Tokyo').toFormat('HH:mm')).toBe('06:00');
    vi.spyOn(t.app.get(Clock), 'now').mockReturnValue(digest.startAfter);
    expect(await deliver(digest.data)).toBe('sent');
    const mail = await waitForMail(who.user.email, /Your day/);
    expect(mail.text).toMatch(/Nothing is planned for the next 24 hours\.\n+0 unread in your inbox\./);
    const [next] = await waiting(`digest:${who.user.id}`);
    expect(next.startAfter.getTime() - digest.startAfter.getTime()).toBe(24 * HOUR); // Tokyo keeps no daylight-saving time (tz database)
  });

  it('refuses unknown kinds, channels and hours with the allowed values, and writes nothing', async () => {
    const before = await rowCounts(t.orm);
    const bad = async (body: object) =>
      (await http().patch('/api/reminder-preferences').set('Authorization', owner.bearer).send(body).expect(400)).body as {
        message: string;
        details?: { message: string }[];
      };
    const text = (b: { message: string; details?: { message: string }[] }) => JSON.stringify(b);
    expect(text(await bad({ channels: { 'roll-late': 'email' } }))).toContain('roll-due, roll-overdue');
    expect(text(await bad({ channels: { 'roll-due': 'pager' } }))).toContain('email, in-app, both, off');
    expect(text(await bad({ quietHours: { from: 24, to: 7 } }))).toContain('0 to 23');
    expect(text(await bad({ digestHour: 6.5 }))).toContain('0 to 23');
    expect(await rowCounts(t.orm)).toEqual(before);
    await http().get('/api/reminder-preferences').expect(401);
    await http().patch('/api/users/me').set('Authorization', owner.bearer).send({ timeZone: 'Mars/Olympus' }).expect(400);
  });
});

describe('inbox', () => {
  it('pages one’s own notifications with the unread count; read-all marks one’s own only; another user’s is a 404', async () => {
    const page = await http().get('/api/notifications?limit=1&offset=0').set('Authorization', owner.bearer).expect(200);
    expect(page.body.items).toHaveLength(1);
    expect(page.body.total).toBeGreaterThanOrEqual(2);
    expect(page.body.unread).toBe(page.body.total);
    await http().get('/api/notifications?limit=0').set('Authorization', owner.bearer).expect(400);
    const id = page.body.items[0].id as string;
    await http().post(`/api/notifications/${id}/read`).set('Authorization', caretaker.bearer).expect(404);
    const caretakerUnread = (await inbox(caretaker)).unread;
    const all = await http().post('/api/notifications/read-all').set('Authorization', owner.bearer).expect(200);
    expect(all.body.marked).toBe(page.body.total);
    expect((await inbox(owner)).unread).toBe(0);
    expect((await inbox(caretaker)).unread).toBe(caretakerUnread);
    await http().post('/api/notifications/read-all').expect(401);
  });
});

describe('in the reader’s language', () => {
  // German names by number (Unicode CLDR de, format-wide), picked by luxon's Gregorian weekday and month.
  const WEEKDAYS_DE = ['Montag', 'Dienstag', 'Mittwoch', 'Donnerstag', 'Freitag', 'Samstag', 'Sonntag'];
  const MONTHS_DE = ['Januar', 'Februar', 'März', 'April', 'Mai', 'Juni', 'Juli', 'August', 'September', 'Oktober', 'November', 'Dezember'];
  const unsubscribePath = (mail: ParsedMail) => new URL(/<([^>]+)>/.exec(mail.headerLines.find((h) => h.key === 'list-unsubscribe')!.line)![1]).pathname;

  it('a German keeper reads her roll reminder, its unsubscribe page and her digest in German, dates in the German form', async () => {
    const who = await registerKeeper(t.app, 'Greta', 'de');
    await setTimeZone(t.app, who, 'Europe/Berlin');
    const layDate = addDays(todayIn('UTC', new Date()), -28);
    const p = await createProject(t.app, t.orm, who, { title: 'Nordpaar' });
    const sac = await createSac(t.app, who, p.id, { layDate, pulledAt: new Date(Date.now() - 30 * 60_000).toISOString() });
    const job = (await waiting(`sac:${sac.id}`)).find((j) => kindOf(j) === 'roll-due')!.data;
    expect(await deliver(job)).toBe('sent');

    const mail = await waitForMail(who.user.email, /Drehen fällig: Nordpaar/);
    const words = readableText(mail);
    expect(words).not.toMatch(/(?<![-\w])(reminders|maleClock|notificationKind)\.\w/);
    expect(words.replace(/https?:\S+/g, '')).not.toMatch(/\b(due|Roll|sac|Open|Stop)\b/); // the links carry the kind's code
    // Unicode CLDR de: medium date "dd.MM.y", short time "HH:mm"; the wall time from luxon on the IANA tz database.
    const due = DateTime.fromISO(job.sendAt).setZone('Europe/Berlin');
    expect(mail.text).toContain(
      `Der Kokon vom ${DateTime.fromISO(layDate).toFormat('dd.MM.yyyy')} muss am ${due.toFormat('dd.MM.yyyy, HH:mm')} (Europe/Berlin)`,
    );
    expect(mail.text).toContain('Keine E-Mails mehr zu „Drehen wird fällig“');
    expect(mail.html).toContain('<html lang="de">');
    expect((await inbox(who)).items.find((n) => n.subject?.id === sac.id)?.title).toBe('Drehen fällig: Nordpaar');

    // The page speaks the account's language, whatever the browser asks for.
    const page = await http().get(unsubscribePath(mail)).set('Accept-Language', 'en-GB,en;q=0.9').expect(200);
    expect(page.text).toContain('<html lang="de">');
    expect(page.text).toContain('Keine E-Mails mehr zu „Drehen wird fällig“?');
    const done = await http().post(unsubscribePath(mail)).type('form').send('List-Unsubscribe=One-Click').expect(200);
    expect(done.text).toContain('Du bekommst keine E-Mails mehr zu „Drehen wird fällig“.');

    await http().patch('/api/reminder-preferences').set('Authorization', who.bearer).send({ digestHour: 6 }).expect(200);
    const [digest] = await waiting(`digest:${who.user.id}`);
    vi.spyOn(t.app.get(Clock), 'now').mockReturnValue(digest.startAfter);
    expect(await deliver(digest.data)).toBe('sent');
    const day = DateTime.fromJSDate(digest.startAfter).setZone('Europe/Berlin');
    const title = `Dein Tag: ${WEEKDAYS_DE[day.weekday - 1]}, ${day.day}. ${MONTHS_DE[day.month - 1]} ${day.year}`;
    const digestMail = await waitForMail(who.user.email, new RegExp(`^Broodsilk: ${title}$`));
    // CLDR plural rules, de: 1 is "one".
    expect(readableText(digestMail)).toMatch(/\n1 ungelesene Nachricht in deinem Posteingang\./);
  });

  it('a broken link answers in the browser’s language (Accept-Language, RFC 9110 §12.5.4), English when it asks for none of ours', async () => {
    const broken = '/api/unsubscribe/not-a-link';
    const german = await http().get(broken).set('Accept-Language', 'fr-CH, de-CH;q=0.8, en;q=0.5').expect(400);
    expect(german.type).toBe('text/html');
    expect(german.text).toContain('<html lang="de">');
    expect(german.text).toContain('Dieser Abmeldelink ist ungültig');
    for (const asked of ['fr', '']) {
      const english = await http().get(broken).set('Accept-Language', asked).expect(400);
      expect(english.text).toContain('<html lang="en">');
      expect(english.text).toContain('This unsubscribe link is not valid');
    }
    const posted = await http().post(broken).set('Accept-Language', 'de').type('form').send('List-Unsubscribe=One-Click').expect(400);
    expect(posted.body.message).toMatch(/^Dieser Abmeldelink ist ungültig/);
  });
});
