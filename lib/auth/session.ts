import { eq } from 'drizzle-orm';
import type { DB } from '@/db/open';
import { sessions } from '@/db/schema';
import { env } from '@/lib/env';
import { createLucia, type AppLucia } from './lucia';
import { newToken, sha256Hex } from './tokens';

// Sessions: the cookie carries a random token; the database keeps only its
// SHA-256 hash as the session id. Lucia handles the sliding (idle) expiry;
// absoluteExpiresAt (unix seconds) ends a session however active it is.

const cache = new WeakMap<DB, AppLucia>();


export function luciaFor(database: DB): AppLucia {
  let l = cache.get(database);
  if (!l) {
    l = createLucia(database, env().SESSION_IDLE_DAYS);
    cache.set(database, l);
  }
  return l;
}

export async function createUserSession(database: DB, userId: string) {
  const token = newToken();
  const absoluteExpiresAt = Math.floor(Date.now() / 1000 + env().SESSION_ABSOLUTE_DAYS * 86400);
  const session = await luciaFor(database).createSession(userId, { absoluteExpiresAt }, { sessionId: sha256Hex(token) });
  return { token, session };
}

export async function validateSessionToken(database: DB, token: string) {
  if (!/^[0-9a-f]{40}$/.test(token)) return { session: null, user: null, fresh: false } as const;
  const lucia = luciaFor(database);
  const id = sha256Hex(token);
  const { session, user } = await lucia.validateSession(id);
  if (!session || !user) return { session: null, user: null, fresh: false } as const;
  if (session.absoluteExpiresAt * 1000 <= Date.now()) {
    await lucia.invalidateSession(id);
    return { session: null, user: null, fresh: false } as const;
  }
  return { session, user, fresh: session.fresh } as const;
}

export async function invalidateSessionToken(database: DB, token: string) {
  await luciaFor(database).invalidateSession(sha256Hex(token));
}

export function endUserSessions(database: DB, userId: string) {
  database.delete(sessions).where(eq(sessions.userId, userId)).run();
}
