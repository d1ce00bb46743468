import 'server-only';
import { env } from '@/lib/env';
import { openDatabase, type DB } from './open';

// The one database client of the app process, kept on globalThis so every
// bundle of the server (pages, route handlers, instrumentation) shares it.
const globalForDb = globalThis as unknown as { pourproofDb?: DB };

export function getDb(): DB {
  if (!globalForDb.pourproofDb) {
    globalForDb.pourproofDb = openDatabase(env().DATABASE_URL, { migrate: true });
  }
  return globalForDb.pourproofDb;
}
