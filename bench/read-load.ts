import autocannon from 'autocannon';
import { LARGE_SHOP } from './seed-large-shop';

export type SteadyRead = { label: string; p50: number; p99: number; rps: number; non2xx: number };
export type ReadLoad = { healthRps: number; meRps: number; deltaRps: number; rounds: number; reads: SteadyRead[] };

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

// Latency at a steady rate, after 2 s of the same requests unrecorded (the route's code loaded
// and compiled, its statements prepared): the figure of a server that has been up a while.
async function steady(label: string, url: string, cookie: string, seconds: number, rate = 100): Promise<SteadyRead> {
  await run({ url, connections: 10, overallRate: rate, duration: 2, headers: { cookie } });
  const r = await run({ url, connections: 10, overallRate: rate, duration: seconds, headers: { cookie } });
  return { label, p50: r.latency.p50, p99: r.latency.p99, rps: r.requests.average, non2xx: r.non2xx };
}

// Flat-out throughput of several routes, taken in turns (short slices, several rounds) so a
// change in the shared machine's load falls on all of them alike: requests/s of each.
async function inTurns(routes: Record<string, autocannon.Options>, rounds: number, slice: number): Promise<Record<string, number>> {
  const done: Record<string, { requests: number; seconds: number }> = {};
  for (let i = 0; i < rounds; i++) {
    for (const [name, opts] of Object.entries(routes)) {
      const r = await run({ ...opts, connections: 32, duration: slice });
      const t = (done[name] ??= { requests: 0, seconds: 0 });
      t.requests += r.requests.total;
      t.seconds += r.duration;
    }
  }
  return Object.fromEntries(Object.entries(done).map(([name, t]) => [name, t.requests / t.seconds]));
}

/**
 * On one server: bare `GET /api/health`, `GET /api/me` (the session check alone) and
 * `POST /api/delta-e` flat out, in turns (5 rounds of 2 s each); then reads at a steady
 * 100 requests/s for their latency (each after a 2 s warm-up): a match of the demo shop and the match with the most
 * pours of the large shop (bench/seed-large-shop.ts); and the large shop's first page of
 * matches, batches and photos at 20 requests/s. The caller prints the ratios.
 */
export async function runReadLoad(base: string, cookie: string, seconds = 8): Promise<ReadLoad> {
  const rounds = 5;
  const rps = await inTurns(
    {
      health: { url: `${base}/api/health` },
      me: { url: `${base}/api/me`, headers: { cookie } },
      delta: {
        url: `${base}/api/delta-e`,
        method: 'POST',
        headers: { 'content-type': 'application/json', origin: base, cookie },
        body: JSON.stringify({ reference: { l: 50, a: 2.6772, b: -79.7751 }, sample: { l: 50, a: 0, b: -82.7485 }, tolerance: 2 }),
      },
    },
    rounds,
    2,
  );
  const demo = (await (await fetch(`${base}/api/matches`, { headers: { cookie } })).json()) as { id: string }[];
  const large = await signIn(base, LARGE_SHOP.maker, LARGE_SHOP.password);
  const all = (await (await fetch(`${base}/api/matches`, { headers: { cookie: large } })).json()) as { id: string; pours: unknown[] }[];
  const biggest = all.reduce((a, b) => (b.pours.length > a.pours.length ? b : a));
  const reads = [
    await steady('GET /api/matches/:id, demo shop', `${base}/api/matches/${demo[0]!.id}`, cookie, seconds),
    await steady(`GET /api/matches/:id, large shop (${biggest.pours.length} pours)`, `${base}/api/matches/${biggest.id}`, large, seconds),
    await steady('GET /api/matches?limit=50, large shop, 20 requests/s', `${base}/api/matches?limit=50`, large, seconds, 20),
    await steady('GET /api/batches?limit=50, large shop, 20 requests/s', `${base}/api/batches?limit=50`, large, seconds, 20),
    await steady('GET /api/photos?limit=48, large shop, 20 requests/s', `${base}/api/photos?limit=48`, large, seconds, 20),
  ];
  return { healthRps: rps.health!, meRps: rps.me!, deltaRps: rps.delta!, rounds, reads };
}
