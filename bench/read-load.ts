import autocannon from 'autocannon';

export type ReadLoad = { healthRps: number; meRps: number; matchP99: number; matchP50: number; matchRps: number; matchNon2xx: number };

const run = (opts: autocannon.Options) => autocannon(opts);

/**
 * On one server, one after another: bare `GET /api/health` and `GET /api/me`
 * (the session check alone) flat out, then `GET /api/matches/:id` at a steady
 * 100 requests/s, for its latency. The caller prints the ratios.
 */
export async function runReadLoad(base: string, cookie: string, seconds = 8): Promise<ReadLoad> {
  const health = await run({ url: `${base}/api/health`, connections: 32, duration: seconds });
  const me = await run({ url: `${base}/api/me`, connections: 32, duration: seconds, headers: { cookie } });
  const list = (await (await fetch(`${base}/api/matches`, { headers: { cookie } })).json()) as { id: string; pours?: unknown[] }[];
  const id = list[0]!.id;
  const match = await run({ url: `${base}/api/matches/${id}`, connections: 10, overallRate: 100, duration: seconds, headers: { cookie } });
  return {
    healthRps: health.requests.average,
    meRps: me.requests.average,
    matchRps: match.requests.average,
    matchP50: match.latency.p50,
    matchP99: match.latency.p99,
    matchNon2xx: match.non2xx,
  };
}
