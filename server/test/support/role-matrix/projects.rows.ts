import request from 'supertest';
import { todayIn, addDays } from '@broodsilk/shared';
import { createAnimal, speciesId } from '../fixtures/collection';
import { ProjectMember } from '../../../src/projects/project-member.entity';
import {
  ANY_MEMBER,
  OWNER_AND_PARTNER,
  OWNER_ONLY,
  type Actor,
  type MatrixFixture,
  type MatrixProject,
  type MatrixRequest,
  type MatrixRow,
} from './matrix.types';

let n = 0;
const unique = () => `${Date.now()}-${(n += 1)}`;

/** An outside party (no account) straight in the database, so every actor gets a real id to aim at. */
async function outsideParty(fx: MatrixFixture, projectId: string): Promise<string> {
  const em = fx.orm.em.fork();
  const m = em.create(ProjectMember, { project: projectId, user: null, role: 'partner', name: `Outside ${unique()}`, email: null });
  await em.flush();
  return m.id;
}

/** Proposes terms v1 on a fresh project with an outside partner; returns the project and that party. */
async function projectWithProposedTerms(fx: MatrixFixture): Promise<{ project: MatrixProject; outside: string }> {
  const project = await fx.freshProject();
  const outside = await outsideParty(fx, project.id);
  const res = await request(fx.app.getHttpServer())
    .post(`/api/projects/${project.id}/terms`)
    .set('Authorization', fx.users.owner.bearer)
    .send({
      lines: [
        { memberId: project.memberIds.owner, weight: 2, pickOrder: 1 },
        { memberId: project.memberIds.partner, weight: 1, pickOrder: 2 },
        { memberId: outside, weight: 1, pickOrder: 3 },
      ],
      pricePerSpiderlingMinor: 1200,
      currency: 'EUR',
      failureClause: 'nothing-owed',
      shippingPaidBy: 'split',
    });
  if (res.status !== 201) throw new Error(`propose terms answered ${res.status}: ${JSON.stringify(res.body)}`);
  return { project, outside };
}

const signedIn = (a: Actor) => (a === 'anonymous' ? null : a);

export const rows: MatrixRow[] = [
  { method: 'GET', path: '/api/projects', expect: { anonymous: 401, stranger: '2xx', caretaker: '2xx', partner: '2xx', owner: '2xx' } },
  {
    method: 'POST',
    path: '/api/projects',
    expect: { anonymous: 401, stranger: '2xx', caretaker: '2xx', partner: '2xx', owner: '2xx' },
    // Any keeper may start a project with animals of their own.
    request: async (fx, actor) => {
      const who = signedIn(actor);
      if (!who) return { body: {} };
      const species = await speciesId(fx.orm, 'Grammostola pulchripes');
      const female = await createAnimal(fx.app, fx.users[who], { speciesId: species, label: `RM-F-${unique()}`, sex: 'female' });
      const male = await createAnimal(fx.app, fx.users[who], {
        speciesId: species,
        label: `RM-M-${unique()}`,
        sex: 'male',
        maturity: 'mature',
        maturedOn: addDays(todayIn('UTC', new Date()), -40),
      });
      return { body: { title: `Matrix ${actor}`, femaleId: female.id, maleId: male.id } };
    },
  },
  { method: 'GET', path: '/api/projects/:id', expect: ANY_MEMBER },
  { method: 'PATCH', path: '/api/projects/:id', expect: OWNER_ONLY, request: () => ({ body: { notes: 'Changed by the matrix' } }) },
  {
    method: 'POST',
    path: '/api/projects/:id/end',
    expect: OWNER_ONLY,
    request: async (fx, actor): Promise<MatrixRequest> => ({
      params: actor === 'owner' ? { id: (await fx.freshProject()).id } : {},
      body: { reason: 'no-sac' },
    }),
  },
  {
    method: 'POST',
    path: '/api/projects/:id/close',
    expect: OWNER_ONLY,
    request: async (fx, actor): Promise<MatrixRequest> => ({ params: actor === 'owner' ? { id: (await fx.freshProject()).id } : {} }),
  },
  {
    method: 'POST',
    path: '/api/projects/:id/reopen',
    expect: OWNER_ONLY,
    // The owner reopens a fresh project it has just ended; the others are refused before the state is looked at.
    request: async (fx, actor): Promise<MatrixRequest> => {
      if (actor !== 'owner') return {};
      const { id } = await fx.freshProject();
      const res = await request(fx.app.getHttpServer()).post(`/api/projects/${id}/end`).set('Authorization', fx.users.owner.bearer).send({ reason: 'no-sac' });
      if (res.status !== 200) throw new Error(`end answered ${res.status}: ${JSON.stringify(res.body)}`);
      return { params: { id } };
    },
  },
  { method: 'GET', path: '/api/projects/:projectId/members', expect: ANY_MEMBER },
  { method: 'POST', path: '/api/projects/:projectId/members', expect: OWNER_ONLY, request: () => ({ body: { name: `Party ${unique()}`, role: 'partner' } }) },
  {
    method: 'DELETE',
    path: '/api/projects/:projectId/members/:memberId',
    expect: OWNER_ONLY,
    request: async (fx) => ({ params: { memberId: await outsideParty(fx, fx.project.id) } }),
  },
  { method: 'GET', path: '/api/projects/:projectId/terms', expect: OWNER_AND_PARTNER },
  {
    method: 'POST',
    path: '/api/projects/:projectId/terms',
    expect: OWNER_ONLY,
    // The owner's call goes to a fresh project: other rows add parties to the shared one, and every party needs a line.
    request: async (fx, actor) => {
      const project = actor === 'owner' ? await fx.freshProject() : fx.project;
      return {
        params: { projectId: project.id },
        body: {
          lines: [
            { memberId: project.memberIds.owner, weight: 2, pickOrder: 1 },
            { memberId: project.memberIds.partner, weight: 1, pickOrder: 2 },
          ],
          pricePerSpiderlingMinor: 1000,
          currency: 'EUR',
          failureClause: 'carries-over',
          shippingPaidBy: 'recipient',
        },
      };
    },
  },
  {
    method: 'POST',
    path: '/api/projects/:projectId/terms/:version/accept',
    expect: OWNER_AND_PARTNER,
    // The partner accepts for themselves; the owner records the outside party's acceptance.
    request: async (fx, actor): Promise<MatrixRequest> => {
      if (actor !== 'owner' && actor !== 'partner') return { params: { version: '1' }, body: {} };
      const { project, outside } = await projectWithProposedTerms(fx);
      return { params: { projectId: project.id, version: '1' }, body: actor === 'owner' ? { memberId: outside, note: 'Agreed in person' } : {} };
    },
  },
  { method: 'GET', path: '/api/projects/:projectId/pairings', expect: ANY_MEMBER },
  {
    method: 'POST',
    path: '/api/projects/:projectId/pairings',
    expect: OWNER_ONLY,
    request: () => ({ body: { startedAt: new Date(Date.now() - 3_600_000).toISOString(), durationMinutes: 20, outcome: 'interest-only' } }),
  },
  { method: 'GET', path: '/api/projects/:projectId/activity', expect: ANY_MEMBER },
];
