import { restoreDatabase } from '../lib/backup/restoreDatabase';
import { backupSettings } from '../lib/backup/settings';

// npm run restore -- <backup folder>: puts a backup back into DATABASE_URL of a
// stopped app, after checking it; the replaced file is kept aside.
async function appAnswers(): Promise<string | null> {
  const url = process.env.APP_URL ?? `http://localhost:${process.env.PORT ?? 3000}`;
  try {
    const res = await fetch(`${url}/api/health`, { signal: AbortSignal.timeout(1500) });
    return res.ok ? url : null;
  } catch {
    return null;
  }
}

async function main() {
  const folder = process.argv.slice(2).find((a) => !a.startsWith('--'));
  if (!folder) throw new Error('Name the backup folder: npm run restore -- data/backups/pourproof-20261202-030000');
  const running = await appAnswers();
  if (running && !process.argv.includes('--force')) throw new Error(`The app still answers at ${running}: stop it first (or pass --force if that is another app)`);
  const s = backupSettings();
  const { replacedAside, manifest } = restoreDatabase({ folder, dbFile: s.dbFile, uploadsDir: s.uploadsDir });
  console.log(`[restore] ${folder} (taken ${manifest.createdAt}) → ${s.dbFile}; integrity ok`);
  console.log(replacedAside ? `[restore] the replaced database is kept as ${replacedAside}` : '[restore] there was no database to replace');
}

main().catch((err) => {
  console.error(`[restore] ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
