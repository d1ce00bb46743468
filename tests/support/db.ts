import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { type DB, openDatabase } from '../../db/open';

// A fresh SQLite file migrated with the real migrations.
export function freshDb(): { database: DB; file: string; cleanup: () => void } {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'pourproof-db-'));
  const file = path.join(dir, 'test.db');
  const database = openDatabase(file, { migrate: true });
  return {
    database,
    file,
    cleanup: () => {
      database.$client.close();
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}
