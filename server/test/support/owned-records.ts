import sharp from 'sharp';
import request from 'supertest';
import { addDays, todayIn } from '@broodsilk/shared';
import { Notification } from '../../src/reminders/notification.entity';
import { User } from '../../src/users/user.entity';
import { createAnimal, speciesId } from './fixtures/collection';
import { createProject } from './projects';
import { createSac } from './sacs';
import type { RegisteredRoute } from './route-list';
import type { TestApp } from './test-app';
import type { SignedIn } from './users';

const NOBODY = '00000000-0000-4000-8000-000000000000';

/** One record of `owner` for each kind of path parameter the API has, by kind. */
export async function ownedRecords(t: TestApp, owner: SignedIn): Promise<Record<string, string>> {
  const http = () => request(t.app.getHttpServer());
  const species = await speciesId(t.orm, 'Tliltocatl vagans');
  const animal = await createAnimal(t.app, owner, { speciesId: species, label: `Owned-${Date.now()}`, sex: 'female', maturity: 'mature' });
  const molt = await http()
    .post(`/api/animals/${animal.id}/molts`)
    .set('Authorization', owner.bearer)
    .send({ moltedOn: addDays(todayIn('UTC', new Date()), -3) });
  const png = await sharp({ create: { width: 8, height: 8, channels: 3, background: '#884422' } })
    .png()
    .toBuffer();
  const photo = await http().post(`/api/animals/${animal.id}/photos`).set('Authorization', owner.bearer).attach('file', png, 'a.png');
  const project = await createProject(t.app, t.orm, owner);
  const sac = await createSac(t.app, owner, project.id, { layDate: addDays(todayIn('UTC', new Date()), -5) });
  const em = t.orm.em.fork();
  const note = em.create(Notification, {
    user: em.getReference(User, owner.user.id),
    kind: 'roll-due',
    title: 'Roll',
    body: 'Roll the sac.',
    subjectType: 'sac',
    subjectId: sac.id,
  });
  await em.flush();
  const ids = {
    species,
    animal: animal.id,
    molt: molt.body.id as string,
    photo: photo.body.id as string,
    project: project.id,
    member: project.members[0].id,
    sac: sac.id,
    notification: note.id,
    entry: NOBODY,
    version: '1',
    token: NOBODY,
  };
  const missing = Object.entries(ids).filter(([, v]) => !v);
  if (missing.length) throw new Error(`owned records missing: ${missing.map(([k]) => k).join(', ')}`);
  return ids;
}

/** The kind of record each `:param` names, by the path segment before it. */
const KIND: Record<string, string> = {
  animals: 'animal',
  'ownership-requests': 'animal',
  molts: 'molt',
  photos: 'photo',
  projects: 'project',
  members: 'member',
  statements: 'member',
  sacs: 'sac',
  notifications: 'notification',
  entries: 'entry',
  terms: 'version',
  species: 'species',
  invitations: 'token',
  calendar: 'token',
  unsubscribe: 'token',
  progress: 'token',
};

/** The route's path with each `:param` filled from `ids`. */
export function urlFor(r: RegisteredRoute, ids: Record<string, string>): string {
  return r.path.replace(/(\w+(?:-\w+)*)\/:(\w+)/g, (_, segment: string, param: string) => {
    const kind = KIND[segment];
    if (!kind) throw new Error(`${r.method} ${r.path}: no record kind for :${param} after "${segment}"; add one to support/owned-records.ts`);
    return `${segment}/${encodeURIComponent(ids[kind])}`;
  });
}
