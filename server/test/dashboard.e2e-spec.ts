import request from 'supertest';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { DateTime } from 'luxon';
import { DASHBOARD_MATURE_MALES, type DashboardResponse } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { projectWithRoles } from './support/projects';
import { createSac } from './support/sacs';
import { Clock } from '../src/common/clock';

let t: TestApp;
let owner: SignedIn;
let partner: SignedIn;
let caretaker: SignedIn;
let loner: SignedIn;
let projectId: string;
const http = () => request(t.app.getHttpServer());
const NOW = '2026-01-05T15:00:00Z';
// Day arithmetic for the expectations comes from luxon, not from the code under test.
const daysAgo = (n: number) => DateTime.fromISO(NOW, { zone: 'utc' }).minus({ days: n }).toISODate()!;
const dashboard = async (who: SignedIn): Promise<DashboardResponse> => (await http().get('/api/dashboard').set('Authorization', who.bearer).expect(200)).body;

beforeAll(async () => {
  t = await createTestApp();
  ({ projectId, owner, partner, caretaker } = await projectWithRoles(t.app, t.orm, 'Dashboard pair', ['Olwen', 'Priya', 'Corin']));
  loner = await registerKeeper(t.app, 'Lone');
});
afterEach(() => vi.restoreAllMocks());
afterAll(async () => {
  await t.close();
});

describe('dashboard', () => {
  it('shows a sac laid 22 days ago with its window open, a window opening today, and a due roll, to the right people', async () => {
    vi.spyOn(t.app.get(Clock), 'now').mockReturnValue(new Date(NOW));
    const open22 = await createSac(t.app, owner, projectId, { layDate: daysAgo(22), pullFromDay: 21, pullToDay: 45 });
    const opensToday = await createSac(t.app, owner, projectId, { layDate: daysAgo(21), pullFromDay: 21, pullToDay: 45 });
    const farOff = await createSac(t.app, owner, projectId, { layDate: daysAgo(1), pullFromDay: 40, pullToDay: 50 });
    const pulled = await createSac(t.app, owner, projectId, { layDate: daysAgo(26), pulledAt: '2026-01-03T09:00:00Z' });
    await http().post(`/api/sacs/${pulled.id}/log`).set('Authorization', caretaker.bearer).send({ kind: 'roll', at: '2026-01-05T01:30:00Z' }).expect(201); // 13.5 h ago

    const mine = await dashboard(owner);
    expect(mine.today).toBe('2026-01-05');
    const up = mine.upcomingPullWindows.map((x) => x.sac.id);
    expect(up).toEqual(expect.arrayContaining([open22.id, opensToday.id]));
    expect(up).not.toContain(farOff.id); // opens on day 40, beyond 30 days
    expect(up).not.toContain(pulled.id);
    const s22 = mine.upcomingPullWindows.find((x) => x.sac.id === open22.id)!;
    expect(s22).toMatchObject({ projectTitle: 'Dashboard pair', myRole: 'owner', sac: { dayNumber: 22, pullWindow: { state: 'open', opensOn: daysAgo(1) } } });
    // Every window open today is a to-do, not only the one opening today.
    expect(mine.dueToday.pullWindows.map((x) => [x.sac.id, x.event])).toEqual(
      expect.arrayContaining([
        [opensToday.id, 'opens-today'],
        [open22.id, 'open'],
      ]),
    );
    expect(mine.dueToday.pullWindows.map((x) => x.sac.id)).not.toContain(farOff.id);
    expect(mine.dueToday.rolls.map((x) => [x.sac.id, x.sac.roll!.status])).toEqual([[pulled.id, 'due']]);
    expect(mine.openProjects.find((p) => p.id === projectId)!.stage.stage).toBe('in-incubator');
    // The caretaker's roll is "recent activity from others" for the owner, not for the caretaker.
    expect(mine.recentActivity.map((e) => e.kind)).toContain('care.roll');
    expect((await dashboard(caretaker)).recentActivity.map((e) => e.kind)).not.toContain('care.roll');

    const care = await dashboard(caretaker);
    expect(care.dueToday.rolls.map((x) => x.sac.id)).toEqual([pulled.id]);
    // A partner sees the project and its windows but has nothing to do today.
    const part = await dashboard(partner);
    expect(part.openProjects.map((p) => p.id)).toContain(projectId);
    expect(part.dueToday).toEqual({ rolls: [], pullWindows: [], readings: [], termsToAccept: [], handOversToConfirm: [], payments: [] });
    expect(part.upcomingPullWindows.map((x) => x.sac.id)).toContain(open22.id);

    const alone = await dashboard(loner);
    expect(alone).toMatchObject({
      openProjects: [],
      openProjectCount: 0,
      upcomingPullWindows: [],
      dueToday: { rolls: [], pullWindows: [], readings: [], termsToAccept: [], handOversToConfirm: [], payments: [] },
      recentActivity: [],
    });
  });

  it('lists the user’s own mature males by clock urgency', async () => {
    const res = await dashboard(owner);
    expect(res.matureMales.length).toBeGreaterThan(0);
    expect(res.matureMales.every((m) => m.clock.daysSinceMaturing >= 0)).toBe(true);
    const urgency = res.matureMales.map((m) => m.clock.daysUntilPastTypical);
    expect(urgency).toEqual([...urgency].sort((a, b) => a - b));
    expect((await dashboard(partner)).matureMales).toEqual([]);
    // The card lists the most urgent few and counts them all; the collection's list has every one.
    const all = await http().get('/api/animals/males/clock').set('Authorization', owner.bearer).expect(200);
    expect(res.matureMaleCount).toBe(all.body.length);
    expect(res.matureMales).toEqual(all.body.slice(0, DASHBOARD_MATURE_MALES));
  });

  it('needs a session (401)', async () => {
    await http().get('/api/dashboard').expect(401);
  });
});
