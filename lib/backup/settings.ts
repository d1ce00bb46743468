import 'server-only';
import fs from 'node:fs';
import path from 'node:path';
import { env } from '@/lib/env';

/** Backup settings from the environment (lib/env.ts), with the upload stand-in's folder when it is the store. */
export function backupSettings() {
  const e = env();
  const standInUploads = path.join(path.dirname(path.resolve(e.DATABASE_URL)), 'standins', 'uploads');
  const uploadsDir = e.UPLOADS_FAKE_DIR ?? (fs.existsSync(standInUploads) ? standInUploads : null);
  return { dbFile: e.DATABASE_URL, backupDir: e.BACKUP_DIR, keep: e.BACKUP_KEEP, everyHours: e.BACKUP_EVERY_HOURS, uploadsDir };
}
