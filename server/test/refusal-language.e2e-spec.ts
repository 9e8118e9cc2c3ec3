import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CSRF_OUT_OF_DATE, PULL_DAY_MAX, SESSION_COOKIE, type ApiErrorBody } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { addMember, createProject } from './support/projects';

let t: TestApp;
let owner: SignedIn;
let partner: SignedIn;
let projectId: string;
const http = () => request(t.app.getHttpServer());
const NO_SUCH_PROJECT = '0b7c6f1e-2d4a-4c8e-9f3b-5a6d7e8f9a0b';

beforeAll(async () => {
  t = await createTestApp();
  owner = await registerKeeper(t.app, 'Refusal Owner');
  partner = await registerKeeper(t.app, 'Refusal Partner');
  projectId = (await createProject(t.app, t.orm, owner, { title: 'Refusals' })).id;
  await addMember(t.orm, projectId, partner, 'partner');
  await http().post(`/api/projects/${projectId}/close`).set('Authorization', owner.bearer).expect(200);
});
afterAll(async () => {
  await t.close();
});

/** One impossible request of each kind, sent in the reader's language (`undefined`: no Accept-Language). */
const REQUESTS = {
  validation: (lng?: string) => lang(http().patch('/api/users/me').set('Authorization', owner.bearer).send({ bogus: 1, other: 2 }), lng),
  notFound: (lng?: string) => lang(http().get(`/api/projects/${NO_SUCH_PROJECT}`).set('Authorization', owner.bearer), lng),
  conflict: (lng?: string) => lang(http().post(`/api/projects/${projectId}/close`).set('Authorization', owner.bearer), lng),
  forbidden: (lng?: string) => lang(http().patch(`/api/projects/${projectId}`).set('Authorization', partner.bearer).send({ title: 'Mine now' }), lng),
  badJson: (lng?: string) =>
    lang(http().patch('/api/users/me').set('Authorization', owner.bearer).set('Content-Type', 'application/json').send('{"displayName": '), lng),
};
function lang(req: request.Test, lng?: string): request.Test {
  return lng ? req.set('Accept-Language', lng) : req;
}

/** The 400 for the two unknown fields of the validation request, with its summary and each field's sentence. */
const unknownFields = (message: string, each: (field: string) => string): ApiErrorBody => ({
  statusCode: 400,
  error: 'Bad Request',
  message,
  details: ['bogus', 'other'].map((field) => ({ field, message: each(field) })),
});

/** Every sentence a person reads in the body. */
const sentences = (b: ApiErrorBody) => [b.message, ...(b.details ?? []).map((d) => d.message)];

describe('refusals in the reader’s language', () => {
  it('a German reader (Accept-Language: de) gets each kind of refusal in German, with the same status and fields', async () => {
    const validation = await REQUESTS.validation('de').expect(400);
    expect(validation.body).toEqual(unknownFields('Bitte korrigiere 2 Felder: bogus, other.', (f) => `„${f}“ ist kein Feld, das dieses Formular annimmt.`));
    expect((await REQUESTS.notFound('de').expect(404)).body.message).toBe('Dieses Projekt gibt es nicht, oder du bist kein Mitglied.');
    expect((await REQUESTS.conflict('de').expect(409)).body.message).toMatch(/^Dieses Projekt wurde schon am \d{4}-\d{2}-\d{2} abgeschlossen\.$/);
    expect((await REQUESTS.forbidden('de').expect(403)).body.message).toBe('Das darf in diesem Projekt nur der Halter; du bist Partner.');
    expect((await REQUESTS.badJson('de').expect(400)).body.message).toBe('Der Inhalt der Anfrage ist kein gültiges JSON.');
  });

  it('no German sentence carries a placeholder, a catalogue key or an English word of the same refusal', async () => {
    for (const send of Object.values(REQUESTS)) {
      const [de, en] = [(await send('de')).body as ApiErrorBody, (await send()).body as ApiErrorBody];
      for (const [i, s] of sentences(de).entries()) {
        expect(s).not.toMatch(/\{\{|\}\}|\brefusal\.|\$t\(/);
        expect(s).not.toBe(sentences(en)[i]);
      }
      expect(de).not.toHaveProperty('key');
      expect(de).not.toHaveProperty('values');
    }
  });

  it('without Accept-Language the refusals are today’s English sentences', async () => {
    expect((await REQUESTS.validation().expect(400)).body).toEqual(
      unknownFields('Please correct 2 fields: bogus, other.', (f) => `"${f}" is not a field this form accepts.`),
    );
    expect((await REQUESTS.notFound().expect(404)).body.message).toBe('There is no such project, or you are not one of its members.');
    expect((await REQUESTS.conflict().expect(409)).body.message).toMatch(/^This project was already closed on \d{4}-\d{2}-\d{2}\.$/);
    expect((await REQUESTS.forbidden().expect(403)).body.message).toBe('Only the owner of this project may do this; you are a partner.');
    expect((await REQUESTS.badJson().expect(400)).body.message).toBe('The request body is not valid JSON.');
  });

  /** A sac whose temperature band has a word for its lowest value, and a first pull day that is not whole. */
  const ownSentences = (lng?: string) =>
    lang(
      http()
        .post(`/api/projects/${projectId}/sacs`)
        .set('Authorization', owner.bearer)
        .send({ layDate: '2026-03-01', temperatureBand: { min: 'warm', max: 28 }, pullFromDay: 2.5 }),
      lng,
    );

  it('a DTO’s own sentences (the band’s value, the pull day and its limit) are said in German, and stay today’s English without Accept-Language', async () => {
    const de = (await ownSentences('de').expect(400)).body as ApiErrorBody;
    const en = (await ownSentences().expect(400)).body as ApiErrorBody;
    expect(en.details).toEqual([
      { field: 'pullFromDay', message: `The first pull day must be a whole day number from 0 to ${PULL_DAY_MAX}.` },
      { field: 'temperatureBand.min', message: 'The lowest value of the band must be a number.' },
    ]);
    expect(de.details).toEqual([
      { field: 'pullFromDay', message: `Der erste Entnahmetag muss eine ganze Tageszahl von 0 bis ${PULL_DAY_MAX} sein.` },
      { field: 'temperatureBand.min', message: 'Der untere Wert des Bereichs muss eine Zahl sein.' },
    ]);
    expect(de.message).toBe('Bitte korrigiere 2 Felder: pullFromDay, temperatureBand.min.');
  });

  it('the language is negotiated as RFC 9110 §12.5.4 says: region tags, weights, and English for a language we lack', async () => {
    expect((await REQUESTS.notFound('de-AT').expect(404)).body.message).toMatch(/^Dieses Projekt/);
    expect((await REQUESTS.notFound('fr, de;q=0.5, en;q=0.1').expect(404)).body.message).toMatch(/^Dieses Projekt/);
    expect((await REQUESTS.notFound('en;q=0.9, de;q=0.4').expect(404)).body.message).toMatch(/^There is no such project/);
    expect((await REQUESTS.notFound('fr').expect(404)).body.message).toMatch(/^There is no such project/);
  });

  it('a stale CSRF token is refused in German with the reason the client retries by', async () => {
    const res = await http()
      .patch('/api/users/me')
      .set('Cookie', `${SESSION_COOKIE}=${owner.accessToken}`)
      .set('Accept-Language', 'de')
      .send({ displayName: 'X' })
      .expect(403);
    expect(res.body).toEqual({
      statusCode: 403,
      error: 'Forbidden',
      message: 'Dieses Formular ist veraltet. Lade die Seite neu und versuch es noch einmal.',
      reason: CSRF_OUT_OF_DATE,
    });
  });
});
