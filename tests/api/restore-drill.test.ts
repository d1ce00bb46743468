import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { backupDatabase, listBackups } from '../../lib/backup/backupDatabase';
import { restoreDatabase } from '../../lib/backup/restoreDatabase';
import { isBuilt, startApp } from '../support/app-process';
import { drillDir, matchIdsIn, signUpOn, startWriters, untilAcked } from '../support/drills';

// The restore drill: a backup taken while writes run, restored into a fresh
// file, and the app started on it serves the same data the copy holds.
describe.skipIf(!isBuilt())('backup and restore drill', () => {
  it('backs up under writes, restores into a fresh file, and the app serves the same matches', async () => {
    const dir = drillDir('pourproof-restore-');
    try {
      const live = path.join(dir, 'live.db');
      const backups = path.join(dir, 'backups');
      const app = await startApp({ dbFile: live });
      const cookie = await signUpOn(app.baseUrl, 'drill@restore.test');
      const writers = startWriters(app.baseUrl, cookie);
      await untilAcked(writers, 5);
      const ackedBefore = [...writers.acked];
      const { folder, manifest } = await backupDatabase({ dbFile: live, backupDir: backups, keep: 2 });
      await new Promise((r) => setTimeout(r, 300));
      await writers.stop();
      await app.stop();
      expect(manifest.database.integrity).toBe('ok');
      expect(ackedBefore.length).toBeGreaterThan(0);

      const inCopy = matchIdsIn(path.join(folder, 'pourproof.db'));
      for (const id of ackedBefore) expect(inCopy.has(id), `acknowledged before the backup: ${id}`).toBe(true);

      const restored = path.join(dir, 'restored.db');
      expect(restoreDatabase({ folder, dbFile: restored }).replacedAside).toBeNull();
      const again = await startApp({ dbFile: restored });
      try {
        const me = await signUpOn(again.baseUrl, 'drill@restore.test');
        const list = (await (await fetch(`${again.baseUrl}/api/matches`, { headers: { cookie: me } })).json()) as { id: string }[];
        expect(new Set(list.map((m) => m.id))).toEqual(inCopy);
      } finally {
        await again.stop();
      }

      // Restoring over an existing file keeps the replaced one aside; old backups are pruned.
      const second = await backupDatabase({ dbFile: restored, backupDir: backups, keep: 2, now: new Date(Date.now() + 1000) });
      await backupDatabase({ dbFile: restored, backupDir: backups, keep: 2, now: new Date(Date.now() + 2000) });
      expect(listBackups(backups)).toHaveLength(2);
      expect(fs.existsSync(folder)).toBe(false);
      const { replacedAside } = restoreDatabase({ folder: second.folder, dbFile: live });
      expect(replacedAside && fs.existsSync(replacedAside)).toBe(true);
      expect(matchIdsIn(live)).toEqual(inCopy);
    } finally {
      fs.rmSync(dir, { recursive: true, force: true });
    }
  }, 120_000);

  it('refuses to restore a copy that fails its integrity check, leaving the database alone', async () => {
    const dir = drillDir('pourproof-restore-bad-');
    try {
      const folder = path.join(dir, 'pourproof-20260101-000000');
      fs.mkdirSync(folder);
      fs.writeFileSync(path.join(folder, 'manifest.json'), JSON.stringify({ createdAt: new Date().toISOString(), database: { file: 'pourproof.db', bytes: 10, integrity: 'ok' }, uploads: null }));
      fs.writeFileSync(path.join(folder, 'pourproof.db'), Buffer.concat([Buffer.from('SQLite format 3\0'), Buffer.alloc(4096, 0x5a)]));
      const target = path.join(dir, 'app.db');
      fs.writeFileSync(target, 'the current database');
      expect(() => restoreDatabase({ folder, dbFile: target })).toThrow();
      expect(fs.readFileSync(target, 'utf8')).toBe('the current database');
    } finally {
      fs.rmSync(dir, { recursive: true, force: true });
    }
  });
});
