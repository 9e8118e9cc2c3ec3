/**
 * Property-based tests (fast-check, fixed seed, bounded runs per route): every request body and
 * query the API takes is sent hostile values by the record's owner, so validation and the
 * services behind it are reached. Never a 5xx; a refused request writes no row.
 */
import fc from 'fast-check';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from './support/test-app';
import { registerKeeper, type SignedIn } from './support/users';
import { ownedRecords, urlFor } from './support/owned-records';
import { rowCounts } from './support/row-counts';
import { dtoFields, routeInputs, type RouteInput } from './support/route-dtos';

const SEED = 20261202;
const RUNS = 10;
/** Would end the owner's session or swap their feed link and so stop the rest of the run; they take no body. */
const SKIP = new Set(['POST /api/auth/logout', 'POST /api/calendar/feed/rotate']);

let t: TestApp;
let owner: SignedIn;
let ids: Record<string, string>;
let inputs: RouteInput[];

beforeAll(async () => {
  t = await createTestApp();
  owner = await registerKeeper(t.app, 'Hostile Owner');
  ids = await ownedRecords(t, owner);
  inputs = routeInputs(t.app).filter((r) => !SKIP.has(`${r.method} ${r.path}`));
}, 90_000);
afterAll(async () => {
  await t.close();
});

const nested = (depth: number): unknown => (depth === 0 ? 'deep' : { a: nested(depth - 1) });

/** Strings a form would never send: NUL and other control characters, lone surrogates, huge, impossible dates. */
const hostileString = fc.oneof(
  fc.string({ maxLength: 12 }),
  fc.string({ unit: fc.constantFrom('\u0000', '\u0001', '\u001b', '\u007f', '\u2028', '\ud800', '\ufeff', 'a', '='), maxLength: 8 }),
  fc.constantFrom(
    '2026-02-30',
    '2026-02-30T00:00Z',
    '2026-03-01T24:00Z',
    '0000-01-01',
    '0000-01-01T00:00:00Z',
    '99999-01-01',
    '2026-03-01T10:00:00',
    '-1',
    '1e400',
    'NaN',
    '00000000-0000-0000-0000-000000000000',
    'x'.repeat(5_000),
  ),
);
/** Numbers outside every range: huge, negative, fractional, past 32 and 64 bits. */
const hostileNumber = fc.oneof(
  fc.constantFrom(1e308, -1e308, 2 ** 31, -(2 ** 31) - 1, 2 ** 63, Number.MAX_SAFE_INTEGER + 2, -1, -0, 0.5, 1e-7),
  fc.integer(),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
);
const leaf = fc.oneof(hostileString, hostileNumber, fc.boolean(), fc.constant(null));
const hostileValue = fc.oneof(
  { weight: 4, arbitrary: leaf },
  { weight: 1, arbitrary: fc.array(leaf, { maxLength: 3 }) },
  { weight: 1, arbitrary: fc.dictionary(fc.constantFrom('__proto__', 'constructor', 'prototype', 'a'), leaf, { maxKeys: 2 }) },
  { weight: 1, arbitrary: fc.constant(nested(40)) },
);

/**
 * Half the time one field alone (so an all-optional update reaches the service with it), else any
 * subset of the DTO's fields plus sometimes a `__proto__` or unknown key.
 */
function hostileBody(fields: string[]): fc.Arbitrary<Record<string, unknown>> {
  if (!fields.length) return fc.constant({});
  const one = fc.dictionary(fc.constantFrom(...fields), hostileValue, { minKeys: 1, maxKeys: 1 });
  const many = fc.dictionary(fc.constantFrom(...fields), hostileValue, { maxKeys: fields.length });
  const extra = fc.option(fc.dictionary(fc.constantFrom('__proto__', 'constructor', 'isAdmin'), hostileValue, { maxKeys: 1 }), { nil: {} });
  return fc.oneof(
    one,
    fc.tuple(many, extra).map(([a, b]) => ({ ...a, ...b })),
  );
}

/** Query strings (text on the wire): one hostile parameter at a time, as every query field is optional. */
function hostileQuery(fields: string[]): fc.Arbitrary<Record<string, string>> {
  return fc.dictionary(fc.constantFrom(...fields), fc.oneof(hostileString, hostileNumber.map(String)), { minKeys: 1, maxKeys: 1 });
}

async function send(r: RouteInput, body: unknown, query: Record<string, string>): Promise<void> {
  const before = await rowCounts(t.orm);
  const http = request(t.app.getHttpServer());
  const res = await http[r.method.toLowerCase() as 'post'](urlFor(r, ids))
    .set('Authorization', owner.bearer)
    .query(query)
    .send(body as object);
  const what = `${r.method} ${r.path} ${JSON.stringify({ body, query }).slice(0, 300)} → ${res.status} ${JSON.stringify(res.body).slice(0, 200)}`;
  expect(res.status, what).toBeLessThan(500);
  if (res.status >= 400) expect(await rowCounts(t.orm), what).toEqual(before);
}

describe('hostile input', () => {
  it('reaches the bodies and queries of the API (the metadata read is not empty)', () => {
    expect(inputs.filter((r) => r.body).length).toBeGreaterThan(20);
    expect(inputs.filter((r) => r.query).length).toBeGreaterThan(1);
  });

  it('bodies: never a 5xx, and a refused request writes nothing', async () => {
    for (const r of inputs.filter((x) => x.body)) {
      await fc.assert(
        fc.asyncProperty(hostileBody(dtoFields(r.body!)), (body) => send(r, body, {})),
        { seed: SEED, numRuns: RUNS, endOnFailure: true },
      );
    }
  }, 240_000);

  it('queries: never a 5xx, and a refused request writes nothing', async () => {
    for (const r of inputs.filter((x) => x.query)) {
      await fc.assert(
        fc.asyncProperty(hostileQuery(dtoFields(r.query!)), (query) => send(r, undefined, query)),
        { seed: SEED, numRuns: RUNS * 2, endOnFailure: true },
      );
    }
  }, 120_000);
});
