import { hash, verify, Algorithm } from '@node-rs/argon2';

/** argon2id with the library's defaults (19 MiB, t=2), the OWASP baseline. */
export async function hashPassword(password: string): Promise<string> {
  return hash(password, { algorithm: Algorithm.Argon2id });
}

export async function verifyPassword(hashed: string, password: string): Promise<boolean> {
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
