import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addDays, todayIn, type AnimalSummary, type Paged } from '@broodsilk/shared';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { speciesId } from './support/fixtures/collection';
import { Animal } from '../src/animals/animal.entity';
import { User } from '../src/users/user.entity';
import { Species } from '../src/species/species.entity';

let t: TestApp;
let keeper: SignedIn;
let other: SignedIn;
const N = 300;
const SEXES = ['female', 'male', 'unsexed'] as const;
const STATUSES = ['active', 'active', 'sold', 'deceased'] as const;
const SPECIES = ['Tliltocatl vagans', 'Caribena versicolor', 'Poecilotheria regalis', 'Pelinobius muticus'];
const ids: Record<string, string> = {};
const http = () => request(t.app.getHttpServer());

interface Row {
  label: string;
  species: string;
  sex: string;
  status: string;
  mature: boolean;
  enclosure: string;
}
const rows: Row[] = [];

async function page(query: Record<string, string | number | boolean>): Promise<Paged<AnimalSummary>> {
  const res = await http().get('/api/animals').query(query).set('Authorization', keeper.bearer).expect(200);
  return res.body as Paged<AnimalSummary>;
}

beforeAll(async () => {
  t = await createTestApp();
  keeper = await registerKeeper(t.app, 'Big Collection');
  other = await registerKeeper(t.app, 'Neighbour');
  for (const name of SPECIES) ids[name] = await speciesId(t.orm, name);
  const today = todayIn('UTC', new Date());
  // Inserted straight into PostgreSQL: the route is tested elsewhere, this is about reading many rows.
  const em = t.orm.em.fork();
  const owner = em.getReference(User, keeper.user.id);
  for (let i = 0; i < N; i++) {
    const r: Row = {
      label: `BC-${String(i).padStart(3, '0')}`,
      species: SPECIES[i % 4],
      sex: SEXES[i % 3],
      status: STATUSES[i % 4],
      mature: i % 5 === 0,
      enclosure: i % 10 === 0 ? `Shelf Nord ${i}` : `Rack ${i % 7}`,
    };
    rows.push(r);
    em.create(Animal, {
      recordedBy: owner,
      ownerUser: owner,
      species: em.getReference(Species, ids[r.species]),
      label: r.label,
      sex: r.sex as never,
      status: r.status as never,
      statusOn: r.status === 'active' ? null : today,
      maturity: r.mature ? 'mature' : 'immature',
      maturedOn: r.mature && r.sex === 'male' ? addDays(today, -i) : null,
      enclosure: r.enclosure,
      createdAt: new Date(Date.UTC(2026, 0, 1) + i * 60_000),
    });
  }
  em.create(Animal, { recordedBy: em.getReference(User, other.user.id), species: em.getReference(Species, ids[SPECIES[0]]), label: 'BC-000', sex: 'female' });
  await em.flush();
});
afterAll(async () => {
  await t.close();
});

describe('paging, sorting and filtering against PostgreSQL', () => {
  it('pages cover every animal once, in created order by default, and the total counts only mine', async () => {
    const seen: string[] = [];
    for (let offset = 0; offset < N; offset += 70) {
      const p = await page({ limit: 70, offset });
      expect(p.total).toBe(N);
      seen.push(...p.items.map((a) => a.label));
    }
    expect(seen).toEqual(rows.map((r) => r.label));
  });

  it('sorts by label descending and by species ascending', async () => {
    const desc = await page({ sort: 'label', order: 'desc', limit: 5 });
    expect(desc.items.map((a) => a.label)).toEqual(['BC-299', 'BC-298', 'BC-297', 'BC-296', 'BC-295']);
    const bySpecies = await page({ sort: 'species', limit: 500 });
    const names = bySpecies.items.map((a) => a.species.scientificName);
    expect(names).toEqual([...names].sort((a, b) => a.localeCompare(b)));
    expect(names[0]).toBe('Caribena versicolor');
  });

  it('sorts by maturing date with undated animals last', async () => {
    const p = await page({ sort: 'maturedOn', order: 'desc', limit: 500 });
    const dated = p.items.filter((a) => a.maturedOn !== null);
    const expectedDated = rows.filter((r) => r.mature && r.sex === 'male').length;
    expect(dated.length).toBe(expectedDated);
    expect(p.items.slice(0, dated.length).every((a) => a.maturedOn !== null)).toBe(true);
    const dates = dated.map((a) => a.maturedOn!);
    expect(dates).toEqual([...dates].sort().reverse());
  });

  it('filters by species, sex, status and maturity, with matching totals', async () => {
    const want = (f: (r: Row) => boolean) => rows.filter(f).length;
    expect((await page({ speciesId: ids['Caribena versicolor'] })).total).toBe(want((r) => r.species === 'Caribena versicolor'));
    expect((await page({ sex: 'male' })).total).toBe(want((r) => r.sex === 'male'));
    expect((await page({ status: 'sold' })).total).toBe(want((r) => r.status === 'sold'));
    expect((await page({ mature: true })).total).toBe(want((r) => r.mature));
    expect((await page({ mature: false, sex: 'female', status: 'active' })).total).toBe(want((r) => !r.mature && r.sex === 'female' && r.status === 'active'));
  });

  it('text search covers label, enclosure and species names, old names included', async () => {
    expect((await page({ q: 'bc-01' })).total).toBe(want((r) => r.label.toLowerCase().includes('bc-01')));
    expect((await page({ q: 'shelf nord' })).total).toBe(want((r) => r.enclosure.startsWith('Shelf Nord')));
    // former name of Pelinobius muticus
    expect((await page({ q: 'citharischius' })).total).toBe(want((r) => r.species === 'Pelinobius muticus'));
    expect((await page({ q: 'versicolor', sex: 'male' })).total).toBe(want((r) => r.species === 'Caribena versicolor' && r.sex === 'male'));
    function want(f: (r: Row) => boolean) {
      return rows.filter(f).length;
    }
  });

  it('refuses bad query parameters with a message', async () => {
    const res = await http().get('/api/animals').query({ sort: 'price', limit: 0 }).set('Authorization', keeper.bearer).expect(400);
    expect(res.body.details.map((d: { field: string }) => d.field).sort()).toEqual(['limit', 'sort']);
  });
});
