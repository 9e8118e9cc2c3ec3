import request from 'supertest';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import type { BroodCountsResponse, OpeningResponse } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import type { SignedIn } from './support/users';
import { projectWithRoles } from './support/projects';
import { createSac } from './support/sacs';
import { Clock } from '../src/common/clock';
import { BroodService } from '../src/sacs/brood.service';

let t: TestApp;
let owner: SignedIn;
let partner: SignedIn;
let caretaker: SignedIn;
let projectId: string;
const http = () => request(t.app.getHttpServer());
const NOW = '2025-10-20T18:00:00Z';
const pin = () => vi.spyOn(t.app.get(Clock), 'now').mockReturnValue(new Date(NOW));
const open = (who: SignedIn, sacId: string, body: object) => http().post(`/api/sacs/${sacId}/opening`).set('Authorization', who.bearer).send(body);
const count = (who: SignedIn, sacId: string, body: object) => http().post(`/api/sacs/${sacId}/counts`).set('Authorization', who.bearer).send(body);
const counts = async (sacId: string) =>
  (await http().get(`/api/sacs/${sacId}/counts`).set('Authorization', partner.bearer).expect(200)).body as BroodCountsResponse;
const activity = async () =>
  (await http().get(`/api/projects/${projectId}/activity`).set('Authorization', partner.bearer).expect(200)).body as { kind: string; summary: string }[];
const OPENING = {
  openedAt: '2025-10-18T09:00:00Z',
  healthyEggs: 20,
  eggsWithLegs: 200,
  nymphs: 0,
  darkEggs: 5,
  spoiledEggs: 0,
  keptBack: 0,
  // Fewer eggs than Grammostola pulchripes usually lays (400–1000, docs/trade-facts.md §6): acknowledged.
  acknowledgedWarnings: ['eggs-outside-species-range'],
  warningReason: 'A small first sac.',
};
const opened = async () => {
  const sac = await createSac(t.app, owner, projectId, { layDate: '2025-09-10', pulledAt: '2025-10-05T10:00:00Z' });
  await open(owner, sac.id, OPENING).expect(201);
  return sac.id;
};

beforeAll(async () => {
  t = await createTestApp();
  ({ projectId, owner, partner, caretaker } = await projectWithRoles(t.app, t.orm, 'Counting', ['Ilse', 'Joon', 'Kamal']));
});
afterEach(() => vi.restoreAllMocks());
afterAll(async () => {
  await t.close();
});

// common practice: young only leave a brood between counts (deaths, escapes, hand-overs); none appear.
describe('a count may not exceed the last exact count', () => {
  it('refuses 500 when 220 were alive at the last count, naming both numbers and the date, and writes nothing', async () => {
    pin();
    const sacId = await opened();
    await count(caretaker, sacId, { at: '2025-10-19T09:00:00Z', stage: 'first-instar', alive: 220 }).expect(201);
    const res = await count(caretaker, sacId, { stage: 'first-instar', alive: 500 }).expect(400);
    expect(res.body.message).toBe(
      '220 were alive at the last count on 2025-10-19; 500 is more than that. Young are not added between counts: correct the earlier count if it was wrong.',
    );
    expect(res.body.details).toEqual([{ field: 'alive', message: res.body.message }]);
    expect((await counts(sacId)).current).toBe(220);
    expect(await t.app.get(BroodService).currentCount(sacId)).toBe(220);
    // The opening's 220 viable young bound the first count as well.
    const sac2 = await opened();
    await count(owner, sac2, { stage: 'first-instar', alive: 221 }).expect(400);
    await count(owner, sac2, { stage: 'first-instar', alive: 220 }).expect(201);
  });

  it('a count dated between two counts is measured against the one before it', async () => {
    pin();
    const sacId = await opened();
    await count(owner, sacId, { at: '2025-10-20T09:00:00Z', stage: 'first-instar', alive: 150 }).expect(201);
    // Entered late, dated before the 150: the opening's 220 is the count before it.
    await count(owner, sacId, { at: '2025-10-19T09:00:00Z', stage: 'first-instar', alive: 200 }).expect(201);
    await count(owner, sacId, { at: '2025-10-20T12:00:00Z', stage: 'first-instar', alive: 151 }).expect(400);
  });

  it('after an estimate a higher count warns (422, nothing written) and is kept with its reason once acknowledged', async () => {
    pin();
    const sacId = await opened();
    await count(owner, sacId, { at: '2025-10-19T09:00:00Z', stage: 'first-instar', alive: 150, estimated: true }).expect(201);
    const warned = await count(owner, sacId, { stage: 'first-instar', alive: 180 }).expect(422);
    expect(warned.body.details).toEqual([
      {
        field: 'acknowledgedWarnings',
        code: 'count-above-estimate',
        message: 'About 150 were alive by the estimate on 2025-10-19; 180 is more than that. Save it if the estimate was low.',
      },
    ]);
    expect((await counts(sacId)).current).toBe(150);
    // The same warning to a German reader (the client sends its language as Accept-Language).
    const german = await count(owner, sacId, { stage: 'first-instar', alive: 180 }).set('Accept-Language', 'de').expect(422);
    expect(german.body.details[0]).toMatchObject({
      code: 'count-above-estimate',
      message: expect.stringContaining('Laut Schätzung vom 2025-10-19 lebten etwa 150'),
    });
    // Acknowledged without a reason: still refused.
    await count(owner, sacId, { stage: 'first-instar', alive: 180, acknowledgedWarnings: ['count-above-estimate'] }).expect(400);
    const saved = await count(owner, sacId, {
      stage: 'first-instar',
      alive: 180,
      acknowledgedWarnings: ['count-above-estimate'],
      warningReason: 'Counted one by one into cups',
    }).expect(201);
    expect(saved.body).toMatchObject({ alive: 180, estimated: false, warningReason: 'Counted one by one into cups' });
    const list = await counts(sacId);
    expect(list.current).toBe(180);
    expect(list.counts.at(-1)!.warningReason).toBe('Counted one by one into cups');
    // The exact 180 now bounds the next count again.
    await count(owner, sacId, { stage: 'first-instar', alive: 181, acknowledgedWarnings: ['count-above-estimate'], warningReason: 'x' }).expect(400);
  });
});

