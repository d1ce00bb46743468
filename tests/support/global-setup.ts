import { type ChildProcess, spawn } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { openDatabase } from '../../db/open';
import { demoTeamId, seedDemo } from '../../db/seed-demo';
import { seedDemoPours } from '../../db/seed-demo-pours';
import { settleMail } from '../../lib/mail/queue';
import { seedDemoStandard } from '../../db/seed-demo-standard';
import { startStandIns, type StandIns } from '../../scripts/standins';

// Starts, once for the whole run: the local stand-ins (uploads, SMTP) and the
// production build of the app (`next start`) on a fresh, migrated, demo-seeded
// SQLite file. Integration and browser tests talk to it over HTTP.

// POURPROOF_TEST_DIST lets two checkouts' runs build side by side.
export const TEST_DIST_DIR = process.env.POURPROOF_TEST_DIST ?? '.next-test';

async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.listen(0, '127.0.0.1', () => {
      const port = (srv.address() as net.AddressInfo).port;
      srv.close(() => resolve(port));
    });
    srv.on('error', reject);
  });
}

async function waitFor(url: string, ms: number, child: ChildProcess) {
  const until = Date.now() + ms;
  while (Date.now() < until) {
    if (child.exitCode !== null) throw new Error(`app server exited with code ${child.exitCode}`);
    try {
      const res = await fetch(url);
      if (res.ok) return;
    } catch {
      /* not up yet */
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`app server did not answer ${url} within ${ms} ms`);
}

let child: ChildProcess | undefined;
let standIns: StandIns | undefined;

export default async function setup(project: TestProject) {
  const root = path.resolve(__dirname, '../..');
  const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'pourproof-test-'));
  project.provide('tmpDir', tmp);
  const built = fs.existsSync(path.join(root, TEST_DIST_DIR, 'BUILD_ID'));
  if (!built || process.env.POURPROOF_NO_SERVER === '1') {
    project.provide('baseUrl', '');
    return () => fs.rmSync(tmp, { recursive: true, force: true });
  }
  standIns = await startStandIns({ dataDir: path.join(tmp, 'standins'), ephemeralPorts: true, quiet: process.env.STANDIN_LOGS !== '1' });
  // Test workers that call lib/ functions directly send through the same stand-ins.
  Object.assign(process.env, standIns.env);
  const dbFile = path.join(tmp, 'app.db');
  const database = openDatabase(dbFile, { migrate: true });
  await seedDemo(database);
  const port = await freePort();
  const baseUrl = `http://127.0.0.1:${port}`;
  await seedDemoPours(database, demoTeamId(database)!);
  await seedDemoStandard(database, demoTeamId(database)!, baseUrl);
  await settleMail();
  database.$client.close();
  child = spawn(process.execPath, [path.join(root, 'node_modules/next/dist/bin/next'), 'start', '-p', String(port), '-H', '127.0.0.1'], {
    cwd: root,
    env: {
      ...process.env,
      ...standIns.env,
      NODE_ENV: 'production',
      NEXT_DIST_DIR: TEST_DIST_DIR,
      DATABASE_URL: dbFile,
      APP_URL: baseUrl,
      POURPROOF_DEV_TOOLS: '1',
      SIGN_IN_MAX_FAILURES: '10',
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const log = fs.createWriteStream(path.join(tmp, 'app.log'));
  child.stdout?.pipe(log);
  child.stderr?.pipe(log);
  await waitFor(`${baseUrl}/api/health`, 60_000, child);
  project.provide('baseUrl', baseUrl);
  project.provide('dbFile', dbFile);
  project.provide('mailUrl', standIns.mailHttpUrl);
  return async () => {
    child?.kill('SIGTERM');
    await standIns?.close();
    if (process.env.KEEP_TEST_DIR !== '1') fs.rmSync(tmp, { recursive: true, force: true });
    else console.log(`test files kept in ${tmp}`);
  };
}

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    tmpDir: string;
    dbFile: string;
    mailUrl: string;
  }
}
