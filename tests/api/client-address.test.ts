import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { type AppProcess, isBuilt, startApp } from '../support/app-process';

// A server of its own, facing clients directly (TRUST_PROXY_HOPS=0, the
// default): a client-sent X-Forwarded-For or X-Forwarded-Host must change
// nothing. Strict limits so the test stays short.
describe.skipIf(!isBuilt())('client addresses without a trusted proxy', () => {
  let app: AppProcess;
  let dir: string;
  const post = (pathname: string, body: unknown, headers: Record<string, string> = {}) =>
    fetch(app.baseUrl + pathname, { method: 'POST', headers: { 'content-type': 'application/json', origin: app.baseUrl, ...headers }, body: JSON.stringify(body) });

  beforeAll(async () => {
    dir = fs.mkdtempSync(path.join(os.tmpdir(), 'pourproof-addr-'));
    app = await startApp({ dbFile: path.join(dir, 'app.db'), env: { TRUST_PROXY_HOPS: '0', SIGN_UP_PER_HOUR: '3', SIGN_IN_PAIR_FAILURES: '3' } });
  });
  afterAll(async () => {
    await app?.stop();
    fs.rmSync(dir, { recursive: true, force: true });
  });

  it('counts failed sign-ins by the socket address, whatever X-Forwarded-For says', async () => {
    const res = await post('/api/auth/sign-up', { email: 'owner@addr.test', password: 'long enough pw', name: 'Addr Owner', teamName: 'Addr shop' });
    expect(res.status).toBe(201);
    const statuses: number[] = [];
    for (let i = 0; i < 5; i++) {
      const r = await post('/api/auth/sign-in', { email: 'owner@addr.test', password: `wrong ${i}` }, { 'x-forwarded-for': `203.0.113.${i + 1}` });
      statuses.push(r.status);
    }
    // Three failures are allowed for one account from one address; the fourth waits.
    expect(statuses).toEqual([401, 401, 401, 429, 429]);
  });

  it('limits sign-ups per address, whatever X-Forwarded-For says', async () => {
    const statuses: number[] = [];
    // One sign-up was spent above; the limit is 3 an hour.
    for (let i = 0; i < 3; i++) {
      const r = await post('/api/auth/sign-up', { email: `o${i}@addr.test`, password: 'long enough pw', name: 'Owner', teamName: `Shop ${i}` }, { 'x-forwarded-for': `198.51.100.${i + 1}` });
      statuses.push(r.status);
      if (r.status === 429) expect(Number(r.headers.get('retry-after'))).toBeGreaterThan(0);
    }
    expect(statuses).toEqual([201, 201, 429]);
  });

  it('does not take X-Forwarded-Host as its own host when checking Origin', async () => {
    const res = await fetch(`${app.baseUrl}/api/auth/sign-in`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', origin: 'http://evil.example', 'x-forwarded-host': 'evil.example' },
      body: JSON.stringify({ email: 'owner@addr.test', password: 'long enough pw' }),
    });
    expect(res.status).toBe(403);
    expect(((await res.json()) as { error: { code: string } }).error.code).toBe('bad_origin');
  });
});
