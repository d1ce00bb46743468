import 'server-only';
import fs from 'node:fs';
import path from 'node:path';
import Database from 'better-sqlite3';

export const BACKUP_PREFIX = 'pourproof-';
export const BACKUP_DB_NAME = 'pourproof.db';
export const MANIFEST_NAME = 'manifest.json';

export type BackupManifest = {
  createdAt: string;
  database: { file: string; bytes: number; integrity: 'ok' };
  uploads: { files: number; bytes: number } | null;
};

/** `PRAGMA integrity_check` of a SQLite file, opened read-only: 'ok' or the first problems found. */
export function integrityOf(file: string): string {
  const db = new Database(file, { readonly: true, fileMustExist: true });
  try {
    const rows = db.pragma('integrity_check') as { integrity_check: string }[];
    return rows.map((r) => r.integrity_check).join('; ');
  } finally {
    db.close();
  }
}

function stamp(d: Date): string {
  return d.toISOString().replace(/[-:]/g, '').replace('T', '-').slice(0, 15);
}

function copyTree(from: string, to: string): { files: number; bytes: number } {
  let files = 0;
  let bytes = 0;
  fs.mkdirSync(to, { recursive: true });
  for (const e of fs.readdirSync(from, { withFileTypes: true })) {
    const src = path.join(from, e.name);
    const dst = path.join(to, e.name);
    if (e.isDirectory()) {
      const sub = copyTree(src, dst);
      files += sub.files;
      bytes += sub.bytes;
    } else if (e.isFile()) {
      fs.copyFileSync(src, dst);
      files += 1;
      bytes += fs.statSync(dst).size;
    }
  }
  return { files, bytes };
}

/**
 * A consistent copy of the live database, taken while the app runs, through
 * SQLite's online backup API (better-sqlite3's `backup()`: pages are copied in
 * steps, and writers that land meanwhile restart the copy of what changed, so
 * the copy is one committed state). The copy is checked with
 * `PRAGMA integrity_check` before it counts; the upload stand-in's files are
 * copied beside it when it is the photo store. Writes into a dated folder
 * under `backupDir` and keeps the newest `keep` folders.
 */
export async function backupDatabase(opts: { dbFile: string; backupDir: string; keep: number; uploadsDir?: string | null; now?: Date }): Promise<{ folder: string; manifest: BackupManifest }> {
  const now = opts.now ?? new Date();
  fs.mkdirSync(opts.backupDir, { recursive: true });
  let folder = path.join(opts.backupDir, `${BACKUP_PREFIX}${stamp(now)}`);
  for (let i = 2; fs.existsSync(folder); i++) folder = path.join(opts.backupDir, `${BACKUP_PREFIX}${stamp(now)}-${i}`);
  const partial = `${folder}.partial`;
  fs.rmSync(partial, { recursive: true, force: true });
  fs.mkdirSync(partial, { recursive: true });
  const target = path.join(partial, BACKUP_DB_NAME);

  const live = new Database(opts.dbFile, { fileMustExist: true });
  try {
    live.pragma('busy_timeout = 5000');
    await live.backup(target);
  } finally {
    live.close();
  }
  const integrity = integrityOf(target);
  if (integrity !== 'ok') {
    fs.rmSync(partial, { recursive: true, force: true });
    throw new Error(`The copy failed its integrity check: ${integrity}`);
  }
  const uploads = opts.uploadsDir && fs.existsSync(opts.uploadsDir) ? copyTree(opts.uploadsDir, path.join(partial, 'uploads')) : null;
  const manifest: BackupManifest = {
    createdAt: now.toISOString(),
    database: { file: BACKUP_DB_NAME, bytes: fs.statSync(target).size, integrity: 'ok' },
    uploads,
  };
  fs.writeFileSync(path.join(partial, MANIFEST_NAME), `${JSON.stringify(manifest, null, 2)}\n`);
  // Only a finished, checked copy gets its final name.
  fs.renameSync(partial, folder);
  pruneBackups(opts.backupDir, opts.keep);
  return { folder, manifest };
}

/** The finished backup folders under `backupDir`, newest first. */
export function listBackups(backupDir: string): string[] {
  if (!fs.existsSync(backupDir)) return [];
  return fs
    .readdirSync(backupDir, { withFileTypes: true })
    .filter((e) => e.isDirectory() && e.name.startsWith(BACKUP_PREFIX) && !e.name.endsWith('.partial') && fs.existsSync(path.join(backupDir, e.name, MANIFEST_NAME)))
    .map((e) => path.join(backupDir, e.name))
    .sort()
    .reverse();
}

export function pruneBackups(backupDir: string, keep: number) {
  for (const old of listBackups(backupDir).slice(keep)) fs.rmSync(old, { recursive: true, force: true });
}
