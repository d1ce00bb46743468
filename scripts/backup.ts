import { backupDatabase } from '../lib/backup/backupDatabase';
import { backupSettings } from '../lib/backup/settings';

// npm run backup: a consistent, checked copy of the live database (the app may
// be running) and the upload stand-in's files, into a dated folder under
// BACKUP_DIR, keeping the newest BACKUP_KEEP.
async function main() {
  const s = backupSettings();
  const { folder, manifest } = await backupDatabase(s);
  const up = manifest.uploads ? `, ${manifest.uploads.files} upload files` : '';
  console.log(`[backup] ${s.dbFile} → ${folder} (${manifest.database.bytes} bytes, integrity ok${up}); keeping the newest ${s.keep}`);
}

main().catch((err) => {
  console.error(`[backup] failed: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
