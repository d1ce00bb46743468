import 'server-only';
import fs from 'node:fs';
import path from 'node:path';
import { BACKUP_DB_NAME, type BackupManifest, integrityOf, MANIFEST_NAME } from './backupDatabase';

function stamp(d: Date): string {
  return d.toISOString().replace(/[-:]/g, '').replace('T', '-').slice(0, 15);
}

function copyDir(from: string, to: string) {
  fs.cpSync(from, to, { recursive: true });
}

/**
 * Restores a backup folder (lib/backup/backupDatabase.ts) into `dbFile` of a
 * stopped app: the copy is checked first (`PRAGMA integrity_check`), then the
 * file it replaces — with its WAL and shared-memory files, which belong to it —
 * is kept aside as `<dbFile>.replaced-<time>`, never deleted. The upload files
 * are restored the same way when the backup holds them and `uploadsDir` is given.
 */
export function restoreDatabase(opts: { folder: string; dbFile: string; uploadsDir?: string | null; now?: Date }): { replacedAside: string | null; manifest: BackupManifest } {
  const manifestFile = path.join(opts.folder, MANIFEST_NAME);
  if (!fs.existsSync(manifestFile)) throw new Error(`${opts.folder} is not a Pourproof backup (no ${MANIFEST_NAME})`);
  const manifest = JSON.parse(fs.readFileSync(manifestFile, 'utf8')) as BackupManifest;
  const copy = path.join(opts.folder, BACKUP_DB_NAME);
  const integrity = integrityOf(copy);
  if (integrity !== 'ok') throw new Error(`The backup's database failed its integrity check: ${integrity}`);

  const suffix = `.replaced-${stamp(opts.now ?? new Date())}`;
  let replacedAside: string | null = null;
  fs.mkdirSync(path.dirname(path.resolve(opts.dbFile)), { recursive: true });
  if (fs.existsSync(opts.dbFile)) {
    replacedAside = `${opts.dbFile}${suffix}`;
    for (const ext of ['', '-wal', '-shm']) if (fs.existsSync(opts.dbFile + ext)) fs.renameSync(opts.dbFile + ext, replacedAside + ext);
  }
  const incoming = `${opts.dbFile}.restoring`;
  fs.copyFileSync(copy, incoming);
  fs.renameSync(incoming, opts.dbFile);
  const after = integrityOf(opts.dbFile);
  if (after !== 'ok') throw new Error(`The restored file failed its integrity check: ${after}`);

  const savedUploads = path.join(opts.folder, 'uploads');
  if (opts.uploadsDir && manifest.uploads && fs.existsSync(savedUploads)) {
    if (fs.existsSync(opts.uploadsDir)) fs.renameSync(opts.uploadsDir, `${opts.uploadsDir}${suffix}`);
    copyDir(savedUploads, opts.uploadsDir);
  }
  return { replacedAside, manifest };
}
