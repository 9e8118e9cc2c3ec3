import request from 'supertest';
import type { INestApplication } from '@nestjs/common';
import type { LoginResponse } from '@broodsilk/shared';

let counter = 0;

export interface SignedIn extends LoginResponse {
  /** Authorization header value for Bearer calls (no CSRF needed). */
  bearer: string;
}

/** Registers a fresh keeper with a unique e-mail and returns its session. */
export async function registerKeeper(app: INestApplication, name = 'Test Keeper'): Promise<SignedIn & { password: string }> {
  counter += 1;
  const email = `keeper${counter}.${Date.now()}@example.test`;
  const password = 'correct horse battery';
  const res = await request(app.getHttpServer()).post('/api/auth/register').send({ email, password, displayName: name }).expect(201);
  const body = res.body as LoginResponse;
  return { ...body, bearer: `Bearer ${body.accessToken}`, password };
}

export async function login(app: INestApplication, email: string, password: string): Promise<SignedIn> {
  const res = await request(app.getHttpServer()).post('/api/auth/login').send({ email, password }).expect(200);
  const body = res.body as LoginResponse;
  return { ...body, bearer: `Bearer ${body.accessToken}` };
}
