import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper } from './support/users';
import { addMember, createProject } from './support/projects';
import { registeredRoutes } from './support/route-list';
import { ACTORS, type Actor, type Expected, type MatrixFixture, type MatrixProject, type MatrixRow } from './support/role-matrix/matrix.types';

// One rows file per module; a new module adds `support/role-matrix/<module>.rows.ts` exporting `rows`.
const files = import.meta.glob<{ rows: MatrixRow[] }>('./support/role-matrix/*.rows.ts', { eager: true });
const ROWS = Object.values(files).flatMap((f) => f.rows);
/** Every route under these prefixes must have a row. */
const GUARDED_PREFIXES = ['/api/projects', '/api/sacs', '/api/invitations'];

const key = (method: string, path: string) => `${method} ${path}`;

let t: TestApp;
let fx: MatrixFixture;

beforeAll(async () => {
  t = await createTestApp();
  const users = {
    owner: await registerKeeper(t.app, 'Matrix Owner'),
    partner: await registerKeeper(t.app, 'Matrix Partner'),
    caretaker: await registerKeeper(t.app, 'Matrix Caretaker'),
    stranger: await registerKeeper(t.app, 'Matrix Stranger'),
  };
  const freshProject = async (): Promise<MatrixProject> => {
    const p = await createProject(t.app, t.orm, users.owner, { title: 'Matrix project' });
    return {
      id: p.id,
      memberIds: {
        owner: p.members[0].id,
        partner: await addMember(t.orm, p.id, users.partner, 'partner'),
        caretaker: await addMember(t.orm, p.id, users.caretaker, 'caretaker'),
      },
    };
  };
  fx = { app: t.app, orm: t.orm, users, project: await freshProject(), freshProject };
});
afterAll(async () => {
  await t.close();
});

function matches(status: number, expected: Expected): boolean {
  return expected === '2xx' ? status >= 200 && status < 300 : status === expected;
}

async function fire(row: MatrixRow, actor: Actor): Promise<{ status: number; body: unknown }> {
  const req = (await row.request?.(fx, actor)) ?? {};
  const params: Record<string, string> = { id: fx.project.id, projectId: fx.project.id, ...req.params };
  const url = row.path.replace(/:(\w+)/g, (_, name: string) => {
    if (!(name in params)) throw new Error(`${key(row.method, row.path)}: no value for :${name}; return it from the row's request()`);
    return encodeURIComponent(params[name]);
  });
  let call = request(t.app.getHttpServer())[row.method.toLowerCase() as 'get'](url);
  if (actor !== 'anonymous') call = call.set('Authorization', fx.users[actor].bearer);
  const res = req.body !== undefined ? await call.send(req.body) : await call;
  return { status: res.status, body: res.body };
}

describe('role matrix', () => {
  it('every route under the guarded prefixes has a row, and every row a route', () => {
    const routes = registeredRoutes(t.app).filter((r) => GUARDED_PREFIXES.some((p) => r.path === p || r.path.startsWith(`${p}/`)));
    const routeKeys = new Set(routes.map((r) => key(r.method, r.path)));
    const rowKeys = ROWS.map((r) => key(r.method, r.path));
    expect(routeKeys.size).toBeGreaterThan(0);
    expect([...routeKeys].filter((k) => !rowKeys.includes(k)).sort(), 'routes without a row in test/support/role-matrix/*.rows.ts').toEqual([]);
    expect(
      rowKeys.filter((k) => !routeKeys.has(k)),
      'rows for routes that do not exist',
    ).toEqual([]);
    expect(
      rowKeys.filter((k, i) => rowKeys.indexOf(k) !== i),
      'routes with two rows',
    ).toEqual([]);
  });

  describe.each(ROWS.map((r) => [key(r.method, r.path), r] as const))('%s', (_name, row) => {
    it.each([...ACTORS])('as %s', async (actor) => {
      const { status, body } = await fire(row, actor);
      expect(matches(status, row.expect[actor]), `${actor}: expected ${row.expect[actor]}, got ${status} ${JSON.stringify(body)}`).toBe(true);
    });
  });
});
