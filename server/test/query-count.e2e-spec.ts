/**
 * Reads cost a fixed number of SQL statements however much the reader has: the statements each
 * read sends are counted on the driver (every query through the ORM's knex instance) for a keeper
 * with 2 projects and one with 40, and for a project with 1 sac and one with 5. An N+1 shows up as
 * a difference; nothing here is timed (speed is measured by `npm run bench`).
 */
import request from 'supertest';
import { DASHBOARD_OPEN_PROJECTS } from '@broodsilk/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { addMember, createProject } from './support/projects';
import { createSac } from './support/sacs';

let t: TestApp;
let statements = 0;
const http = () => request(t.app.getHttpServer());

interface Keeper {
  who: SignedIn;
  projectIds: string[];
  sacIds: string[];
}

/** A keeper with `projects` projects, each with a partner and `sacsEach` sacs. */
async function keeperWith(name: string, projects: number, sacsEach: number): Promise<Keeper> {
  const who = await registerKeeper(t.app, name);
  const partner = await registerKeeper(t.app, `${name} partner`);
  const out: Keeper = { who, projectIds: [], sacIds: [] };
  for (let i = 0; i < projects; i++) {
    const { id } = await createProject(t.app, t.orm, who, { title: `${name} ${i}` });
    await addMember(t.orm, id, partner, 'partner');
    out.projectIds.push(id);
    for (let s = 0; s < sacsEach; s++) out.sacIds.push((await createSac(t.app, who, id, { layDate: `2026-0${1 + s}-0${1 + (i % 9)}` })).id);
  }
  return out;
}

/** Statements one GET sends (after a warm-up call, so one-time work such as metadata is not counted). */
async function cost(who: SignedIn, path: string): Promise<number> {
  await http().get(path).set('Authorization', who.bearer).expect(200);
  statements = 0;
  await http().get(path).set('Authorization', who.bearer).expect(200);
  return statements;
}

let small: Keeper;
let big: Keeper;
let oneSac: Keeper;
let fiveSacs: Keeper;

// Background job workers (mail composing after a registration) share the app's connection pool;
// with them off, the counter sees only the statements of the request it measures.
const savedJobs = process.env.JOBS_ENABLED;
beforeAll(async () => {
  process.env.JOBS_ENABLED = 'false';
  t = await createTestApp();
  const knex = t.orm.em.getConnection().getKnex();
  knex.on('query', () => {
    statements += 1;
  });
  small = await keeperWith('Small', 2, 1);
  big = await keeperWith('Big', 40, 1);
  oneSac = await keeperWith('One sac', 1, 1);
  fiveSacs = await keeperWith('Five sacs', 1, 5);
}, 180_000);
afterAll(async () => {
  await t.close();
  if (savedJobs === undefined) delete process.env.JOBS_ENABLED;
  else process.env.JOBS_ENABLED = savedJobs;
});

describe('statements per read do not grow with the data', () => {
  it('counts statements at all (the counter is wired to the driver)', async () => {
    expect(await cost(small.who, '/api/dashboard')).toBeGreaterThan(0);
  });

  it('the dashboard lists the newest open projects and counts them all (the projects page has the rest)', async () => {
    const res = await http().get('/api/dashboard').set('Authorization', big.who.bearer).expect(200);
    expect(res.body.openProjectCount).toBe(40);
    expect(res.body.openProjects.map((p: { id: string }) => p.id)).toEqual(big.projectIds.slice().reverse().slice(0, DASHBOARD_OPEN_PROJECTS));
  });

  it.each(['/api/dashboard', '/api/projects'])('%s: 2 projects cost what 40 cost', async (path) => {
    expect(await cost(big.who, path)).toBe(await cost(small.who, path));
  });

  it.each([
    ['project page', (k: Keeper) => `/api/projects/${k.projectIds[0]}`],
    ['sacs of a project', (k: Keeper) => `/api/projects/${k.projectIds[0]}/sacs`],
    ['shares', (k: Keeper) => `/api/projects/${k.projectIds[0]}/shares`],
    ['balances', (k: Keeper) => `/api/projects/${k.projectIds[0]}/balances`],
    ['ledger entries', (k: Keeper) => `/api/projects/${k.projectIds[0]}/entries`],
  ])('%s: 1 sac costs what 5 cost', async (_name, path) => {
    expect(await cost(fiveSacs.who, path(fiveSacs))).toBe(await cost(oneSac.who, path(oneSac)));
  });

  it('a page of the care log costs the same for a sac with 2 entries as for one with 30, and the same far back as at the start', async () => {
    for (const [sacId, n] of [
      [small.sacIds[0], 2],
      [big.sacIds[0], 30],
    ] as const)
      for (let i = 0; i < n; i++)
        await http()
          .post(`/api/sacs/${sacId}/log`)
          .set('Authorization', (sacId === small.sacIds[0] ? small : big).who.bearer)
          .send({ kind: 'note', text: `note ${i}` })
          .expect(201);
    const first = (k: Keeper) => `/api/sacs/${k.sacIds[0]}/log?limit=1`;
    expect(await cost(big.who, first(big))).toBe(await cost(small.who, first(small)));
    const cursorOf = async (k: Keeper, query: string) =>
      ((await http().get(`/api/sacs/${k.sacIds[0]}/log?${query}`).set('Authorization', k.who.bearer).expect(200)).body as { nextCursor: string }).nextCursor;
    const deep = await cursorOf(big, 'limit=25');
    const shallow = await cursorOf(small, 'limit=1');
    expect(await cost(big.who, `/api/sacs/${big.sacIds[0]}/log?limit=2&after=${deep}`)).toBe(
      await cost(small.who, `/api/sacs/${small.sacIds[0]}/log?limit=2&after=${shallow}`),
    );
  });

  it('a note replans no reminder; a reading does (the planner reads only rolls, readings, stages and strikes)', async () => {
    const post = async (body: object) => {
      statements = 0;
      await http().post(`/api/sacs/${small.sacIds[0]}/log`).set('Authorization', small.who.bearer).send(body).expect(201);
      return statements;
    };
    await post({ kind: 'note', text: 'warm-up' });
    const note = await post({ kind: 'note', text: 'eggs look fine' });
    const reading = await post({ kind: 'temperature', temperature: { value: 26.5, unit: 'C' } });
    expect(note).toBeLessThan(reading);
  });

  it('a sac page costs the same in a project of 40 as in one of 2', async () => {
    expect(await cost(big.who, `/api/sacs/${big.sacIds[39]}`)).toBe(await cost(small.who, `/api/sacs/${small.sacIds[1]}`));
  });
});
