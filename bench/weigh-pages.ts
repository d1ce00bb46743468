import { type ChildProcess, spawn } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { openDatabase } from '../db/open';
import { seedDemo } from '../scripts/seed/seed-demo';
import { measurePageWeights, weighedPages } from './page-weight';

// `npx tsx --conditions=react-server bench/weigh-pages.ts [distDir]`: the page-weight lines of
// `npm run bench` alone, against `next start` on an existing build (default .next) and the demo shop.
async function main() {
  const root = path.resolve(__dirname, '..');
  const distDir = process.argv[2] ?? '.next';
  const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'pourproof-weigh-'));
  const dbFile = path.join(tmp, 'weigh.db');
  const database = openDatabase(dbFile, { migrate: true });
  await seedDemo(database);
  database.$client.close();
  const port = 3198;
  const base = `http://127.0.0.1:${port}`;
  const child: ChildProcess = spawn(process.execPath, [path.join(root, 'node_modules/next/dist/bin/next'), 'start', '-p', String(port), '-H', '127.0.0.1'], {
    cwd: root,
    env: { ...process.env, NODE_ENV: 'production', NEXT_DIST_DIR: distDir, DATABASE_URL: dbFile, APP_URL: base, NEXT_TELEMETRY_DISABLED: '1' },
    stdio: 'ignore',
  });
  try {
    for (let i = 0; i < 120; i++) {
      if (await fetch(`${base}/api/health`).then((r) => r.ok).catch(() => false)) break;
      await new Promise((r) => setTimeout(r, 250));
    }
    const signIn = await fetch(`${base}/api/auth/sign-in`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', origin: base },
      body: JSON.stringify({ email: 'maker@demo.test', password: 'pourproof-demo' }),
    });
    const cookie = signIn.headers.get('set-cookie')!.split(';')[0]!;
    const w = await measurePageWeights(base, cookie, await weighedPages(base, cookie));
    console.log(JSON.stringify(w, null, 2));
  } finally {
    child.kill('SIGTERM');
    fs.rmSync(tmp, { recursive: true, force: true });
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
