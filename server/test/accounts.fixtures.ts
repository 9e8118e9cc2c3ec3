import request from 'supertest';
import type { INestApplication } from '@nestjs/common';
import type { MikroORM } from '@mikro-orm/postgresql';
import { addDays, todayIn, type ProjectMemberResponse, type ProposeTermsRequest } from '@broodsilk/shared';
import { BroodCount } from '../src/sacs/brood-count.entity';
import { Sac } from '../src/sacs/sac.entity';
import { createProject, addMember } from './support/projects';
import { createSac } from './support/sacs';
import { registerKeeper, type SignedIn } from './support/users';

/**
 * An invented account scenario: Mira (owner) bred the female, Tomasz (partner) lent the male,
 * Lena (an outside party, no account) paid towards the female. Terms: Mira 2, Tomasz 1 with 2
 * fixed, Lena 1; EUR 5.00 (500 minor units) per spiderling.
 */
export interface AccountScenario {
  projectId: string;
  mira: SignedIn;
  tomasz: SignedIn;
  caretaker: SignedIn;
  stranger: SignedIn;
  miraId: string;
  tomaszId: string;
  lenaId: string;
  sacId: string;
}

export const api = (app: INestApplication) => request(app.getHttpServer());

export async function proposeAndAccept(
  app: INestApplication,
  s: Pick<AccountScenario, 'projectId' | 'mira' | 'tomasz' | 'lenaId'>,
  body: ProposeTermsRequest,
): Promise<number> {
  const res = await api(app).post(`/api/projects/${s.projectId}/terms`).set('Authorization', s.mira.bearer).send(body);
  if (res.status !== 201) throw new Error(`propose terms answered ${res.status}: ${JSON.stringify(res.body)}`);
  const version = (res.body as { number: number }).number;
  const a = await api(app).post(`/api/projects/${s.projectId}/terms/${version}/accept`).set('Authorization', s.tomasz.bearer).send({});
  if (a.status >= 300) throw new Error(`accept answered ${a.status}: ${JSON.stringify(a.body)}`);
  const b = await api(app)
    .post(`/api/projects/${s.projectId}/terms/${version}/accept`)
    .set('Authorization', s.mira.bearer)
    .send({ memberId: s.lenaId, note: 'Agreed by phone.' });
  if (b.status >= 300) throw new Error(`accept for Lena answered ${b.status}: ${JSON.stringify(b.body)}`);
  return version;
}

export function standardTerms(s: Pick<AccountScenario, 'miraId' | 'tomaszId' | 'lenaId'>, over: Partial<ProposeTermsRequest> = {}): ProposeTermsRequest {
  return {
    lines: [
      { memberId: s.miraId, weight: 2, pickOrder: 1 },
      { memberId: s.tomaszId, weight: 1, pickOrder: 2, fixedCount: 2 },
      { memberId: s.lenaId, weight: 1, pickOrder: 3 },
    ],
    pricePerSpiderlingMinor: 500,
    currency: 'EUR',
    failureClause: 'carries-over',
    shippingPaidBy: 'recipient',
    ...over,
  };
}

/** A new brood count for the sac (the sacs module's table), `at` an instant. */
export async function recordCount(orm: MikroORM, sacId: string, alive: number, at = new Date()): Promise<void> {
  const em = orm.em.fork();
  const sac = await em.findOneOrFail(Sac, sacId);
  em.create(BroodCount, { sac, at, stage: 'second-instar', alive, source: 'count', recordedBy: sac.recordedBy });
  await em.flush();
}

export async function accountScenario(app: INestApplication, orm: MikroORM, opts: { alive?: number; terms?: boolean } = {}): Promise<AccountScenario> {
  const mira = await registerKeeper(app, 'Mira Keeper');
  const tomasz = await registerKeeper(app, 'Tomasz Partner');
  const caretaker = await registerKeeper(app, 'Ines Caretaker');
  const stranger = await registerKeeper(app, 'Some Stranger');
  const project = await createProject(app, orm, mira, { title: 'Account test project' });
  const tomaszId = await addMember(orm, project.id, tomasz, 'partner');
  await addMember(orm, project.id, caretaker, 'caretaker');
  const lena = await api(app).post(`/api/projects/${project.id}/members`).set('Authorization', mira.bearer).send({ name: 'Lena Outside', role: 'partner' });
  if (lena.status !== 201) throw new Error(`add outside party answered ${lena.status}: ${JSON.stringify(lena.body)}`);
  const lenaId = (lena.body as ProjectMemberResponse).id;
  const miraId = project.members.find((m) => m.role === 'owner')!.id;
  const today = todayIn('UTC', new Date());
  const sac = await createSac(app, mira, project.id, { layDate: addDays(today, -70) });
  const s: AccountScenario = { projectId: project.id, mira, tomasz, caretaker, stranger, miraId, tomaszId, lenaId, sacId: sac.id };
  if (opts.terms !== false) await proposeAndAccept(app, s, standardTerms(s));
  // A count well in the past, so later entries are recorded after it.
  await recordCount(orm, sac.id, opts.alive ?? 62, new Date(Date.now() - 86_400_000));
  return s;
}
