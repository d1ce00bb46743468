import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import Database from 'better-sqlite3';
import { integrityOf } from '../../lib/backup/backupDatabase';
import { type AppProcess, startApp } from './app-process';

// Writes under fire, for the crash and restore drills: matches created over
// HTTP by a few concurrent clients, each id recorded only once the server
// acknowledged it (201).

export async function signUpOn(base: string, email: string): Promise<string> {
  const headers = { 'content-type': 'application/json', origin: base };
  let res = await fetch(`${base}/api/auth/sign-up`, { method: 'POST', headers, body: JSON.stringify({ email, password: 'drill password 1', name: 'Drill Owner', teamName: 'Drill shop' }) });
  if (res.status === 409) res = await fetch(`${base}/api/auth/sign-in`, { method: 'POST', headers, body: JSON.stringify({ email, password: 'drill password 1' }) });
  if (!res.ok) throw new Error(`drill sign-up/in failed: ${res.status} ${await res.text()}`);
  return res.headers.get('set-cookie')!.split(';')[0]!;
}

export type Writer = { acked: string[]; stop: () => Promise<void> };

export function startWriters(base: string, cookie: string, clients = 4): Writer {
  const acked: string[] = [];
  let running = true;
  let n = 0;
  const one = async () => {
    while (running) {
      try {
        const res = await fetch(`${base}/api/matches`, {
          method: 'POST',
          headers: { 'content-type': 'application/json', origin: base, cookie },
          body: JSON.stringify({ name: `Drill ${process.pid}-${n++}`, zones: ['back', 'belly'], notes: 'written under fire' }),
        });
        if (res.status === 201) acked.push(((await res.json()) as { id: string }).id);
      } catch {
        // The server went away mid-request: that write was never acknowledged.
        await new Promise((r) => setTimeout(r, 20));
      }
    }
  };
  const loops = Array.from({ length: clients }, one);
  return {
    acked,
    stop: async () => {
      running = false;
      await Promise.allSettled(loops);
    },
  };
}

/** Waits until the writers have `n` acknowledged writes (a loaded machine starts slowly). */
export async function untilAcked(w: Writer, n: number, timeoutMs = 30_000) {
  const until = Date.now() + timeoutMs;
  while (w.acked.length < n) {
    if (Date.now() > until) throw new Error(`only ${w.acked.length} writes acknowledged in ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 20));
  }
}

export function matchIdsIn(dbFile: string): Set<string> {
  const db = new Database(dbFile, { readonly: true, fileMustExist: true });
  try {
    return new Set((db.prepare('select id from matches').all() as { id: string }[]).map((r) => r.id));
  } finally {
    db.close();
  }
}

export type CrashRun = { acked: number; missing: number; integrity: string };

/**
 * One crash drill: the app writes under load, is killed with SIGKILL at a
 * random moment, and is started again on the same file; every acknowledged
 * write must still be there and the file must pass `PRAGMA integrity_check`.
 */
export async function crashOnce(dbFile: string, env: Record<string, string> = {}, writeMs = 1500 + Math.random() * 1500): Promise<CrashRun> {
  let app: AppProcess | undefined = await startApp({ dbFile, env });
  const cookie = await signUpOn(app.baseUrl, 'drill@crash.test');
  const writers = startWriters(app.baseUrl, cookie);
  await untilAcked(writers, 3);
  await new Promise((r) => setTimeout(r, writeMs));
  await app.stop('SIGKILL');
  await writers.stop();
  const acked = [...writers.acked];
  app = await startApp({ dbFile, env });
  try {
    const present = matchIdsIn(dbFile);
    const missing = acked.filter((id) => !present.has(id)).length;
    // And the restarted app serves them.
    const again = await signUpOn(app.baseUrl, 'drill@crash.test');
    const sample = acked.slice(-5);
    for (const id of sample) {
      const res = await fetch(`${app.baseUrl}/api/matches/${id}`, { headers: { cookie: again } });
      if (res.status !== 200) throw new Error(`acknowledged match ${id} answers ${res.status} after the crash`);
    }
    return { acked: acked.length, missing, integrity: integrityOf(dbFile) };
  } finally {
    await app.stop();
  }
}

export function drillDir(prefix: string): string {
  return fs.mkdtempSync(path.join(os.tmpdir(), prefix));
}
