import request from 'supertest';
import type { INestApplication } from '@nestjs/common';
import type { CreateSacRequest, SacResponse } from '@broodsilk/shared';
import type { SignedIn } from './users';

/** Acknowledges the lay-date warnings for fixture sacs whose pairing is not what the spec is about. */
export const ANY_PAIRING: Pick<CreateSacRequest, 'acknowledgedWarnings' | 'warningReason'> = {
  acknowledgedWarnings: ['sac-without-pairing', 'sac-soon-after-pairing', 'sac-long-after-pairing'],
  warningReason: 'Fixture sac: its pairing is not what this spec is about.',
};

/** A sac of the project; the lay-date warnings are acknowledged unless `body` says otherwise. */
export async function createSac(app: INestApplication, who: SignedIn, projectId: string, body: CreateSacRequest): Promise<SacResponse> {
  const res = await request(app.getHttpServer())
    .post(`/api/projects/${projectId}/sacs`)
    .set('Authorization', who.bearer)
    .send({ ...ANY_PAIRING, ...body });
  if (res.status !== 201) throw new Error(`create sac answered ${res.status}: ${JSON.stringify(res.body)}`);
  return res.body as SacResponse;
}

export async function setTimeZone(app: INestApplication, who: SignedIn, timeZone: string): Promise<void> {
  const res = await request(app.getHttpServer()).patch('/api/users/me').set('Authorization', who.bearer).send({ timeZone });
  if (res.status !== 200) throw new Error(`set time zone answered ${res.status}: ${JSON.stringify(res.body)}`);
}
