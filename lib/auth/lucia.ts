import 'server-only';
import { DrizzleSQLiteAdapter } from '@lucia-auth/adapter-drizzle';
import { Lucia, TimeSpan } from 'lucia';
import type { DB } from '@/db/open';
import { sessions, users } from '@/db/schema';
import { env } from '@/lib/env';
import { SESSION_COOKIE } from './sessionCookieName';

export { SESSION_COOKIE };

export function secureCookies(): boolean {
  const { SECURE_COOKIES: setting, APP_URL } = env();
  if (setting === '1') return true;
  if (setting === '0') return false;
  return process.env.NODE_ENV === 'production' && (APP_URL ?? '').startsWith('https:');
}

export function createLucia(database: DB, idleDays: number) {
  const adapter = new DrizzleSQLiteAdapter(database, sessions, users);
  return new Lucia(adapter, {
    sessionExpiresIn: new TimeSpan(idleDays, 'd'),
    sessionCookie: {
      name: SESSION_COOKIE,
      expires: true,
      attributes: { secure: secureCookies(), sameSite: 'lax' },
    },
    getSessionAttributes: (attrs) => ({ absoluteExpiresAt: attrs.absoluteExpiresAt }),
    getUserAttributes: (attrs) => ({ email: attrs.email, name: attrs.name }),
  });
}

export type AppLucia = ReturnType<typeof createLucia>;

declare module 'lucia' {
  interface Register {
    Lucia: AppLucia;
    DatabaseSessionAttributes: { absoluteExpiresAt: number };
    DatabaseUserAttributes: { email: string; name: string };
  }
}
