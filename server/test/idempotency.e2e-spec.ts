import request from 'supertest';
import { createHash } from 'node:crypto';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import type { CareLogEntryResponse, KeysetPage } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import type { SignedIn } from './support/users';
import { projectWithRoles } from './support/projects';
import { createSac } from './support/sacs';
import { Clock } from '../src/common/clock';

let t: TestApp;
let owner: SignedIn;
let caretaker: SignedIn;
let projectId: string;
const http = () => request(t.app.getHttpServer());
const NOW = '2025-09-15T12:00:00Z';
const pin = () => vi.spyOn(t.app.get(Clock), 'now').mockReturnValue(new Date(NOW));
const roll = (who: SignedIn, sacId: string, key: string | null, body: object = { kind: 'roll' }) => {
  const r = http().post(`/api/sacs/${sacId}/log`).set('Authorization', who.bearer);
  return (key ? r.set('Idempotency-Key', key) : r).send(body);
};
const rollsOf = async (sacId: string) =>
  ((await http().get(`/api/sacs/${sacId}/log`).set('Authorization', owner.bearer).expect(200)).body as KeysetPage<CareLogEntryResponse>).items.filter(
    (e) => e.kind === 'roll',
  );
const pulledSac = () => createSac(t.app, owner, projectId, { layDate: '2025-08-20', pulledAt: '2025-09-14T08:00:00Z' });
const keyRows = async (key: string) =>
  t.orm.em.getConnection().execute<{ status: number | null }[]>(`select status from idempotency_keys where key = ?`, [key]);

beforeAll(async () => {
  t = await createTestApp();
  ({ projectId, owner, caretaker } = await projectWithRoles(t.app, t.orm, 'Double taps', ['Rhea', 'Sami', 'Tove']));
});
afterEach(() => vi.restoreAllMocks());
afterAll(async () => {
  await t.close();
});

