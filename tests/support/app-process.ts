import { type ChildProcess, spawn } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import path from 'node:path';

// Starts the production build (`next start`) as a child process on a given
// SQLite file: the suite's one shared server (global-setup.ts) and the extra
// servers a test needs of its own (other settings, crash and restore drills).

// POURPROOF_TEST_DIST lets two checkouts' runs build side by side.
export const TEST_DIST_DIR = process.env.POURPROOF_TEST_DIST ?? '.next-test';
export const ROOT = path.resolve(__dirname, '../..');

export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.listen(0, '127.0.0.1', () => {
      const port = (srv.address() as net.AddressInfo).port;
      srv.close(() => resolve(port));
    });
    srv.on('error', reject);
  });
}

export async function waitForHealth(url: string, ms: number, child: ChildProcess) {
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

export type AppProcess = { child: ChildProcess; baseUrl: string; port: number; stop(signal?: NodeJS.Signals): Promise<void> };

export async function startApp(opts: { dbFile: string; env?: Record<string, string>; logFile?: string; port?: number }): Promise<AppProcess> {
  const port = opts.port ?? (await freePort());
  const baseUrl = `http://127.0.0.1:${port}`;
  const child = spawn(process.execPath, [path.join(ROOT, 'node_modules/next/dist/bin/next'), 'start', '-p', String(port), '-H', '127.0.0.1'], {
    cwd: ROOT,
    env: {
      ...process.env,
      NODE_ENV: 'production',
      NEXT_DIST_DIR: TEST_DIST_DIR,
      NEXT_TELEMETRY_DISABLED: '1',
      DATABASE_URL: opts.dbFile,
      APP_URL: baseUrl,
      ...opts.env,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  if (opts.logFile) {
    const log = fs.createWriteStream(opts.logFile, { flags: 'a' });
    child.stdout?.pipe(log);
    child.stderr?.pipe(log);
  } else {
    child.stdout?.resume();
    child.stderr?.resume();
  }
  await waitForHealth(`${baseUrl}/api/health`, 60_000, child);
  const stop = (signal: NodeJS.Signals = 'SIGTERM') =>
    new Promise<void>((resolve) => {
      if (child.exitCode !== null || child.signalCode !== null) return resolve();
      child.once('exit', () => resolve());
      child.kill(signal);
    });
  return { child, baseUrl, port, stop };
}

export function isBuilt(): boolean {
  return fs.existsSync(path.join(ROOT, TEST_DIST_DIR, 'BUILD_ID'));
}
