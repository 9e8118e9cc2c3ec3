import request from 'supertest';
import sharp from 'sharp';
import JSZip from 'jszip';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addDays, todayIn, type AnimalResponse } from '@broodsilk/shared';
import type { ExportManifest } from '../src/export/export.service';
import { EXPORT_QUERIES } from '../src/export/export-queries';
import { createTestApp, type TestApp } from './support/test-app';
import { createAnimal, speciesId } from './support/fixtures/collection';
import { createProject } from './support/projects';
import { createSac } from './support/sacs';
import { accountScenario, type AccountScenario } from './accounts.fixtures';
import type { SignedIn } from './support/users';
import { binaryBody } from './support/binary-body';

/**
 * A keeper's full export, unpacked with JSZip (a general-purpose reader, not the writer yazl), and
 * compared with what the API itself shows that keeper. The zip layout follows PKWARE's APPNOTE.TXT.
 */
let t: TestApp;
let s: AccountScenario;
let miraAnimal: AnimalResponse;
let strangerAnimal: AnimalResponse;
let strangerSacId: string;
const http = () => request(t.app.getHttpServer());
const today = () => todayIn('UTC', new Date());

/** Downloads and unpacks an export. */
async function exportOf(
  who: SignedIn,
): Promise<{ zip: JSZip; manifest: ExportManifest; rows: (kind: string) => Promise<Record<string, unknown>[]>; res: request.Response }> {
  const res = await http().get('/api/export').set('Authorization', who.bearer).buffer(true).parse(binaryBody);
  expect(res.status).toBe(200);
  const zip = await JSZip.loadAsync(res.body as Buffer);
  const manifest = JSON.parse(await zip.file('manifest.json')!.async('string')) as ExportManifest;
  const rows = async (kind: string) => JSON.parse(await zip.file(`${kind}.json`)!.async('string')) as Record<string, unknown>[];
  return { zip, manifest, rows, res };
}

async function photoOf(who: SignedIn, animalId: string, colour: string): Promise<string> {
  const png = await sharp({ create: { width: 16, height: 12, channels: 3, background: colour } })
    .png()
    .toBuffer();
  const res = await http().post(`/api/animals/${animalId}/photos`).set('Authorization', who.bearer).attach('file', png, 'p.png').expect(201);
  return (res.body as { id: string }).id;
}

beforeAll(async () => {
  t = await createTestApp();
  s = await accountScenario(t.app, t.orm);
  const species = await speciesId(t.orm, 'Tliltocatl vagans');
  miraAnimal = await createAnimal(t.app, s.mira, { speciesId: species, label: 'Mira export female', sex: 'female', maturity: 'mature' });
  await http()
    .post(`/api/animals/${miraAnimal.id}/molts`)
    .set('Authorization', s.mira.bearer)
    .send({ moltedOn: addDays(today(), -30) })
    .expect(201);
  await http()
    .post(`/api/animals/${miraAnimal.id}/feedings`)
    .set('Authorization', s.mira.bearer)
    .send({ fedOn: addDays(today(), -2), prey: '1 cricket', taken: true })
    .expect(201);
  await photoOf(s.mira, miraAnimal.id, '#aa5522');
  for (const text of ['Sac looks firm.', 'Turned the sac.'])
    await http().post(`/api/sacs/${s.sacId}/log`).set('Authorization', s.caretaker.bearer).send({ kind: 'note', text }).expect(201);
  await http()
    .post(`/api/projects/${s.projectId}/entries`)
    .set('Authorization', s.mira.bearer)
    .send({ kind: 'money', date: today(), fromMemberId: s.miraId, toMemberId: s.tomaszId, amountMinor: 1500 })
    .expect(201);
  // Another keeper's own records, none of which Mira may read.
  strangerAnimal = await createAnimal(t.app, s.stranger, { speciesId: species, label: 'Stranger private female', sex: 'female', maturity: 'mature' });
  await photoOf(s.stranger, strangerAnimal.id, '#2255aa');
  const strangerProject = await createProject(t.app, t.orm, s.stranger, { title: 'Stranger private project' });
  strangerSacId = (await createSac(t.app, s.stranger, strangerProject.id, { layDate: addDays(today(), -10) })).id;
  await http().post(`/api/sacs/${strangerSacId}/log`).set('Authorization', s.stranger.bearer).send({ kind: 'note', text: 'Stranger note' }).expect(201);
});
afterAll(async () => {
  await t.close();
});

