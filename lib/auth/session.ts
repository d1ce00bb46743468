import 'server-only';
import type Database from 'better-sqlite3';
import { eq } from 'drizzle-orm';
import type { DB } from '@/db/open';
import type { Member } from '@/db/queries/members';
import { sessions } from '@/db/schema';
import { env } from '@/lib/env';
import { createLucia, type AppLucia } from './lucia';
import { newToken, sha256Hex } from './tokens';

// Sessions: the cookie carries a random token; the database keeps only its
// SHA-256 hash as the session id. Lucia creates sessions and their cookies;
// validation is one query here (below), with lucia's sliding (idle) expiry;
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

type SessionRow = {
  userId: string;
  expiresAt: number;
  absoluteExpiresAt: number;
  email: string;
  name: string;
  role: Member['role'] | null;
  teamId: string | null;
  teamName: string | null;
};

const lookups = new WeakMap<DB, Database.Statement<[string], SessionRow>>();

// The whole session check is one indexed query (the session's primary key,
// then the user's and membership's keys): the session with its member.
function lookup(database: DB) {
  let stmt = lookups.get(database);
  if (!stmt) {
    stmt = database.$client.prepare<[string], SessionRow>(
      `select s.user_id as userId, s.expires_at as expiresAt, s.absolute_expires_at as absoluteExpiresAt,
              u.email as email, u.name as name, m.role as role, t.id as teamId, t.name as teamName
         from sessions s
         join users u on u.id = s.user_id
         left join memberships m on m.user_id = s.user_id
         left join teams t on t.id = m.team_id
        where s.id = ?`,
    );
    lookups.set(database, stmt);
  }
  return stmt;
}

const NONE = { session: null, user: null, member: null, fresh: false } as const;

/**
 * Reads the session of a cookie token with its member in one query. Expiry
 * follows lucia's sliding rule (Lucia v3, "Session validation"): a session
 * idle past its lifetime ends; one past half of it is extended to a full
 * lifetime again (`fresh`: the cookie's expiry should move too) — so the write
 * happens at most about once per half lifetime. The absolute lifetime ends a
 * session however active it is.
 */
export async function validateSessionToken(database: DB, token: string) {
  if (!/^[0-9a-f]{40}$/.test(token)) return NONE;
  const id = sha256Hex(token);
  const row = lookup(database).get(id);
  if (!row) return NONE;
  const now = Math.floor(Date.now() / 1000);
  if (row.expiresAt <= now || row.absoluteExpiresAt <= now) {
    database.delete(sessions).where(eq(sessions.id, id)).run();
    return NONE;
  }
  const idle = env().SESSION_IDLE_DAYS * 86400;
  let expiresAt = row.expiresAt;
  const fresh = expiresAt - now < idle / 2;
  if (fresh) {
    expiresAt = now + idle;
    database.update(sessions).set({ expiresAt }).where(eq(sessions.id, id)).run();
  }
  const user = { id: row.userId, email: row.email, name: row.name };
  const member: Member | null = row.role && row.teamId ? { user, team: { id: row.teamId, name: row.teamName ?? '' }, role: row.role } : null;
  return { session: { id, userId: row.userId, expiresAt: new Date(expiresAt * 1000), absoluteExpiresAt: row.absoluteExpiresAt, fresh }, user, member, fresh } as const;
}

export async function invalidateSessionToken(database: DB, token: string) {
  await luciaFor(database).invalidateSession(sha256Hex(token));
}

export function endUserSessions(database: DB, userId: string) {
  database.delete(sessions).where(eq(sessions.userId, userId)).run();
}
