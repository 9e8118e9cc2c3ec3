import { hash, verify, Algorithm } from '@node-rs/argon2';

/** How many argon2 computations this process ran (hash or verify): lets tests show two paths do the same work without timing them. */
export const argon2Runs = { count: 0 };

/** argon2id with the library's defaults (19 MiB, t=2), the OWASP baseline. */
export async function hashPassword(password: string): Promise<string> {
  argon2Runs.count += 1;
  return hash(password, { algorithm: Algorithm.Argon2id });
}

export async function verifyPassword(hashed: string, password: string): Promise<boolean> {
  argon2Runs.count += 1;
  try {
    return await verify(hashed, password);
  } catch {
    return false;
  }
}

/** A fixed hash to verify against when the e-mail is unknown, so timing does not reveal it. */
let dummyHash: Promise<string> | undefined;
export function dummyPasswordHash(): Promise<string> {
  dummyHash ??= hashPassword('not-a-real-password-just-for-timing');
  return dummyHash;
}
