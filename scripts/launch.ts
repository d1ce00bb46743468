import { spawn } from 'node:child_process';
import path from 'node:path';
import { openDatabase } from '../db/open';
import { demoTeamId, seedDemo } from './seed/seed-demo';
import { seedDemoPours } from './seed/seed-demo-pours';
import { settleMail } from '../lib/mail/queue';
import { seedDemoStandard } from './seed/seed-demo-standard';
import { buildApp } from './build-app';
import { buildIsStale } from './build-stale';
import { startStandIns } from './standins';

// One launcher for `npm run demo` (production build) and `npm run dev`:
// migrate, seed the demo shop into an empty database, start the local
// stand-ins, then the app; everything stops together.
const mode = process.argv[2] === 'dev' ? 'dev' : 'demo';
const root = path.resolve(__dirname, '..');
const port = process.env.PORT ?? '3000';
const dbFile = process.env.DATABASE_URL ?? './data/pourproof.db';

async function main() {
  const standIns = await startStandIns({ dataDir: path.join(path.dirname(path.resolve(dbFile)), 'standins') });
  Object.assign(process.env, { ...standIns.env, ...process.env });
  const database = openDatabase(dbFile, { migrate: true });
  const seeded = await seedDemo(database);
  const teamId = demoTeamId(database);
  if (teamId) {
    await seedDemoPours(database, teamId);
    await seedDemoStandard(database, teamId, process.env.APP_URL ?? `http://localhost:${port}`);
  }
  await settleMail();
  database.$client.close();
  console.log(seeded ? `[launch] demo shop seeded into ${dbFile}` : `[launch] using ${dbFile}`);

  if (mode === 'demo' && buildIsStale(root)) {
    console.log('[launch] no build of the current sources yet: building once');
    const code = await buildApp(root, '.next');
    if (code !== 0) {
      await standIns.close();
      process.exit(code);
    }
  }

  const appUrl = process.env.APP_URL ?? `http://localhost:${port}`;
  const child = spawn(path.join(root, 'node_modules/.bin/next'), [mode === 'dev' ? 'dev' : 'start', '-p', port], {
    stdio: 'inherit',
    env: {
      ...standIns.env,
      ...process.env,
      DATABASE_URL: dbFile,
      APP_URL: appUrl,
      POURPROOF_DEV_TOOLS: process.env.POURPROOF_DEV_TOOLS ?? '1',
      NEXT_TELEMETRY_DISABLED: '1',
    },
  });
  console.log(`[launch] Pourproof on ${appUrl} — demo sign-in: maker@demo.test / pourproof-demo (demo only)`);
  const stop = async (code: number) => {
    await standIns.close().catch(() => undefined);
    process.exit(code);
  };
  child.on('exit', (code) => void stop(code ?? 0));
  for (const sig of ['SIGINT', 'SIGTERM'] as const) process.on(sig, () => child.kill(sig));
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
