import request from 'supertest';
import type { INestApplication } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/postgresql';
import type { EmailConfirmationResult, Language, LoginResponse, RegisterRequest } from '@broodsilk/shared';
import { EmailConfirmations } from '../../src/auth/email-confirmations.service';
import { User } from '../../src/users/user.entity';

let counter = 0;

export interface SignedIn extends LoginResponse {
  /** Authorization header value for Bearer calls (no CSRF needed). */
  bearer: string;
}

/** A fresh confirmation link for the account of `email`, made by the service as the registration job makes it (the token only the e-mail would carry). */
export async function confirmationToken(app: INestApplication, email: string): Promise<string> {
  const user = await app.get(EntityManager).fork().findOneOrFail(User, { email });
  return app.get(EmailConfirmations).newLink(user);
}

/** Opens the confirmation link as the e-mail's reader would; the answer carries the session. */
export async function confirmEmail(app: INestApplication, token: string): Promise<EmailConfirmationResult> {
  const res = await request(app.getHttpServer()).post('/api/auth/confirm-email').send({ token }).expect(200);
  return res.body as EmailConfirmationResult;
}

/** Registers an account (202, no session) and confirms its address through the confirmation route; returns the session that gives. */
export async function registerAndConfirm(app: INestApplication, body: RegisterRequest): Promise<SignedIn> {
  await request(app.getHttpServer()).post('/api/auth/register').send(body).expect(202);
  const { session } = await confirmEmail(app, await confirmationToken(app, body.email.trim().toLowerCase()));
  if (!session) throw new Error('A new account should be signed in once its address is confirmed.');
  return { ...session, bearer: `Bearer ${session.accessToken}` };
}

/** Registers a fresh keeper with a unique e-mail (in `language`, as a browser in it would), confirms its address and returns its session. */
export async function registerKeeper(app: INestApplication, name = 'Test Keeper', language?: Language): Promise<SignedIn & { password: string }> {
  counter += 1;
  const email = `keeper${counter}.${Date.now()}@example.test`;
  const password = 'correct horse battery';
  return { ...(await registerAndConfirm(app, { email, password, displayName: name, ...(language ? { language } : {}) })), password };
}

export async function login(app: INestApplication, email: string, password: string): Promise<SignedIn> {
  const res = await request(app.getHttpServer()).post('/api/auth/login').send({ email, password }).expect(200);
  const body = res.body as LoginResponse;
  return { ...body, bearer: `Bearer ${body.accessToken}` };
}
