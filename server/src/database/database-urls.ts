import { userInfo } from 'node:os';

/** `npm start`'s local PostgreSQL: role `app` owns the database (no password, loopback only). */
export const DEFAULT_DATABASE_URL = 'postgres://app@127.0.0.1:54329/broodsilk';

export interface DatabaseUrls {
  /** The owner: runs migrations, creates pg-boss's schema and queues, grants the runtime role its rights. */
  owner: string;
  /** The running app: reads and writes rows, owns nothing. */
  runtime: string;
}

/**
 * DATABASE_URL is the app's (runtime) connection; DATABASE_OWNER_URL the owner's, for migrations
 * and the command-line tools. Without an owner URL both are the same role (a local install works
 * with no configuration at all).
 */
export function databaseUrls(env: NodeJS.ProcessEnv = process.env): DatabaseUrls {
  const runtime = env.DATABASE_URL || DEFAULT_DATABASE_URL;
  return { owner: env.DATABASE_OWNER_URL || runtime, runtime };
}

/** The role a connection URL signs in as (libpq's default: PGUSER, then the operating-system user). */
export function roleOf(url: string, env: NodeJS.ProcessEnv = process.env): string {
  const name = decodeURIComponent(new URL(url).username);
  return name || env.PGUSER || userInfo().username;
}
