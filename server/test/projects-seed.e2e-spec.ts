import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ProjectResponse, ProjectSummary, TermsListResponse } from '@broodsilk/shared';
import { seedDemo } from '../src/seed/demo-seed';
import { seedCollection } from '../src/seed/collection.seeder';
import { DEMO_PROJECTS, seedProjects } from '../src/seed/projects.seeder';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../src/seed/demo-accounts';
import { createTestApp, type TestApp } from './support/test-app';
import { login, type SignedIn } from './support/users';

let t: TestApp;
let mira: SignedIn;
let tomasz: SignedIn;
let ines: SignedIn;
let list: ProjectSummary[];
const http = () => request(t.app.getHttpServer());
const account = (key: string) => DEMO_ACCOUNTS.find((a) => a.key === key)!.email;
const byTitle = (title: string) => list.find((p) => p.title === title)!;

beforeAll(async () => {
  t = await createTestApp();
  expect(await seedDemo(t.orm.em.fork(), [seedCollection, seedProjects])).toBe(true);
  mira = await login(t.app, account('keeper'), DEMO_PASSWORD);
  tomasz = await login(t.app, account('partner'), DEMO_PASSWORD);
  ines = await login(t.app, account('caretaker'), DEMO_PASSWORD);
  list = (await http().get('/api/projects').set('Authorization', mira.bearer).expect(200)).body;
});
afterAll(async () => {
  await t.close();
});

describe('demo projects', () => {
  it('cover planned, waiting for a sac and ended early (female molted), as derived from their events', () => {
    expect(list).toHaveLength(Object.keys(DEMO_PROJECTS).length);
    expect(byTitle(DEMO_PROJECTS.metallica).stage).toEqual({ stage: 'planned' });
    expect(byTitle(DEMO_PROJECTS.regalisLoan).stage).toEqual({ stage: 'waiting-for-sac' });
    expect(byTitle(DEMO_PROJECTS.vagansMolted).stage).toEqual({ stage: 'ended-early', reason: 'female-molted' });
    expect(byTitle(DEMO_PROJECTS.vagansSac).stage).toEqual({ stage: 'waiting-for-sac' });
  });

  it('the regalis loan has terms v1 in force (Mira 2 : Tomasz 1) and v2 proposed, awaiting Tomasz', async () => {
    const id = byTitle(DEMO_PROJECTS.regalisLoan).id;
    const terms = (await http().get(`/api/projects/${id}/terms`).set('Authorization', tomasz.bearer).expect(200)).body as TermsListResponse;
    expect(terms.inForce).toBe(1);
    expect(terms.versions.map((v) => [v.number, v.status])).toEqual([
      [2, 'proposed'],
      [1, 'in-force'],
    ]);
    expect(terms.versions[1].lines.map((l) => [l.memberName, l.weight, l.share])).toEqual([
      ['Mira Okonkwo', 2, '2/3'],
      ['Tomasz Wierzba', 1, '1/3'],
    ]);
    expect(terms.versions[0].awaiting).toEqual([expect.objectContaining({ name: 'Tomasz Wierzba' })]);
    await http().get(`/api/projects/${id}/terms`).set('Authorization', ines.bearer).expect(403);
    const detail = (await http().get(`/api/projects/${id}`).set('Authorization', ines.bearer).expect(200)).body as ProjectResponse;
    expect(detail.maleAnimal).toMatchObject({ label: 'MO-030', custody: 'loan-in', owner: { name: 'Tomasz Wierzba' } });
  });

  it('the outside party’s acceptance was recorded by Mira on their behalf, and the planned project warns about the male', async () => {
    const id = byTitle(DEMO_PROJECTS.hamoriiIncubator).id;
    const terms = (await http().get(`/api/projects/${id}/terms`).set('Authorization', mira.bearer).expect(200)).body as TermsListResponse;
    expect(terms.versions[0]).toMatchObject({ status: 'in-force' });
    expect(terms.versions[0].acceptances.find((a) => a.memberName === 'Jonas Feld')).toMatchObject({ onBehalf: true, recordedBy: { name: 'Mira Okonkwo' } });
    const planned = (
      await http()
        .get(`/api/projects/${byTitle(DEMO_PROJECTS.metallica).id}`)
        .set('Authorization', mira.bearer)
        .expect(200)
    ).body as ProjectResponse;
    expect(planned.warnings.map((w) => w.code)).toContain('no-pairing-male-late');
  });

  it('Tomasz sees only the projects he is in, as partner', async () => {
    const his = (await http().get('/api/projects').set('Authorization', tomasz.bearer).expect(200)).body as ProjectSummary[];
    expect(his.map((p) => [p.title, p.myRole]).sort()).toEqual(
      [
        [DEMO_PROJECTS.regalisLoan, 'partner'],
        [DEMO_PROJECTS.versicolorBrood, 'partner'],
      ].sort(),
    );
  });
});
