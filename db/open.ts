import 'server-only';
import fs from 'node:fs';
import path from 'node:path';
import Database from 'better-sqlite3';
import { drizzle, type BetterSQLite3Database } from 'drizzle-orm/better-sqlite3';
import { migrate } from 'drizzle-orm/better-sqlite3/migrator';
import * as schema from './schema';

export type DB = BetterSQLite3Database<typeof schema> & { $client: Database.Database };

export const MIGRATIONS_DIR = path.join(process.cwd(), 'db', 'migrations');

// Opens a SQLite file with the pragmas the app relies on, and checks they hold:
// WAL for concurrent readers, foreign keys enforced, a busy timeout so a
// second writer waits instead of failing.
export function openDatabase(file: string, opts: { migrate?: boolean } = {}): DB {
  if (file !== ':memory:') fs.mkdirSync(path.dirname(path.resolve(file)), { recursive: true });
  const sqlite = new Database(file);
  sqlite.pragma('journal_mode = WAL');
  sqlite.pragma('foreign_keys = ON');
  sqlite.pragma('busy_timeout = 5000');
  sqlite.pragma('synchronous = NORMAL');
  assertPragmas(sqlite, file);
  const database = drizzle(sqlite, { schema }) as DB;
  if (opts.migrate) migrate(database, { migrationsFolder: MIGRATIONS_DIR });
  return database;
}

export function assertPragmas(sqlite: Database.Database, file: string) {
  const journal = sqlite.pragma('journal_mode', { simple: true });
  const fk = sqlite.pragma('foreign_keys', { simple: true });
  const busy = sqlite.pragma('busy_timeout', { simple: true });
  if ((file !== ':memory:' && journal !== 'wal') || fk !== 1 || Number(busy) < 1000) {
    throw new Error(`SQLite pragmas not in force: journal_mode=${journal} foreign_keys=${fk} busy_timeout=${busy}`);
  }
}