describe('corrections', () => {
  it('a count is corrected by a new count with a reason: both stay visible, the old one struck, the current count and shares follow, partners are told', async () => {
    pin();
    const sacId = await opened();
    const wrong = (await count(caretaker, sacId, { at: '2025-10-19T09:00:00Z', stage: 'first-instar', alive: 120 }).expect(201)).body;
    await count(caretaker, sacId, { stage: 'first-instar', alive: 200, corrects: wrong.id }).expect(400); // no reason
    const fixed = (await count(caretaker, sacId, { stage: 'first-instar', alive: 210, corrects: wrong.id, reason: 'Miscounted one tray' }).expect(201)).body;
    expect(fixed).toMatchObject({ corrects: wrong.id, reason: 'Miscounted one tray', alive: 210, at: '2025-10-19T09:00:00.000Z' });
    const list = await counts(sacId);
    expect(list.current).toBe(210);
    expect(list.counts.map((c) => [c.alive, c.struckBy])).toEqual([
      [220, null],
      [120, fixed.id],
      [210, null],
    ]);
    expect(await t.app.get(BroodService).currentCount(sacId)).toBe(210);
    const again = await count(owner, sacId, { stage: 'first-instar', alive: 200, corrects: wrong.id, reason: 'twice' }).expect(409);
    expect(again.body.message).toMatch(/already been corrected/);
    // A correction obeys the count rule against the count before the corrected one (the opening's 220).
    await count(owner, sacId, { stage: 'first-instar', alive: 221, corrects: fixed.id, reason: 'too many' }).expect(400);
    const event = (await activity()).find((e) => e.kind === 'brood.corrected');
    expect(event?.summary).toBe(`Brood of the sac laid 2025-09-10: count of 120 corrected to 210 alive at 1st instar (Miscounted one tray).`);
  });

  it('the opening is corrected by a new opening with a reason; its first count follows, the old one stays struck', async () => {
    pin();
    const sacId = await opened();
    const first = (await http().get(`/api/sacs/${sacId}/opening`).set('Authorization', owner.bearer).expect(200)).body as OpeningResponse;
    await open(owner, sacId, { ...OPENING, healthyEggs: 10 }).expect(409);
    await open(owner, sacId, { ...OPENING, healthyEggs: 10, corrects: first.id }).expect(400); // no reason
    await open(partner, sacId, { ...OPENING, healthyEggs: 10, corrects: first.id, reason: 'Two trays counted twice' }).expect(403);
    const res = await open(owner, sacId, { ...OPENING, openedAt: undefined, healthyEggs: 10, corrects: first.id, reason: 'Two trays counted twice' }).expect(
      201,
    );
    const o = res.body as OpeningResponse;
    expect(o).toMatchObject({ viable: 210, corrects: first.id, reason: 'Two trays counted twice', openedAt: '2025-10-18T09:00:00.000Z' });
    expect(o.struck.map((s) => [s.id, s.viable])).toEqual([[first.id, 220]]);
    const list = await counts(sacId);
    expect(list.current).toBe(210);
    expect(list.counts.map((c) => [c.source, c.alive, c.struckBy !== null])).toEqual([
      ['opening', 220, true],
      ['opening', 210, false],
    ]);
    await open(owner, sacId, { ...OPENING, corrects: first.id, reason: 'again' }).expect(409); // only the one in force
    await count(owner, sacId, { stage: 'first-instar', alive: 211 }).expect(400);
    expect((await activity()).some((e) => e.kind === 'sac.opening-corrected')).toBe(true);
  });
});
