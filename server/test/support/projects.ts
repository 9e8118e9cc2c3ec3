import request from 'supertest';
import type { INestApplication } from '@nestjs/common';
import type { MikroORM } from '@mikro-orm/postgresql';
import { addDays, todayIn, type ProjectResponse, type ProjectRole } from '@broodsilk/shared';
import { ProjectMember } from '../../src/projects/project-member.entity';
import { createAnimal, speciesId } from './fixtures/collection';
import { registerKeeper, type SignedIn } from './users';
import { Clock } from '../../src/common/clock';

let n = 0;

/** A project of `owner` with a fresh mature female and a mature male (matured `maleAgeDays` before the app's clock says today), G. pulchripes unless `species` names another. */
export async function createProject(
  app: INestApplication,
  orm: MikroORM,
  owner: SignedIn,
  opts: { title?: string; maleAgeDays?: number; species?: string } = {},
): Promise<ProjectResponse> {
  n += 1;
  const today = todayIn('UTC', app.get(Clock).now());
  const species = await speciesId(orm, opts.species ?? 'Grammostola pulchripes');
  const female = await createAnimal(app, owner, { speciesId: species, label: `F-${n}-${Date.now()}`, sex: 'female', maturity: 'mature' });
  const male = await createAnimal(app, owner, {
    speciesId: species,
    label: `M-${n}-${Date.now()}`,
    sex: 'male',
    maturity: 'mature',
    maturedOn: addDays(today, -(opts.maleAgeDays ?? 60)),
  });
  const res = await request(app.getHttpServer())
    .post('/api/projects')
    .set('Authorization', owner.bearer)
    .send({ title: opts.title ?? `Project ${n}`, femaleId: female.id, maleId: male.id });
  if (res.status !== 201) throw new Error(`create project answered ${res.status}: ${JSON.stringify(res.body)}`);
  return res.body as ProjectResponse;
}

/**
 * Makes a keeper a member directly in the database (the invitation flow has its own spec);
 * returns the member id.
 */
export async function addMember(orm: MikroORM, projectId: string, who: SignedIn, role: ProjectRole): Promise<string> {
  const em = orm.em.fork();
  const m = em.create(ProjectMember, { project: projectId, user: who.user.id, role, name: who.user.displayName, email: who.user.email });
  await em.flush();
  return m.id;
}

export interface ProjectWithRoles {
  projectId: string;
  owner: SignedIn;
  partner: SignedIn;
  caretaker: SignedIn;
}

/** A fresh project with a keeper in each project role, the usual start of a sac or dashboard spec. */
export async function projectWithRoles(app: INestApplication, orm: MikroORM, title: string, names: [string, string, string]): Promise<ProjectWithRoles> {
  const [owner, partner, caretaker] = [await registerKeeper(app, names[0]), await registerKeeper(app, names[1]), await registerKeeper(app, names[2])];
  const projectId = (await createProject(app, orm, owner, { title })).id;
  await addMember(orm, projectId, partner, 'partner');
  await addMember(orm, projectId, caretaker, 'caretaker');
  return { projectId, owner, partner, caretaker };
}
