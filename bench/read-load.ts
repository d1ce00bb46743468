import autocannon from 'autocannon';
import { LARGE_SHOP } from './seed-large-shop';

export type SteadyRead = { label: string; p50: number; p99: number; rps: number; non2xx: number };
export type ReadLoad = { healthRps: number; meRps: number; reads: SteadyRead[] };

const run = (opts: autocannon.Options) => autocannon(opts);

async function signIn(base: string, email: string, password: string): Promise<string> {
  const res = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: base },
    body: JSON.stringify({ email, password }),
  });
  if (!res.ok) throw new Error(`sign-in as ${email}: ${res.status}`);
  return res.headers.get('set-cookie')!.split(';')[0]!;
}

async function steady(label: string, url: string, cookie: string, seconds: number): Promise<SteadyRead> {
  const r = await run({ url, connections: 10, overallRate: 100, duration: seconds, headers: { cookie } });
  return { label, p50: r.latency.p50, p99: r.latency.p99, rps: r.requests.average, non2xx: r.non2xx };
}

/**
 * On one server, one after another: bare `GET /api/health` and `GET /api/me`
 * (the session check alone) flat out, then reads at a steady 100 requests/s for
 * their latency: a match of the demo shop, the match with the most pours of the
 * large shop (bench/seed-large-shop.ts), and the large shop's first page of
 * matches, batches and photos. The caller prints the ratios.
 */
export async function runReadLoad(base: string, cookie: string, seconds = 8): Promise<ReadLoad> {
  const health = await run({ url: `${base}/api/health`, connections: 32, duration: seconds });
  const me = await run({ url: `${base}/api/me`, connections: 32, duration: seconds, headers: { cookie } });
  const demo = (await (await fetch(`${base}/api/matches`, { headers: { cookie } })).json()) as { id: string }[];
  const large = await signIn(base, LARGE_SHOP.maker, LARGE_SHOP.password);
  const all = (await (await fetch(`${base}/api/matches`, { headers: { cookie: large } })).json()) as { id: string; pours: unknown[] }[];
  const biggest = all.reduce((a, b) => (b.pours.length > a.pours.length ? b : a));
  const reads = [
    await steady('GET /api/matches/:id, demo shop', `${base}/api/matches/${demo[0]!.id}`, cookie, seconds),
    await steady(`GET /api/matches/:id, large shop (${biggest.pours.length} pours)`, `${base}/api/matches/${biggest.id}`, large, seconds),
    await steady('GET /api/matches?limit=50, large shop', `${base}/api/matches?limit=50`, large, seconds),
    await steady('GET /api/batches?limit=50, large shop', `${base}/api/batches?limit=50`, large, seconds),
    await steady('GET /api/photos?limit=48, large shop', `${base}/api/photos?limit=48`, large, seconds),
  ];
  return { healthRps: health.requests.average, meRps: me.requests.average, reads };
}
