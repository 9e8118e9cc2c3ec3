/** The accounts demo: three parties with money owed both ways on the shared brood, and an older project settled. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BalancesResponse, LedgerEntryResponse, NotificationPage, ProjectSummary, KeysetPage } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { login } from './support/users';
import { seedDemo } from '../src/seed/demo-seed';
import { DEMO_SEEDERS } from '../src/seed/demo-seeders';
import { DEMO_PASSWORD } from '../src/seed/demo-accounts';
import { seedAccounts } from '../src/seed/accounts.seeder';
import { DEMO_PROJECTS, findDemoProject } from '../src/seed/projects.seeder';
import type { FeatureSeeder } from '../src/seed/demo-seed';
import { Sac } from '../src/sacs/sac.entity';
import { BroodCount } from '../src/sacs/brood-count.entity';
import { api } from './accounts.fixtures';
import { DEMO_PARTNER_UPDATES } from '../src/seed/partner-updates.seeder';

let t: TestApp;

/** Stands in for the sacs seeder's counted brood on the shared project only when it laid none. */
const broodIfMissing: FeatureSeeder = async (ctx) => {
  const p = await findDemoProject(ctx.em, ctx, 'versicolorBrood');
  if (await ctx.em.count(Sac, { project: p })) return;
  const sac = ctx.em.create(Sac, { project: p, layDate: '2026-05-01', outcome: 'emerged', broodStage: 'second-instar', recordedBy: ctx.users.keeper });
  ctx.em.create(BroodCount, { sac, at: new Date('2026-06-01T18:00:00Z'), stage: 'second-instar', alive: 40, source: 'count', recordedBy: ctx.users.keeper });
};

beforeAll(async () => {
  t = await createTestApp();
  const seeders = [...DEMO_SEEDERS.filter((s) => s !== seedAccounts), broodIfMissing, seedAccounts];
  expect(await seedDemo(t.orm.em.fork(), seeders, new Date('2026-06-15T10:00:00Z'))).toBe(true);
}, 90_000);
afterAll(async () => t?.close());

describe('partner updates in the demo', () => {
  it('the demo partner’s inbox holds updates of the latest events of his projects, each with a link; the keeper has none of her own doing', async () => {
    const tomasz = await login(t.app, 'partner@broodsilk.test', DEMO_PASSWORD);
    const mira = await login(t.app, 'keeper@broodsilk.test', DEMO_PASSWORD);
    const inbox = (await api(t.app).get('/api/notifications').set('Authorization', tomasz.bearer).expect(200)).body as NotificationPage;
    const updates = inbox.items.filter((n) => n.kind === 'partner-update');
    expect(updates).toHaveLength(DEMO_PARTNER_UPDATES);
    expect(inbox.unread).toBeGreaterThanOrEqual(DEMO_PARTNER_UPDATES);
    expect(updates.every((n) => n.subject !== null && n.projectId !== null && n.body.length > 0)).toBe(true);
    // Each update is told from its event's facts: no count of nothing, no stage left out.
    expect(updates.map((n) => n.body).filter((b) => /\b0 young\b|alive at in\b/.test(b))).toEqual([]);
    const hers = (await api(t.app).get('/api/notifications').set('Authorization', mira.bearer).expect(200)).body as NotificationPage;
    expect(hers.items.filter((n) => n.kind === 'partner-update')).toEqual([]);
  });
});

describe('accounts demo seeder', () => {
  it('seeds the shared brood with three parties, a hand-over awaiting confirmation and money owed both ways; the older project is settled', async () => {
    const mira = await login(t.app, 'keeper@broodsilk.test', DEMO_PASSWORD);
    const tomasz = await login(t.app, 'partner@broodsilk.test', DEMO_PASSWORD);
    const list = (await api(t.app).get('/api/projects').set('Authorization', mira.bearer).expect(200)).body as ProjectSummary[] | { items: ProjectSummary[] };
    const projects = Array.isArray(list) ? list : list.items;
    expect(projects.find((p) => p.title === 'Versicolor first brood')?.stage.stage).toBe('shares-settled');
    const brood = projects.find((p) => p.title === DEMO_PROJECTS.versicolorBrood)!;

    const b = (await api(t.app).get(`/api/projects/${brood.id}/balances`).set('Authorization', tomasz.bearer).expect(200)).body as BalancesResponse;
    expect(b.parties.map((p) => p.name)).toEqual(['Mira Okonkwo', 'Tomasz Wierzba', 'Dara Quill']);
    expect(b.parties.every((p) => p.share > 0)).toBe(true);
    const tomaszB = b.parties.find((p) => p.name === 'Tomasz Wierzba')!;
    expect(tomaszB).toMatchObject({ unconfirmedHandOvers: 1 });
    expect(b.debts).toContainEqual(expect.objectContaining({ fromName: 'Tomasz Wierzba', toName: 'Mira Okonkwo', amountMinor: 1450 }));
    expect(b.debts).toContainEqual(expect.objectContaining({ fromName: 'Mira Okonkwo', toName: 'Dara Quill', amountMinor: 5400 }));
    expect(b.problems).toEqual([]);
    const entries = (
      (await api(t.app).get(`/api/projects/${brood.id}/entries`).set('Authorization', tomasz.bearer).expect(200)).body as KeysetPage<LedgerEntryResponse>
    ).items;
    expect(entries.find((e) => e.kind === 'hand-over')?.awaitingConfirmationBy?.name).toBe('Tomasz Wierzba');
  });
});
