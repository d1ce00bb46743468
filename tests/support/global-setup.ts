import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { openDatabase } from '../../db/open';
import { demoTeamId, seedDemo } from '../../scripts/seed/seed-demo';
import { seedDemoPours } from '../../scripts/seed/seed-demo-pours';
import { settleMail } from '../../lib/mail/queue';
import { seedDemoStandard } from '../../scripts/seed/seed-demo-standard';
import { startStandIns, type StandIns } from '../../scripts/standins';
import { type AppProcess, freePort, isBuilt, startApp } from './app-process';

// Starts, once for the whole run: the local stand-ins (uploads, SMTP) and the
// production build of the app (`next start`) on a fresh, migrated, demo-seeded
// SQLite file. Integration and browser tests talk to it over HTTP.

let app: AppProcess | undefined;
let standIns: StandIns | undefined;

export default async function setup(project: TestProject) {
  const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'pourproof-test-'));
  project.provide('tmpDir', tmp);
  const built = isBuilt();
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
  // Tests send distinct X-Forwarded-For values so one test's failed sign-ins
  // do not slow another's: this server believes one proxy hop.
  app = await startApp({
    dbFile,
    port,
    logFile: path.join(tmp, 'app.log'),
    env: { ...standIns.env, POURPROOF_DEV_TOOLS: '1', SIGN_IN_MAX_FAILURES: '10', SIGN_IN_ADDRESS_FAILURES: '10', SIGN_UP_PER_HOUR: '100000', TRUST_PROXY_HOPS: '1' },
  });
  project.provide('baseUrl', baseUrl);
  project.provide('dbFile', dbFile);
  project.provide('mailUrl', standIns.mailHttpUrl);
  return async () => {
    await app?.stop();
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
