import request from 'supertest';
import ICAL from 'ical.js';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { DateTime } from 'luxon';
import type { CalendarFeedResponse } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { addMember, createProject } from './support/projects';
import { createSac } from './support/sacs';
import { Clock } from '../src/common/clock';

let t: TestApp;
let owner: SignedIn;
let partner: SignedIn;
let projectId: string;
const http = () => request(t.app.getHttpServer());
const feedOf = async (who: SignedIn): Promise<CalendarFeedResponse> =>
  (await http().get('/api/calendar/feed').set('Authorization', who.bearer).expect(200)).body;

interface Parsed {
  uid: string;
  start: string;
  end: string;
  isDate: boolean;
  summary: string;
  description: string;
}
/** Parsed with ical.js, an independent RFC 5545 parser. */
function parse(text: string): Parsed[] {
  const cal = new ICAL.Component(ICAL.parse(text));
  return cal.getAllSubcomponents('vevent').map((v) => {
    const e = new ICAL.Event(v);
    return {
      uid: e.uid,
      start: e.startDate.toString(),
      end: e.endDate.toString(),
      isDate: e.startDate.isDate && e.endDate.isDate,
      summary: e.summary,
      description: e.description,
    };
  });
}

const FEED_NOW = '2024-02-20T10:00:00Z';

beforeAll(async () => {
  t = await createTestApp();
  owner = await registerKeeper(t.app, 'Ottilie');
  partner = await registerKeeper(t.app, 'Pim');
  // The male matures 30 days before the feed's "now", on the app's one clock.
  const pinned = vi.spyOn(t.app.get(Clock), 'now').mockReturnValue(new Date(FEED_NOW));
  projectId = (await createProject(t.app, t.orm, owner, { title: 'Feed pair', maleAgeDays: 30 })).id;
  pinned.mockRestore();
  await addMember(t.orm, projectId, partner, 'partner');
});
afterEach(() => vi.restoreAllMocks());
afterAll(async () => {
  await t.close();
});

