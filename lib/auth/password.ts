import 'server-only';
import { hash, verify } from '@node-rs/argon2';

// argon2id with the OWASP Password Storage Cheat Sheet's first configuration:
// m = 19 MiB (19456 KiB), t = 2, p = 1.
export const ARGON2_OPTIONS = { memoryCost: 19456, timeCost: 2, parallelism: 1, outputLen: 32 } as const;

export function hashPassword(password: string): Promise<string> {
  // @node-rs/argon2 defaults to argon2id (algorithm 2).
  return hash(password, ARGON2_OPTIONS);
}

export async function verifyPassword(hashed: string, password: string): Promise<boolean> {
  try {
    return await verify(hashed, password);
  } catch {
    return false;
  }
}

// A hash to verify against when the e-mail is unknown, so both cases cost the
// same time and answer the same way.
let dummy: Promise<string> | undefined;
export function dummyHash(): Promise<string> {
  dummy ??= hashPassword('not-a-real-password-for-timing');
  return dummy;
}