// The header and its semantics: IETF draft-ietf-httpapi-idempotency-key-header (a repeat with the
// same key gets the first answer; the same key with another payload is refused with 422).
describe('Idempotency-Key on button writes', () => {
  it('a double tap on "Rolled now" logs one roll; the repeat replays the first answer (status and body)', async () => {
    pin();
    const sac = await pulledSac();
    const first = await roll(caretaker, sac.id, 'roll-7f3a9c2e-0001').expect(201);
    const again = await roll(caretaker, sac.id, 'roll-7f3a9c2e-0001').expect(201);
    expect(again.body).toEqual(first.body);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(await rollsOf(sac.id)).toHaveLength(1);
    // Without the header, every request writes (the header is what marks a repeat).
    await roll(caretaker, sac.id, null).expect(201);
    expect(await rollsOf(sac.id)).toHaveLength(2);
  });

  it('two simultaneous requests with the same key write once and both get the same answer', async () => {
    pin();
    const sac = await pulledSac();
    const [a, b] = await Promise.all([roll(caretaker, sac.id, 'roll-concurrent-0002'), roll(caretaker, sac.id, 'roll-concurrent-0002')]);
    expect([a.status, b.status]).toEqual([201, 201]);
    expect(a.body.id).toBe(b.body.id);
    expect(await rollsOf(sac.id)).toHaveLength(1);
    expect(await keyRows('roll-concurrent-0002')).toEqual([{ status: 201 }]);
  });

  it('the same key with a different body or path is refused with 422 and writes nothing', async () => {
    pin();
    const sac = await pulledSac();
    await roll(caretaker, sac.id, 'reuse-key-0003').expect(201);
    const other = await roll(caretaker, sac.id, 'reuse-key-0003', { kind: 'note', text: 'Checked the eggs' }).expect(422);
    expect(other.body.message).toBe('This Idempotency-Key was already used for a different request. Send a new key for a new request.');
    const sac2 = await pulledSac();
    await roll(caretaker, sac2.id, 'reuse-key-0003').expect(422);
    expect(await rollsOf(sac2.id)).toHaveLength(0);
    // Keys are per user: another member may happen to send the same key.
    await roll(owner, sac.id, 'reuse-key-0003').expect(201);
    expect(await rollsOf(sac.id)).toHaveLength(2);
  });

  it('a refused write keeps no key, so the corrected request can use it; an expired key is forgotten', async () => {
    pin();
    const sac = await pulledSac();
    await roll(caretaker, sac.id, 'retry-key-0004', { kind: 'note' }).expect(400); // a note needs text
    expect(await keyRows('retry-key-0004')).toEqual([]);
    await roll(caretaker, sac.id, 'retry-key-0004', { kind: 'note', text: 'Eggs turning amber' }).expect(201);
    await roll(caretaker, sac.id, 'expiring-key-0005').expect(201);
    await t.orm.em.getConnection().execute(`update idempotency_keys set expires_at = now() - interval '1 minute' where key = 'expiring-key-0005'`);
    await roll(caretaker, sac.id, 'expiring-key-0005').expect(201);
    expect(await rollsOf(sac.id)).toHaveLength(2);
    expect(await keyRows('expiring-key-0005')).toEqual([{ status: 201 }]);
  });

  it('claims the key in the transaction of the write: when the answer cannot be stored, neither the key nor the write stays, and the retry writes once', async () => {
    pin();
    const sac = await pulledSac();
    const db = t.orm.em.getConnection();
    // A real failure from PostgreSQL after the write: storing any answer breaks a check constraint
    // (as a lost connection or a killed process would stop it). Before, the roll stayed behind the 500.
    await db.execute(`alter table idempotency_keys add constraint no_answers_yet check (status is null) not valid`);
    try {
      await roll(caretaker, sac.id, 'answer-lost-0006').expect(500);
    } finally {
      await db.execute(`alter table idempotency_keys drop constraint no_answers_yet`);
    }
    expect(await rollsOf(sac.id)).toHaveLength(0);
    expect(await keyRows('answer-lost-0006')).toEqual([]);
    const retry = await roll(caretaker, sac.id, 'answer-lost-0006').expect(201);
    expect(retry.headers['idempotent-replayed']).toBeUndefined();
    const again = await roll(caretaker, sac.id, 'answer-lost-0006').expect(201);
    expect(again.body).toEqual(retry.body);
    expect(await rollsOf(sac.id)).toHaveLength(1);
  });

  it('a repeat waits while another transaction holds the key, and writes once that transaction rolls back', async () => {
    pin();
    const sac = await pulledSac();
    const body = { kind: 'roll' };
    const path = `/api/sacs/${sac.id}/log`;
    const fingerprint = createHash('sha256')
      .update(`POST ${path}\n${JSON.stringify(body)}`)
      .digest('hex');
    // The first attempt, still running: its claim is written but not committed.
    const first = t.orm.em.fork();
    await first.begin();
    await first.execute(
      `insert into idempotency_keys (id, created_at, updated_at, user_id, key, method, path, fingerprint, expires_at)
       values (gen_random_uuid(), now(), now(), ?, 'held-key-0007', 'POST', ?, ?, now() + interval '1 hour')`,
      [caretaker.user.id, path, fingerprint],
    );
    let answered = false;
    const repeat = roll(caretaker, sac.id, 'held-key-0007', body).then((r) => ((answered = true), r));
    await new Promise((r) => setTimeout(r, 500));
    expect(answered).toBe(false);
    await first.rollback(); // the first attempt failed: nothing of it stays
    expect((await repeat).status).toBe(201);
    expect(await rollsOf(sac.id)).toHaveLength(1);
    expect(await keyRows('held-key-0007')).toEqual([{ status: 201 }]);
  });

  it('refuses a malformed key', async () => {
    pin();
    const sac = await pulledSac();
    const res = await roll(caretaker, sac.id, 'short').expect(400);
    expect(res.body.message).toMatch(/Idempotency-Key must be 8 to 255 visible characters/);
  });
});
