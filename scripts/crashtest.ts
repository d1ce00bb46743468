import fs from 'node:fs';
import path from 'node:path';
import { isBuilt, TEST_DIST_DIR } from '../tests/support/app-process';
import { crashOnce, drillDir } from '../tests/support/drills';
import { buildApp } from './build-app';
import { buildIsStale } from './build-stale';

// npm run crashtest [-- runs]: the long crash drill. Each run writes matches
// from four clients, kills the server with SIGKILL at a random moment, starts it
// again on the same SQLite file and checks that every acknowledged write is
// there and the file passes integrity_check. Builds the test build if needed.
async function main() {
  const runs = Number(process.argv[2] ?? 10);
  const root = path.resolve(__dirname, '..');
  if (!isBuilt() || buildIsStale(root, TEST_DIST_DIR)) {
    const code = await buildApp(root, TEST_DIST_DIR);
    if (code !== 0) process.exit(code);
  }
  const dir = drillDir('pourproof-crashtest-');
  const dbFile = path.join(dir, 'app.db');
  let acked = 0;
  let lost = 0;
  try {
    for (let i = 1; i <= runs; i++) {
      const r = await crashOnce(dbFile);
      acked += r.acked;
      lost += r.missing;
      console.log(`run ${i}/${runs}: ${r.acked} writes acknowledged, ${r.missing} lost, integrity ${r.integrity}`);
      if (r.missing || r.integrity !== 'ok') process.exitCode = 1;
    }
    console.log(`crash test: ${runs} runs, ${acked} acknowledged writes, ${lost} lost`);
  } finally {
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
