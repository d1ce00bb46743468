import 'server-only';
import { openDatabase, type DB } from './open';

// The one database client of the app process.
const globalForDb = globalThis as unknown as { pourproofDb?: DB };

export function db(): DB {
  if (!globalForDb.pourproofDb) {
    globalForDb.pourproofDb = openDatabase(process.env.DATABASE_URL ?? './data/pourproof.db', { migrate: true });
  }
  return globalForDb.pourproofDb;
}

export type { DB };
