import 'server-only';
import fs from 'node:fs';
import { backupDatabase, listBackups } from './backupDatabase';
import { backupSettings } from './settings';

const g = globalThis as unknown as { pourproofBackupTimer?: NodeJS.Timeout };
const CHECK_MS = 15 * 60_000;

// With BACKUP_EVERY_HOURS > 0 the app backs itself up: every quarter hour it
// looks at the newest backup and takes a new one when that is older than the
// interval (so a restart does not skip a day, nor take one twice).
export function startBackupSchedule() {
  const { everyHours } = backupSettings();
  if (everyHours <= 0 || g.pourproofBackupTimer) return;
  const due = async () => {
    const s = backupSettings();
    const newest = listBackups(s.backupDir)[0];
    const age = newest ? Date.now() - fs.statSync(newest).mtimeMs : Infinity;
    if (age < s.everyHours * 3_600_000) return;
    const { folder } = await backupDatabase(s);
    console.info(`[backup] wrote ${folder}`);
  };
  const tick = () => void due().catch((err) => console.error('[backup] failed', err));
  g.pourproofBackupTimer = setInterval(tick, CHECK_MS);
  g.pourproofBackupTimer.unref();
  setTimeout(tick, 60_000).unref();
}
