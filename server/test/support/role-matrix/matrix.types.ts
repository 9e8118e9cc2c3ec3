import type { INestApplication } from '@nestjs/common';
import type { MikroORM } from '@mikro-orm/postgresql';
import type { SignedIn } from '../users';

/** Who fires each row: the project's three members, a keeper outside it, and nobody signed in. */
export const ACTORS = ['anonymous', 'stranger', 'caretaker', 'partner', 'owner'] as const;
export type Actor = (typeof ACTORS)[number];
export type Member = 'owner' | 'partner' | 'caretaker';

/** `2xx` for any success; otherwise the exact status expected. */
export type Expected = '2xx' | 400 | 401 | 403 | 404 | 409 | 410;

export interface MatrixProject {
  id: string;
  memberIds: Record<Member, string>;
}

export interface MatrixFixture {
  app: INestApplication;
  orm: MikroORM;
  users: Record<Exclude<Actor, 'anonymous'>, SignedIn>;
  /** The shared project: owner, partner, caretaker as members; one pairing and terms v1 proposed. */
  project: MatrixProject;
  /** A new project with the same three members, for rows that change or end what they touch. */
  freshProject(): Promise<MatrixProject>;
}

export interface MatrixRequest {
  /** Values for the path's `:params`; `:id` and `:projectId` default to the shared project. */
  params?: Record<string, string>;
  body?: object;
}

export interface MatrixRow {
  method: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  /** Exactly as registered (see the failure message of the coverage test). */
  path: string;
  expect: Record<Actor, Expected>;
  /**
   * Builds the request for one actor. Called once per actor, in the order of ACTORS (denied actors
   * first, so they see the same state), so destructive rows can create fresh records here.
   */
  request?: (fx: MatrixFixture, actor: Actor) => Promise<MatrixRequest> | MatrixRequest;
}

/** Shorthand for the usual access shapes. */
export const OWNER_ONLY: Record<Actor, Expected> = { anonymous: 401, stranger: 404, caretaker: 403, partner: 403, owner: '2xx' };
export const ANY_MEMBER: Record<Actor, Expected> = { anonymous: 401, stranger: 404, caretaker: '2xx', partner: '2xx', owner: '2xx' };
export const OWNER_AND_PARTNER: Record<Actor, Expected> = { anonymous: 401, stranger: 404, caretaker: 403, partner: '2xx', owner: '2xx' };