describe('GET /api/export', () => {
  it('needs a session', async () => {
    await http().get('/api/export').expect(401);
  });

  it('is one zip with a manifest, one JSON file per kind and the photo files, as an attachment', async () => {
    const { zip, manifest, res } = await exportOf(s.mira);
    expect(res.headers['content-type']).toBe('application/zip');
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="broodsilk-export-\d{4}-\d{2}-\d{2}\.zip"$/);
    const names = Object.keys(zip.files).sort();
    const kinds = Object.keys(EXPORT_QUERIES).map((k) => `${k}.json`);
    expect(names.filter((n) => !n.startsWith('photos/'))).toEqual(['manifest.json', ...kinds].sort());
    expect(manifest).toMatchObject({ format: 'broodsilk-export', version: 1, keeperId: s.mira.user.id, photoFiles: 1 });
    // Each count in the manifest is the length of its file.
    for (const file of kinds) expect(manifest.counts[file], file).toBe((JSON.parse(await zip.file(file)!.async('string')) as unknown[]).length);
  });

  it('holds what the API shows Mira, kind by kind', async () => {
    const { rows, zip } = await exportOf(s.mira);
    const get = async (path: string) => (await http().get(path).set('Authorization', s.mira.bearer).expect(200)).body as unknown;
    const animals = (await get('/api/animals')) as { items?: { id: string }[] } | { id: string }[];
    const animalIds = (Array.isArray(animals) ? animals : animals.items!).map((a) => a.id).sort();
    expect((await rows('animals')).map((a) => a.id).sort()).toEqual(animalIds);
    expect(await rows('molts')).toHaveLength(1);
    expect(await rows('feedings')).toMatchObject([{ animal_id: miraAnimal.id, prey: '1 cricket', taken: true }]);
    expect((await rows('projects')).map((p) => p.id)).toEqual([s.projectId]);
    expect(await rows('project-members')).toHaveLength(4);
    expect((await rows('sacs')).map((x) => x.id)).toEqual([s.sacId]);
    const log = (await get(`/api/sacs/${s.sacId}/log`)) as unknown[] | { items: unknown[] };
    expect(await rows('care-log')).toHaveLength((Array.isArray(log) ? log : log.items).length);
    expect((await rows('care-log')).map((e) => e.text)).toEqual(expect.arrayContaining(['Sac looks firm.', 'Turned the sac.']));
    expect(await rows('brood-counts')).toHaveLength(1);
    const entries = (await get(`/api/projects/${s.projectId}/entries`)) as unknown[] | { items: unknown[] };
    expect(await rows('ledger-entries')).toHaveLength((Array.isArray(entries) ? entries : entries.items).length);
    expect(await rows('ledger-entries')).toEqual(expect.arrayContaining([expect.objectContaining({ kind: 'money', amount_minor: 1500, currency: 'EUR' })]));
    // Dates stay calendar dates and instants carry an offset (ISO 8601).
    const [molt] = await rows('molts');
    expect(molt.molted_on).toBe(addDays(today(), -30));
    expect(String(molt.created_at)).toMatch(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}(\.\d+)?(Z|[+-]\d{2}:\d{2})$/);
    // The photo file is the one the API serves (a JPEG: FF D8 FF, ISO/IEC 10918-1).
    const [photo] = await rows('photos');
    const file = await zip.file(String(photo.file))!.async('nodebuffer');
    const served = await http()
      .get(`/api/photos/${String(photo.id)}`)
      .set('Authorization', s.mira.bearer)
      .buffer(true)
      .parse(binaryBody)
      .expect(200);
    expect(file.subarray(0, 3).toString('hex')).toBe('ffd8ff');
    expect(file.equals(served.body as Buffer)).toBe(true);
    expect(file.length).toBe(photo.bytes);
  });

  it("holds nothing of another keeper's and no password hash", async () => {
    const { zip, rows } = await exportOf(s.mira);
    const everything = (
      await Promise.all(
        Object.keys(zip.files)
          .filter((n) => n.endsWith('.json'))
          .map((n) => zip.file(n)!.async('string')),
      )
    ).join('\n');
    for (const foreign of [strangerAnimal.id, strangerSacId, s.stranger.user.id, 'Stranger private', 'Stranger note'])
      expect(everything).not.toContain(foreign);
    expect(everything).not.toContain('password');
    expect(everything).not.toContain('$argon2');
    expect(await rows('profile')).toMatchObject([{ id: s.mira.user.id, email: s.mira.user.email }]);
    expect(Object.keys(zip.files).filter((n) => n.startsWith('photos/'))).toHaveLength(1);
  });

  it('gives a caretaker the project and its care log but no money, as the API does', async () => {
    await http().get(`/api/projects/${s.projectId}/entries`).set('Authorization', s.caretaker.bearer).expect(403);
    const { rows, manifest } = await exportOf(s.caretaker);
    expect((await rows('projects')).map((p) => p.id)).toEqual([s.projectId]);
    expect(await rows('care-log')).toHaveLength(2);
    expect(await rows('ledger-entries')).toEqual([]);
    expect(await rows('animals')).toEqual([]);
    expect(manifest.photoFiles).toBe(0);
  });
});
