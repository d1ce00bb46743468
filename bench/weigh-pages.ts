import { type ChildProcess, spawn } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { openDatabase } from '../db/open';
import { settleMail } from '../lib/mail/queue';
import { demoTeamId, seedDemo } from '../scripts/seed/seed-demo';
import { seedDemoPours } from '../scripts/seed/seed-demo-pours';
import { seedDemoStandard } from '../scripts/seed/seed-demo-standard';
import { startStandIns } from '../scripts/standins';
import { measurePageWeights, type PageWeights } from './page-weight';
import { signInWhenUp } from './fixtures';

/** The goals of issue 14, in kB of compressed JavaScript. */
export const WEIGHT_GOALS: Record<string, number> = { match: 200, list: 150 };

/**
 * The page weights of `npm run bench` on their own server: the demo shop with its pours, a
 * standard and batches (as `npm run demo` seeds it, photos through the upload stand-in), `next
 * start` on the build in `distDir`, signed in as the maker. Pages: the match with pours, a
 * standard and batches (its charts below), a new match with no target yet (the sampler and the
 * upload are the page), and the Matches list.
 */
export async function weighPages(root: string, distDir = '.next', port = 3198): Promise<PageWeights> {
  const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'pourproof-weigh-'));
  const standIns = await startStandIns({ dataDir: path.join(tmp, 'standins'), ephemeralPorts: true, quiet: true });
  Object.assign(process.env, standIns.env);
  let child: ChildProcess | null = null;
  try {
    const dbFile = path.join(tmp, 'weigh.db');
    const database = openDatabase(dbFile, { migrate: true });
    await seedDemo(database);
    const base = `http://127.0.0.1:${port}`;
    await seedDemoPours(database, demoTeamId(database)!);
    await seedDemoStandard(database, demoTeamId(database)!, base);
    await settleMail();
    database.$client.close();
    child = spawn(process.execPath, [path.join(root, 'node_modules/next/dist/bin/next'), 'start', '-p', String(port), '-H', '127.0.0.1'], {
      cwd: root,
      env: { ...process.env, ...standIns.env, NODE_ENV: 'production', NEXT_DIST_DIR: distDir, DATABASE_URL: dbFile, APP_URL: base, NEXT_TELEMETRY_DISABLED: '1' },
      stdio: 'ignore',
    });
    const cookie = await signInWhenUp(base);
    type Item = { id: string; target: unknown; standardPourId: string | null };
    const body = (await (await fetch(`${base}/api/matches`, { headers: { cookie } })).json()) as Item[] | { items: Item[] };
    const list = Array.isArray(body) ? body : body.items;
    const produced = list.find((m) => m.standardPourId);
    const fresh = list.find((m) => !m.target);
    if (!produced || !fresh) throw new Error('the demo shop has no match with a standard, or none without a target');
    return await measurePageWeights(base, cookie, [
      { key: 'match', label: 'the match page (pours, a standard and batches)', path: `/matches/${produced.id}` },
      { key: 'new', label: 'a new match’s page (no target yet: sampler and upload)', path: `/matches/${fresh.id}` },
      { key: 'list', label: 'the Matches list', path: '/matches' },
    ]);
  } finally {
    child?.kill('SIGTERM');
    await standIns.close();
    fs.rmSync(tmp, { recursive: true, force: true });
  }
}

/** The lines `npm run bench` prints, the goal beside each figure. */
export function printPageWeights(w: PageWeights) {
  if (w.skipped) return console.log(`  skipped: ${w.skipped}`);
  for (const p of w.pages) {
    const goal = WEIGHT_GOALS[p.key];
    console.log(`  ${p.label}: ${p.onLoadKB.toFixed(0)} kB on load${goal ? ` (goal ≤ ${goal} kB)` : ''}, ${p.scrolledKB.toFixed(0)} kB after scrolling to its foot (${p.files} scripts)`);
  }
}

// `npx tsx --conditions=react-server bench/weigh-pages.ts [distDir] [--json]`: these lines alone, on an existing build.
if (require.main === module) {
  weighPages(path.resolve(__dirname, '..'), process.argv[2] ?? '.next').then((w) => {
    if (process.argv.includes('--json')) console.log(JSON.stringify(w, null, 2));
    else printPageWeights(w);
    process.exit(0);
  }, (err) => {
    console.error(err);
    process.exit(1);
  });
}
