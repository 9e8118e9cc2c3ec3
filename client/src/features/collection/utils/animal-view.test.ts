import { describe, expect, it } from 'vitest';
import { filtersFromParams, filtersToParams } from './animal-view';

describe('collection filters in the URL', () => {
  it('reads known values and ignores unknown ones', () => {
    const f = filtersFromParams(new URLSearchParams('q=%20rosa%20&sex=male&status=gone&sort=species&order=desc&limit=50&offset=100&view=males'));
    expect(f).toEqual({ q: 'rosa', sex: 'male', sort: 'species', order: 'desc', limit: 50, offset: 100 });
  });

  it('falls back to the defaults for nonsense paging', () => {
    expect(filtersFromParams(new URLSearchParams('limit=-3&offset=1.5&sort=weight'))).toEqual({ limit: 25, offset: 0, sort: 'label', order: 'asc' });
  });

  it('writes back only what differs from the defaults and keeps other params', () => {
    const p = filtersToParams({ q: 'rack b', sex: 'female', sort: 'label', order: 'asc', limit: 25, offset: 0 }, new URLSearchParams('view=males&sex=male'));
    expect(p.toString()).toBe('view=males&q=rack+b&sex=female');
    expect(filtersFromParams(p)).toMatchObject({ q: 'rack b', sex: 'female' });
  });
});
