/**
 * Per-keeper limits on routes that send mail or take heavy uploads: the call after the limit is a
 * 429 with a message, writes nothing, and another keeper is not affected. Cheap calls are used to
 * reach the limit (a refused file counts too: the limit is checked before the upload is read).
 */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ApiErrorBody } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { createAnimal, speciesId } from './support/fixtures/collection';
import { createProject } from './support/projects';
import { rowCounts } from './support/row-counts';
import { PHOTO_UPLOADS_PER_HOUR } from '../src/photos/photo-upload-limit';
import { CSV_IMPORTS_PER_HOUR } from '../src/animals/animals-csv.controller';
import { INVITATIONS_PER_HOUR } from '../src/invitations/invitations.controller';
import { STATEMENT_EMAILS_PER_HOUR } from '../src/accounts/statements.controller';

let t: TestApp;
const http = () => request(t.app.getHttpServer());

beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

/** Calls `send` `limit` times (any status but 429), then once more: 429, nothing written. */
async function reachLimit(limit: number, send: () => request.Test): Promise<ApiErrorBody> {
  for (let i = 0; i < limit; i += 1) {
    const res = await send();
    expect(res.status, `call ${i + 1}: ${JSON.stringify(res.body)}`).not.toBe(429);
  }
  const before = await rowCounts(t.orm);
  const res = await send();
  expect(res.status).toBe(429);
  expect(await rowCounts(t.orm)).toEqual(before);
  return res.body as ApiErrorBody;
}

async function keeperWithAnimal(name: string): Promise<{ who: SignedIn; animalId: string }> {
  const who = await registerKeeper(t.app, name);
  const animal = await createAnimal(t.app, who, {
    speciesId: await speciesId(t.orm, 'Tliltocatl vagans'),
    label: `L-${name}`,
    sex: 'female',
    maturity: 'immature',
  });
  return { who, animalId: animal.id };
}

describe('per-keeper limits', () => {
  it('photo uploads', async () => {
    const a = await keeperWithAnimal('Photo Limit A');
    const upload = (k: { who: SignedIn; animalId: string }) => () =>
      http().post(`/api/animals/${k.animalId}/photos`).set('Authorization', k.who.bearer).attach('file', Buffer.from('not an image'), 'x.png');
    const body = await reachLimit(PHOTO_UPLOADS_PER_HOUR, upload(a));
    expect(body.message).toMatch(new RegExp(`limit of ${PHOTO_UPLOADS_PER_HOUR} photo uploads per 60 minutes\\. Try again in \\d+ minutes?\\.`));
    const b = await keeperWithAnimal('Photo Limit B');
    expect((await upload(b)()).status).toBe(415); // someone else's limit is not yours
  });

  it('CSV imports', async () => {
    const who = await registerKeeper(t.app, 'Import Limit');
    const body = await reachLimit(CSV_IMPORTS_PER_HOUR, () =>
      http().post('/api/animals/import').set('Authorization', who.bearer).set('Content-Type', 'text/csv').send('label\n'),
    );
    expect(body.message).toMatch(/CSV imports/);
  });

  it('invitations', async () => {
    const owner = await registerKeeper(t.app, 'Invite Limit');
    const project = await createProject(t.app, t.orm, owner);
    let n = 0;
    const body = await reachLimit(INVITATIONS_PER_HOUR, () =>
      http()
        .post(`/api/projects/${project.id}/invitations`)
        .set('Authorization', owner.bearer)
        .send({ email: `limit-${(n += 1)}@example.test`, role: 'caretaker' }),
    );
    expect(body.message).toMatch(/invitations/);
  });

  it('statement e-mails', async () => {
    const owner = await registerKeeper(t.app, 'Statement Limit');
    const project = await createProject(t.app, t.orm, owner);
    // The owner's own statement e-mail: each call may answer 2xx or a refusal, but counts.
    const body = await reachLimit(STATEMENT_EMAILS_PER_HOUR, () =>
      http().post(`/api/projects/${project.id}/statements/${project.members[0].id}/email`).set('Authorization', owner.bearer),
    );
    expect(body.message).toMatch(/statement e-mails/);
  });
});
