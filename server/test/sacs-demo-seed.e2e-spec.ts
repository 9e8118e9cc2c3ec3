import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { dayNumber, todayIn, type DashboardResponse, type ProjectSummary, type SacResponse, type SharesResponse, type KeysetPage } from '@broodsilk/shared';
import { seedDemo } from '../src/seed/demo-seed';
import { seedCollection } from '../src/seed/collection.seeder';
import { DEMO_PROJECTS, seedProjects } from '../src/seed/projects.seeder';
import { seedSacs } from '../src/seed/sacs.seeder';
import { MOTHER_KEPT_TITLE, seedMotherKeptBrood } from '../src/seed/mother-kept-brood.seeder';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../src/seed/demo-accounts';
import { createTestApp, type TestApp } from './support/test-app';
import { login, type SignedIn } from './support/users';

let t: TestApp;
let mira: SignedIn;
let ines: SignedIn;
let list: ProjectSummary[];
const http = () => request(t.app.getHttpServer());
const account = (key: string) => DEMO_ACCOUNTS.find((a) => a.key === key)!.email;
const byTitle = (title: string) => list.find((p) => p.title === title)!;
const sacsOf = async (title: string): Promise<SacResponse[]> =>
  (
    await http()
      .get(`/api/projects/${byTitle(title).id}/sacs`)
      .set('Authorization', mira.bearer)
      .expect(200)
  ).body;

beforeAll(async () => {
  t = await createTestApp();
  expect(await seedDemo(t.orm.em.fork(), [seedCollection, seedProjects, seedSacs, seedMotherKeptBrood])).toBe(true);
  mira = await login(t.app, account('keeper'), DEMO_PASSWORD);
  ines = await login(t.app, account('caretaker'), DEMO_PASSWORD);
  list = (await http().get('/api/projects').set('Authorization', mira.bearer).expect(200)).body;
});
afterAll(async () => {
  await t.close();
});

describe('demo sacs', () => {
  it('include a sac left with the mother, counted at emergence, whose shares follow from that count', async () => {
    const [m] = await sacsOf(MOTHER_KEPT_TITLE);
    expect(m).toMatchObject({ leftWithMother: true, pulled: false, outcome: 'emerged', opened: true, currentCount: 138, roll: null });
    const shares = (
      await http()
        .get(`/api/projects/${byTitle(MOTHER_KEPT_TITLE).id}/shares`)
        .set('Authorization', mira.bearer)
        .expect(200)
    ).body as SharesResponse;
    // Weights 2 : 1 of 138 young: 92 and 46 (138 × 2/3 and 138 × 1/3, exact).
    expect(shares.totals.map((p) => [p.name, p.count])).toEqual([
      ['Mira Okonkwo', 92],
      ['Tomasz Wierzba', 46],
    ]);
  });

  it('put three projects in the stages sac laid, in incubator and brood', async () => {
    expect(byTitle(DEMO_PROJECTS.vagansSac).stage.stage).toBe('sac-laid');
    expect(byTitle(DEMO_PROJECTS.hamoriiIncubator).stage.stage).toBe('in-incubator');
    expect(byTitle(DEMO_PROJECTS.versicolorBrood).stage.stage).toBe('brood');
    const [v] = await sacsOf(DEMO_PROJECTS.vagansSac);
    expect(v).toMatchObject({ dayNumber: 12, pulled: false, roll: null });
    const [b] = await sacsOf(DEMO_PROJECTS.versicolorBrood);
    expect(b).toMatchObject({ dayNumber: 70, opened: true, currentCount: 97, broodStage: 'second-instar', roll: null });
  });

  it('leave a roll due on the dashboard for the owner and the caretaker, with readings in the log', async () => {
    const [h] = await sacsOf(DEMO_PROJECTS.hamoriiIncubator);
    // Laid 26 days ago in Mira's zone (Europe/Berlin); Ines (Europe/Lisbon) counts from her own
    // calendar date, which is a day behind in the hour before Berlin's midnight.
    expect(dayNumber(h.layDate, todayIn(mira.user.timeZone, new Date()))).toBe(26);
    for (const who of [mira, ines]) {
      const d = (await http().get('/api/dashboard').set('Authorization', who.bearer).expect(200)).body as DashboardResponse;
      const expectedDay = dayNumber(h.layDate, todayIn(who.user.timeZone, new Date()));
      expect(d.dueToday.rolls.map((r) => [r.projectTitle, r.sac.dayNumber, r.sac.roll!.status])).toEqual([
        [DEMO_PROJECTS.hamoriiIncubator, expectedDay, 'due'],
      ]);
    }
    const log = (
      (await http().get(`/api/sacs/${h.id}/log`).set('Authorization', ines.bearer).expect(200)).body as KeysetPage<{ kind: string; author: { name: string } }>
    ).items;
    expect(new Set(log.map((e) => e.kind))).toEqual(new Set(['roll', 'temperature', 'humidity', 'note']));
    expect(log.find((e) => e.kind === 'roll')!.author.name).toBe('Ines Carvalho');
  });
});
