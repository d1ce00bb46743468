import { spawn } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import autocannon from 'autocannon';
import { openDatabase } from '/work/wt-14/db/open';
import { seedDemo } from '/work/wt-14/scripts/seed/seed-demo';
import { seedLargeShop } from '/work/wt-14/bench/seed-large-shop';

const root = '/work/wt-14';
const target = process.argv[2] ?? 'me';
const prof = process.argv[3] === 'prof';
async function main() {
  const dbFile = '/tmp/prof14/bench.db';
  if (!fs.existsSync(dbFile)) {
    const d = openDatabase(dbFile, { migrate: true });
    await seedDemo(d);
    await seedLargeShop(d);
    d.$client.close();
  }
  const port = 3177;
  const base = `http://127.0.0.1:${port}`;
  const args = [...(prof ? ['--cpu-prof', '--cpu-prof-dir=/tmp/prof14/out'] : []), path.join(root, 'node_modules/next/dist/bin/next'), 'start', '-p', String(port), '-H', '127.0.0.1'];
  const child = spawn(process.execPath, args, { cwd: root, env: { ...process.env, NODE_ENV: 'production', DATABASE_URL: dbFile, APP_URL: base, NEXT_TELEMETRY_DISABLED: '1' }, stdio: 'inherit' });
  try {
    for (let i = 0; i < 120; i++) { if (await fetch(`${base}/api/health`).then((r) => r.ok).catch(() => false)) break; await new Promise((r) => setTimeout(r, 250)); }
    const signIn = await fetch(`${base}/api/auth/sign-in`, { method: 'POST', headers: { 'content-type': 'application/json', origin: base }, body: JSON.stringify({ email: 'maker@demo.test', password: 'pourproof-demo' }) });
    const cookie = signIn.headers.get('set-cookie')!.split(';')[0]!;
    const warm = await autocannon({ url: `${base}/api/health`, connections: 8, duration: 2 });
    for (const t of target.split(',')) {
      const opts: autocannon.Options = t === 'health' ? { url: `${base}/api/health` }
        : t === 'me' ? { url: `${base}/api/me`, headers: { cookie } }
        : { url: `${base}/api/delta-e`, method: 'POST', headers: { 'content-type': 'application/json', origin: base, cookie }, body: JSON.stringify({ reference: { l: 50, a: 2.6772, b: -79.7751 }, sample: { l: 50, a: 0, b: -82.7485 }, tolerance: 2 }) };
      const r = await autocannon({ ...opts, connections: 32, duration: 6 });
      console.log(t, r.requests.average.toFixed(0), 'rps', 'p99', r.latency.p99, 'non2xx', r.non2xx);
    }
    void warm;
  } finally {
    child.kill('SIGINT');
    await new Promise((r) => child.on('exit', r));
  }
}
main();
