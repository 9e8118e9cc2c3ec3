import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Paged, SpeciesResponse } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { makeAdmin } from './support/admins';
import { SPECIES_DATA } from '../src/species/data/species.data';
import { COMMON_NAMES } from '../src/species/data/common-names.data';
import { commonNamesFillSql } from '../src/species/catalogue-sql';

let t: TestApp;
let keeper: SignedIn;
let admin: SignedIn & { password: string };
const http = () => request(t.app.getHttpServer());

async function search(q: string): Promise<Paged<SpeciesResponse>> {
  const res = await http().get('/api/species').query({ q }).set('Authorization', keeper.bearer).expect(200);
  return res.body as Paged<SpeciesResponse>;
}

beforeAll(async () => {
  t = await createTestApp();
  keeper = await registerKeeper(t.app, 'Catalogue Reader');
  admin = await registerKeeper(t.app, 'Catalogue Admin');
  await makeAdmin(t, admin);
});
afterAll(async () => {
  await t.close();
});

describe('species catalogue', () => {
  it('the migration seeds every dataset row', async () => {
    const all = await http().get('/api/species').query({ limit: 200 }).set('Authorization', keeper.bearer).expect(200);
    expect(all.body.total).toBe(SPECIES_DATA.length);
    expect(all.body.items.map((s: SpeciesResponse) => s.scientificName)).toEqual([...SPECIES_DATA.map((r) => r.scientificName)].sort());
  });

  it('needs a session', async () => {
    await http().get('/api/species').expect(401);
  });

  it.each([
    ['Euathlus vagans', 'Tliltocatl vagans'],
    ['eurypelma VAG', 'Tliltocatl vagans'],
    ['brachypelma vagans', 'Tliltocatl vagans'],
    ['Avicularia versicolor', 'Caribena versicolor'],
    ['citharischius', 'Pelinobius muticus'],
    ['crawshayi', 'Pelinobius muticus'],
    // Mendoza & Francke 2017, doi:10.1071/IS16023 (World Spider Catalog): a synonym of B. smithi
    ['annitha', 'Brachypelma smithi'],
  ])('an old name "%s" finds %s', async (q, expected) => {
    const found = await search(q);
    expect(found.items.map((s) => s.scientificName)).toContain(expected);
  });

  it('finds B. smithi, not B. hamorii, for the old name annitha (Mendoza & Francke 2017)', async () => {
    expect((await search('annitha')).items.map((s) => s.scientificName)).toEqual(['Brachypelma smithi']);
  });

  it('searches by genus prefix and by epithet prefix, case-insensitively', async () => {
    const genus = await search('POECILO');
    expect(genus.total).toBe(SPECIES_DATA.filter((r) => r.scientificName.startsWith('Poecilotheria')).length);
    const epithet = await search('regal');
    expect(epithet.items.map((s) => s.scientificName)).toEqual(['Poecilotheria regalis']);
    expect((await search('vagan')).items.map((s) => s.scientificName)).toEqual(['Tliltocatl vagans']);
    // a wildcard typed by a person is a letter, not "anything"
    expect((await search('%')).total).toBe(0);
  });

  it('searches by common name, by any word of it (names from memory, src/species/data/common-names.data.ts)', async () => {
    expect((await search('red-knee')).items.map((s) => s.scientificName)).toEqual(['Brachypelma hamorii', 'Brachypelma smithi']);
    expect((await search('chilean ro')).items.map((s) => s.scientificName)).toEqual(['Grammostola rosea']);
    expect((await search('birdeater')).items.map((s) => s.scientificName)).toEqual(['Theraphosa blondi']);
  });

  it('fills common names into a catalogue that had none, leaving a row an admin named alone', async () => {
    const conn = t.orm.em.getConnection();
    await conn.execute(`update "species" set "common_names" = '{}'`);
    await conn.execute(`update "species" set "common_names" = array['rosy']::text[] where "key" = 'grammostola-rosea'`);
    for (const sql of commonNamesFillSql(SPECIES_DATA)) await conn.execute(sql);
    expect((await search('chilean')).total).toBe(0);
    expect((await search('rosy')).items.map((s) => s.scientificName)).toEqual(['Grammostola rosea']);
    expect((await search('goliath')).items.map((s) => s.scientificName)).toEqual(['Theraphosa blondi']);
    expect(SPECIES_DATA.filter((r) => r.commonNames.length).length).toBe(Object.keys(COMMON_NAMES).length);
  });

  it('a species response carries cautions, sources and effective values', async () => {
    const [regalis] = (await search('Poecilotheria regalis')).items;
    expect(regalis.cautions.venom.value).toBe('medically-significant');
    expect(regalis.cautions.venom.source).toMatchObject({ kind: 'published' });
    expect(regalis.cautions.cautionText).toMatch(/local law/);
    expect(regalis.tradeListing.value).toBe('CITES Appendix II');
    expect(regalis.effective.pullWindow).toMatchObject({ value: { fromDay: 21, toDay: 30 }, from: 'species' });
    const [fimbriatus] = (await search('Chilobrachys')).items;
    expect(fimbriatus.effective.pullWindow).toEqual({ value: { fromDay: 21, toDay: 45 }, source: { kind: 'common-practice' }, from: 'default' });
  });

  it('the boolean venom flag became three-valued as the dataset says (docs/trade-facts.md §9: Ahmed et al. 2009, Fuchs et al. 2014, Hauke & Herzig 2020)', async () => {
    // The catalogue migration wrote the old boolean column; the conversion must land on the dataset's own value and source.
    const all = (await http().get('/api/species').query({ limit: 200 }).set('Authorization', keeper.bearer).expect(200)).body as Paged<SpeciesResponse>;
    const byName = new Map(all.items.map((s) => [s.scientificName, s]));
    for (const r of SPECIES_DATA) expect(byName.get(r.scientificName)?.cautions.venom, r.key).toEqual(r.venom);
  });

  it('tropical New World ground dwellers have their own pairing-to-sac days; the group value (seasonal genera) stays for the rest (docs/trade-facts.md §3)', async () => {
    const all = (await http().get('/api/species').query({ limit: 200 }).set('Authorization', keeper.bearer).expect(200)).body as Paged<SpeciesResponse>;
    const byName = new Map(all.items.map((s) => [s.scientificName, s]));
    for (const r of SPECIES_DATA) expect(byName.get(r.scientificName)?.breeding.pairingToSacDays, r.key).toEqual(r.pairingToSacDays);
    const lasiodora = byName.get('Lasiodora parahybana')!.effective.pairingToSacDays;
    expect(lasiodora).toMatchObject({ value: { min: 45, max: 180 }, from: 'species', source: { kind: 'memory' } });
    const smithi = byName.get('Brachypelma smithi')!.effective.pairingToSacDays;
    expect(smithi).toMatchObject({ value: { min: 120, max: 300 }, from: 'group', source: { kind: 'memory', note: expect.stringMatching(/^seasonal genera/) } });
    // the burrowers' figure has no source about burrowers: common practice, not a citation
    expect(byName.get('Pelinobius muticus')!.effective.pairingToSacDays).toMatchObject({ from: 'group', source: { kind: 'common-practice' } });
  });

  it('T. vagans eggs per sac says it rests on two sacs (Dor & Hénaut 2012; docs/trade-facts.md check value 3)', async () => {
    const [vagans] = (await search('Tliltocatl vagans')).items;
    expect(vagans.breeding.eggsPerSac).toEqual({
      value: { min: 200, max: 200 },
      source: { kind: 'published', citation: expect.stringMatching(/^Dor, A\. & Hénaut, Y\. 2012/), sampleSize: { count: 2, unit: 'sacs' } },
    });
  });

  it('an Old World species with no published bite is "not known" and still carries its group caution', async () => {
    const [balfouri] = (await search('Monocentropus balfouri')).items;
    expect(balfouri.cautions.venom).toMatchObject({ value: 'not-known', source: { kind: 'memory' } });
    expect(balfouri.cautions.urticatingHairs.value).toBe(false);
    expect(balfouri.cautions.cautionText).toMatch(/severe, long-lasting muscle cramps/);
    expect(balfouri.cautions.cautionText).toMatch(/local law/);
  });

  it('an admin sets the venom flag to one of the three values, with a source; anything else is 400', async () => {
    const [balfouri] = (await search('Monocentropus balfouri')).items;
    const url = `/api/species/${balfouri.id}`;
    const bad = await http().patch(url).set('Authorization', admin.bearer).send({ venom: true, sourceKind: 'memory' }).expect(400);
    expect(JSON.stringify(bad.body)).toMatch(/venom must be one of medically-significant, no-cases-known, not-known/);
    await http().patch(url).set('Authorization', keeper.bearer).send({ venom: 'no-cases-known', sourceKind: 'memory' }).expect(403);
    const ok = await http()
      .patch(url)
      .set('Authorization', admin.bearer)
      .send({ venom: 'medically-significant', sourceKind: 'published', sourceCitation: 'A bite report, 2026' })
      .expect(200);
    expect(ok.body.cautions.venom).toEqual({ value: 'medically-significant', source: { kind: 'published', citation: 'A bite report, 2026' } });
  });

  it('only an admin edits; a value change needs its source; bad ranges are 400', async () => {
    const [smithi] = (await search('Brachypelma smithi')).items;
    const url = `/api/species/${smithi.id}`;
    await http().patch(url).set('Authorization', keeper.bearer).send({ eggsMax: 700 }).expect(403);

    const noSource = await http().patch(url).set('Authorization', admin.bearer).send({ eggsMax: 700 }).expect(400);
    expect(noSource.body.details).toContainEqual({ field: 'sourceKind', message: expect.stringMatching(/where the new values come from/) });

    const upside = await http().patch(url).set('Authorization', admin.bearer).send({ pullFromDay: 40, pullToDay: 30, sourceKind: 'memory' }).expect(400);
    expect(upside.body.details[0]).toMatchObject({ field: 'pullFromDay', message: expect.stringMatching(/starts after it ends/) });

    const half = await http().patch(url).set('Authorization', admin.bearer).send({ eggsMin: null, sourceKind: 'memory' }).expect(400);
    expect(half.body.details[0].message).toMatch(/both ends/);

    const ok = await http()
      .patch(url)
      .set('Authorization', admin.bearer)
      .send({ eggsMin: 150, eggsMax: 650, sourceKind: 'published', sourceCitation: 'Our own breeding records 2026' })
      .expect(200);
    expect(ok.body.breeding.eggsPerSac).toEqual({ value: { min: 150, max: 650 }, source: { kind: 'published', citation: 'Our own breeding records 2026' } });
    // clearing both ends falls back to the group's default
    const cleared = await http().patch(url).set('Authorization', admin.bearer).send({ eggsMin: null, eggsMax: null, sourceKind: 'memory' }).expect(200);
    expect(cleared.body.breeding.eggsPerSac).toBeUndefined();
    expect(cleared.body.effective.eggsPerSac.from).toBe('group');
  });

  it('an unknown id is 404, a malformed one 400', async () => {
    await http().get('/api/species/00000000-0000-4000-8000-000000000000').set('Authorization', keeper.bearer).expect(404);
    const malformed = await http().get('/api/species/not-a-uuid').set('Authorization', keeper.bearer).expect(400);
    expect(malformed.body.message).toMatch(/does not name a record/);
  });
});
