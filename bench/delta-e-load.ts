import { type ChildProcess, spawn } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import autocannon from 'autocannon';
import { openDatabase } from '../db/open';
import { seedDemo } from '../scripts/seed/seed-demo';
import { seedLargeShop, type LargeShop } from './seed-large-shop';
import { healthUnderMeasure, type HealthUnderMeasure } from './health-under-measure';
import { type MeasureHttpResult, runMeasureOverHttp } from './measure-http';
import { type ReadLoad, runReadLoad } from './read-load';
import { freePort } from '../tests/support/app-process';
import { signInWhenUp } from './fixtures';

export type LoadResult = { large: LargeShop; reads: ReadLoad; health: HealthUnderMeasure; measureHttp: MeasureHttpResult; rps: number; p50: number; p975: number; p99: number; errors: number; non2xx: number; requests: number; refusals: { label: string; status: number; ms: number }[] };

// POST /api/delta-e under load against `next start` (production build in
// .next, built by the caller), 10 s with 32 connections, as a signed-in member.
// A free port of its own (not a fixed one): two checkouts' benches at once would otherwise measure
// one another's server.
export async function runDeltaELoad(root: string, port?: number, seconds = 10): Promise<LoadResult> {
  port ??= await freePort();
  const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'pourproof-bench-'));
  const dbFile = path.join(tmp, 'bench.db');
  const database = openDatabase(dbFile, { migrate: true });
  await seedDemo(database);
  const large = await seedLargeShop(database);
  database.$client.close();
  const base = `http://127.0.0.1:${port}`;
  const child: ChildProcess = spawn(process.execPath, [path.join(root, 'node_modules/next/dist/bin/next'), 'start', '-p', String(port), '-H', '127.0.0.1'], {
    cwd: root,
    env: { ...process.env, NODE_ENV: 'production', DATABASE_URL: dbFile, APP_URL: base, NEXT_TELEMETRY_DISABLED: '1' },
    stdio: 'ignore',
  });
  try {
    const cookie = await signInWhenUp(base);
    const result = await autocannon({
      url: `${base}/api/delta-e`,
      method: 'POST',
      connections: 32,
      duration: seconds,
      headers: { 'content-type': 'application/json', origin: base, cookie },
      body: JSON.stringify({ reference: { l: 50, a: 2.6772, b: -79.7751 }, sample: { l: 50, a: 0, b: -82.7485 }, tolerance: 2 }),
    });
    const reads = await runReadLoad(base, cookie);
    const refusals = await timeRefusals(base, cookie);
    const measureHttp = await runMeasureOverHttp(base, cookie);
    const health = await healthUnderMeasure(base);
    return {
      large,
      reads,
      health,
      measureHttp,
      refusals,
      rps: result.requests.average,
      p50: result.latency.p50,
      p975: result.latency.p97_5,
      p99: result.latency.p99,
      errors: result.errors,
      non2xx: result.non2xx,
      requests: result.requests.total,
    };
  } finally {
    child.kill('SIGTERM');
    fs.rmSync(tmp, { recursive: true, force: true });
  }
}

// How long /api/measure takes to refuse bad photos (the answer should come in
// well under 2 s, before any pixel is decoded): the slowest of three tries each.
async function timeRefusals(base: string, cookie: string) {
  const { hugeHeaderPng } = await import('./fixtures');
  const regions = JSON.stringify([{ name: 'back', shape: { type: 'rect', x: 0.1, y: 0.1, w: 0.5, h: 0.5 } }]);
  const cases: [string, Buffer][] = [
    ['30 000 × 30 000 PNG header', await hugeHeaderPng()],
    ['text named .jpg', Buffer.from('not a photo\n'.repeat(100))],
  ];
  const out: { label: string; status: number; ms: number }[] = [];
  for (const [label, bytes] of cases) {
    let worst = 0;
    let status = 0;
    for (let i = 0; i < 3; i++) {
      const form = new FormData();
      form.set('image', new Blob([new Uint8Array(bytes)]), 'photo.jpg');
      form.set('regions', regions);
      const t0 = performance.now();
      const res = await fetch(`${base}/api/measure`, { method: 'POST', body: form, headers: { origin: base, cookie } });
      await res.arrayBuffer();
      worst = Math.max(worst, performance.now() - t0);
      status = res.status;
    }
    out.push({ label, status, ms: worst });
  }
  return out;
}
