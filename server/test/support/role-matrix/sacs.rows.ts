import request from 'supertest';
import { ANY_MEMBER, OWNER_ONLY, type Actor, type Expected, type MatrixFixture, type MatrixRequest, type MatrixRow } from './matrix.types';
import { ANY_PAIRING } from '../sacs';

/** The owner and caretakers write the care log and the counts; partners read them (docs/product.md, Roles). */
const OWNER_AND_CARETAKER: Record<Actor, Expected> = { anonymous: 401, stranger: 404, caretaker: '2xx', partner: 403, owner: '2xx' };

/** Few eggs for the species, acknowledged (docs/trade-facts.md check value 8); three kept back as their own batch. */
const OPENING = {
  healthyEggs: 10,
  eggsWithLegs: 20,
  nymphs: 0,
  darkEggs: 2,
  spoiledEggs: 1,
  keptBack: 3,
  acknowledgedWarnings: ['eggs-outside-species-range'],
  warningReason: 'Matrix sac',
};

async function newSac(fx: MatrixFixture, opened: boolean): Promise<string> {
  const http = request(fx.app.getHttpServer());
  const layDate = new Date(Date.now() - 30 * 86_400_000).toISOString().slice(0, 10);
  const pulledAt = new Date(Date.now() - 3 * 86_400_000).toISOString();
  const res = await http
    .post(`/api/projects/${fx.project.id}/sacs`)
    .set('Authorization', fx.users.owner.bearer)
    .send({ layDate, pulledAt, ...ANY_PAIRING });
  if (res.status !== 201) throw new Error(`create sac answered ${res.status}: ${JSON.stringify(res.body)}`);
  if (opened) {
    const o = await request(fx.app.getHttpServer()).post(`/api/sacs/${res.body.id}/opening`).set('Authorization', fx.users.owner.bearer).send(OPENING);
    if (o.status !== 201) throw new Error(`opening answered ${o.status}: ${JSON.stringify(o.body)}`);
  }
  return res.body.id as string;
}

/** One opened sac of the shared project for all read rows. */
let shared: Promise<string> | null = null;
const sharedSac = (fx: MatrixFixture) => (shared ??= newSac(fx, true));

/** A sac made for one row and reused by each actor of that row (denied actors go first, so the owner's write still finds it untouched). */
function perRow(opened: boolean) {
  let sac: Promise<string> | null = null;
  return (fx: MatrixFixture) => (sac ??= newSac(fx, opened));
}

const onSac =
  (pick: (fx: MatrixFixture) => Promise<string>, body?: object) =>
  async (fx: MatrixFixture): Promise<MatrixRequest> => ({ params: { id: await pick(fx) }, ...(body ? { body } : {}) });
const openingSac = perRow(false);
const endingSac = perRow(true);

/** A sac still with the mother, for the pull row. */
let unpulled: Promise<string> | null = null;
const withMotherSac = (fx: MatrixFixture) =>
  (unpulled ??= request(fx.app.getHttpServer())
    .post(`/api/projects/${fx.project.id}/sacs`)
    .set('Authorization', fx.users.owner.bearer)
    .send({ layDate: new Date(Date.now() - 25 * 86_400_000).toISOString().slice(0, 10), ...ANY_PAIRING })
    .then((res) => {
      if (res.status !== 201) throw new Error(`create sac answered ${res.status}: ${JSON.stringify(res.body)}`);
      return res.body.id as string;
    }));

export const rows: MatrixRow[] = [
  { method: 'GET', path: '/api/projects/:projectId/sacs', expect: ANY_MEMBER },
  {
    method: 'POST',
    path: '/api/projects/:projectId/sacs',
    expect: OWNER_ONLY,
    request: () => ({ body: { layDate: new Date().toISOString().slice(0, 10), ...ANY_PAIRING } }),
  },
  { method: 'GET', path: '/api/sacs/:id', expect: ANY_MEMBER, request: onSac(sharedSac) },
  { method: 'PATCH', path: '/api/sacs/:id', expect: OWNER_ONLY, request: onSac(sharedSac, { notes: 'Matrix note' }) },
  // The bad-news preview writes nothing; only the keeper writes to the partners (docs/product.md, Partner updates).
  {
    method: 'POST',
    path: '/api/sacs/:id/failure-notice-preview',
    expect: OWNER_ONLY,
    request: onSac(sharedSac, { failureReason: 'spoiled', partnerMessage: 'Matrix message' }),
  },
  // Caretakers pull and open only where the owner switched that on; the matrix project has it off.
  { method: 'POST', path: '/api/sacs/:id/pull', expect: OWNER_ONLY, request: onSac(withMotherSac, {}) },
  {
    method: 'PUT',
    path: '/api/projects/:projectId/incubator-rights',
    expect: OWNER_ONLY,
    request: () => ({ body: { caretakersMayPullAndOpen: false } }),
  },
  { method: 'GET', path: '/api/sacs/:id/log', expect: ANY_MEMBER, request: onSac(sharedSac) },
  { method: 'POST', path: '/api/sacs/:id/log', expect: OWNER_AND_CARETAKER, request: onSac(sharedSac, { kind: 'check', text: 'Matrix check' }) },
  { method: 'GET', path: '/api/sacs/:id/opening', expect: ANY_MEMBER, request: onSac(sharedSac) },
  { method: 'POST', path: '/api/sacs/:id/opening', expect: OWNER_ONLY, request: onSac(openingSac, OPENING) },
  // No file attached: the owner gets past the guard to the "attach a photo" 400; everyone else is stopped before.
  { method: 'POST', path: '/api/sacs/:id/opening/photos', expect: { ...OWNER_ONLY, owner: 400 }, request: onSac(sharedSac) },
  { method: 'GET', path: '/api/sacs/:id/counts', expect: ANY_MEMBER, request: onSac(sharedSac) },
  {
    method: 'POST',
    path: '/api/sacs/:id/counts',
    expect: OWNER_AND_CARETAKER,
    request: onSac(sharedSac, { stage: 'eggs-with-legs', alive: 26, lost: 1, lossReason: 'mould' }),
  },
  { method: 'GET', path: '/api/sacs/:id/kept-back', expect: ANY_MEMBER, request: onSac(sharedSac) },
  { method: 'POST', path: '/api/sacs/:id/kept-back/log', expect: OWNER_AND_CARETAKER, request: onSac(sharedSac, { kind: 'roll' }) },
  {
    method: 'POST',
    path: '/api/sacs/:id/kept-back/end',
    expect: OWNER_ONLY,
    request: onSac(endingSac, { outcome: 'written-off', reason: 'All three turned dark.' }),
  },
];