describe('calendar feed (RFC 5545)', () => {
  it('parses with ical.js; the pull window is an all-day event from opensOn with DTEND the day after closesOn (RFC 5545 §3.6.1)', async () => {
    vi.spyOn(t.app.get(Clock), 'now').mockReturnValue(new Date(FEED_NOW));
    // Laid 2024-02-05, window day 21–24: 26 Feb to 28 Feb… and 29 Feb (leap year), so DTEND is 1 March.
    const sac = await createSac(t.app, owner, projectId, { layDate: '2024-02-05', pullFromDay: 21, pullToDay: 24 });
    const feed = await feedOf(owner);
    expect(feed.path).toMatch(/^\/api\/calendar\/[A-Za-z0-9_-]{43}\.ics$/);
    const res = await http().get(feed.path).expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/calendar/);
    expect(res.text).toContain(`DTSTART;VALUE=DATE:20240226`);
    expect(res.text).toContain(`DTEND;VALUE=DATE:20240301`);
    const events = parse(res.text);
    const pull = events.find((e) => e.uid === `pull-window-${sac.id}@broodsilk`)!;
    expect(pull).toMatchObject({ start: '2024-02-26', end: '2024-03-01', isDate: true, summary: 'Pull window: Feed pair' });
    // luxon as the reference: the last day of the window is the day before DTEND.
    expect(DateTime.fromISO(pull.end).minus({ days: 1 }).toISODate()).toBe(sac.pullWindow.closesOn);
    expect(DateTime.fromISO('2024-02-05').plus({ days: 21 }).toISODate()).toBe(pull.start);

    // G. pulchripes has no stage figures of its own: its group's. Prelarvae day 20–42 (brachypelma-smithi.de day 20;
    // arachnoworld.de day 25–42; docs/trade-facts.md check values 1 and 2), young day 56–84 (Grammostola 8–12 weeks, from memory, §2).
    const legs = events.find((e) => e.uid === `eggs-with-legs-${sac.id}@broodsilk`)!;
    expect(legs).toMatchObject({
      start: DateTime.fromISO('2024-02-05').plus({ days: 20 }).toISODate(),
      end: DateTime.fromISO('2024-02-05').plus({ days: 43 }).toISODate(),
      isDate: true,
    });
    expect(legs.description).toMatch(/A guide only, species differ: the figure for its group; source: arachnoworld\.de/);
    const young = events.find((e) => e.uid === `free-living-${sac.id}@broodsilk`)!;
    expect([young.start, young.end]).toEqual([56, 85].map((d) => DateTime.fromISO('2024-02-05').plus({ days: d }).toISODate())); // day 56 to day 84 inclusive
    expect(young.description).toMatch(/the figure for this species; source: from memory/);

    // The male matured 30 days before the feed's now; his later clock changes are in the feed, one day each.
    const clock = events.filter((e) => e.uid.startsWith('male-clock-'));
    expect(clock.map((e) => e.uid.split('-').at(-1)!.replace('@broodsilk', ''))).toEqual(expect.arrayContaining(['prime', 'late']));
    for (const e of clock) expect(DateTime.fromISO(e.end).diff(DateTime.fromISO(e.start), 'days').days).toBe(1);

    // Stable UIDs: a second fetch gives the same set.
    expect(
      parse((await http().get(feed.path).expect(200)).text)
        .map((e) => e.uid)
        .sort(),
    ).toEqual(events.map((e) => e.uid).sort());
    // A partner's own feed shows the project's sac, but not the owner's male.
    const theirs = parse(
      (
        await http()
          .get((await feedOf(partner)).path)
          .expect(200)
      ).text,
    );
    expect(theirs.map((e) => e.uid)).toContain(`pull-window-${sac.id}@broodsilk`);
    expect(theirs.some((e) => e.uid.startsWith('male-clock-'))).toBe(false);
  });

  it('takes the stage days from the species: Theraphosa blondi young day 42–56 (Wikipedia mirror; thezooreviewer 2024; docs/trade-facts.md check value 4)', async () => {
    vi.spyOn(t.app.get(Clock), 'now').mockReturnValue(new Date(FEED_NOW));
    const blondi = (await createProject(t.app, t.orm, owner, { title: 'Goliath pair', maleAgeDays: 30, species: 'Theraphosa blondi' })).id;
    const sac = await createSac(t.app, owner, blondi, { layDate: '2024-02-05' });
    const events = parse(
      (
        await http()
          .get((await feedOf(owner)).path)
          .expect(200)
      ).text,
    );
    const young = events.find((e) => e.uid === `free-living-${sac.id}@broodsilk`)!;
    // luxon as the reference for the day arithmetic; DTEND is the day after the last day (RFC 5545 §3.6.1)
    expect([young.start, young.end]).toEqual([42, 57].map((d) => DateTime.fromISO('2024-02-05').plus({ days: d }).toISODate()));
    expect(young.description).toMatch(/the figure for this species; source: Wikipedia, "Goliath birdeater"/);
  });

  it('the same URL comes back until it is rotated; rotating kills the old URL (404)', async () => {
    const first = await feedOf(owner);
    expect((await feedOf(owner)).path).toBe(first.path);
    const rotated = (await http().post('/api/calendar/feed/rotate').set('Authorization', owner.bearer).expect(200)).body as CalendarFeedResponse;
    expect(rotated.path).not.toBe(first.path);
    const old = await http().get(first.path).expect(404);
    expect(old.headers['content-type']).toMatch(/json/);
    expect(old.body.message).toMatch(/no such calendar feed/);
    await http().get(rotated.path).expect(200);
    expect((await feedOf(owner)).path).toBe(rotated.path);
    await http().get('/api/calendar/not-a-real-token.ics').expect(404);
  });

  it('the feed URL routes need a session; the .ics route does not', async () => {
    await http().get('/api/calendar/feed').expect(401);
    await http().post('/api/calendar/feed/rotate').expect(401);
  });
});
