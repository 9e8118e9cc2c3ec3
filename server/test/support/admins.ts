import request from 'supertest';
import { Secret, TOTP } from 'otpauth';
import type { TotpEnrolment } from '@broodsilk/shared';
import { User } from '../../src/users/user.entity';
import type { TestApp } from './test-app';
import type { SignedIn } from './users';

/**
 * Makes a registered keeper an administrator with a second factor set up through the API, as a
 * real install requires before administrator routes open (the code from the reference library
 * `otpauth`). Returns the TOTP secret.
 */
export async function makeAdmin(t: TestApp, who: SignedIn & { password: string }): Promise<string> {
  const http = () => request(t.app.getHttpServer());
  await t.orm.em.fork().nativeUpdate(User, { id: who.user.id }, { role: 'admin' });
  const { secret } = (await http().post('/api/auth/second-factor/enrolment').set('Authorization', who.bearer).expect(201)).body as TotpEnrolment;
  const code = new TOTP({ secret: Secret.fromBase32(secret), algorithm: 'SHA1', digits: 6, period: 30 }).generate();
  await http().post('/api/auth/second-factor/enrolment/confirm').set('Authorization', who.bearer).send({ code, password: who.password }).expect(200);
  return secret;
}
