import fs from 'node:fs';
import path from 'node:path';
import Database from 'better-sqlite3';
import { beforeAll, describe, expect, inject, it } from 'vitest';
import { api, signInAs, signUpShop } from '../support/http';
import { type IdKind, type Role, ROUTES, type RouteEntry } from './access-manifest';

// The authorization matrix: every route of the manifest × six principals
// (anonymous, the demo shop's viewer, maker, lead and owner, and another shop's
// owner). Each cell's status must be the policy's: 401 without a session, 403
// below the route's role, through the gate at or above it, and a foreign id
// answered exactly as a missing one. Mutating cells never touch real records:
// callers who pass the gate are sent a missing id (answered 404) or a body that
// fails validation (400).

const ROLE_RANK: Record<Role, number> = { viewer: 1, maker: 2, lead: 3, owner: 4 };
const PRINCIPALS = ['anonymous', 'viewer', 'maker', 'lead', 'owner', 'foreign'] as const;
type Principal = (typeof PRINCIPALS)[number];
const MISSING = 'no-such-record-0';

function routeFiles(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = path.join(dir, e.name);
    return e.isDirectory() ? routeFiles(p) : e.name === 'route.ts' ? [p] : [];
  });
}

// METHOD path for every exported handler of every route file under app/api.
function routesInTree(): string[] {
  const root = path.resolve(__dirname, '../../app/api');
  return routeFiles(root).flatMap((file) => {
    const src = fs.readFileSync(file, 'utf8');
    const url = `/api/${path.relative(root, path.dirname(file)).split(path.sep).join('/')}`.replace(/\[[^\]]+\]/g, ':id');
    const methods = new Set<string>();
    for (const m of src.matchAll(/export\s+(?:const|async function|function)\s+(GET|POST|PUT|PATCH|DELETE)\b/g)) methods.add(m[1]!);
    for (const m of src.matchAll(/export\s*\{([^}]*)\}/g)) for (const name of m[1]!.split(',')) if (/^(GET|POST|PUT|PATCH|DELETE)$/.test(name.trim())) methods.add(name.trim());
    return [...methods].map((m) => `${m} ${url}`);
  });
}

describe('the authorization matrix', () => {
  const cookies: Partial<Record<Principal, string | null>> = { anonymous: null };
  const ids = {} as Record<IdKind, string>;

  beforeAll(async () => {
    for (const role of ['viewer', 'maker', 'lead', 'owner'] as const) cookies[role] = await signInAs(`${role}@demo.test`, 'pourproof-demo', '10.68.0.1');
    cookies.foreign = (await signUpShop('Matrix stranger')).cookie;
    const raw = new Database(inject('dbFile'), { readonly: true });
    const team = (raw.prepare("select m.team_id as t from memberships m join users u on u.id = m.user_id where u.email = 'owner@demo.test'").get() as { t: string }).t;
    const one = (sql: string) => (raw.prepare(sql).get(team) as { id: string }).id;
    ids.match = one('select id from matches where team_id = ? and standard_pour_id is not null');
    ids.pour = one('select id from pours where team_id = ?');
    ids.batch = one('select id from batches where team_id = ?');
    ids.photo = one('select id from photos where team_id = ?');
    ids.colorant = one('select id from colorants where team_id = ?');
    ids.mold = one('select id from molds where team_id = ?');
    raw.close();
    // A pending invitation of the demo shop, for the routes that name one.
    ids.invitation = (await api('/api/team/invitations', { cookie: cookies.owner!, body: { email: `matrix-${Date.now().toString(36)}@example.test`, role: 'viewer' } })).body.id;
  });

  it('lists every route handler of the app, and nothing that is not one', () => {
    const manifest = ROUTES.map((r) => `${r.method} ${r.path}`).sort();
    expect(routesInTree().sort()).toEqual(manifest);
  });

  const call = (r: RouteEntry, who: Principal, id?: string) => {
    const url = id ? r.path.replace(':id', id) : r.path;
    if (r.multipart) return api(url, { method: r.method, cookie: cookies[who] ?? null, raw: '{}' });
    return api(url, { method: r.method, cookie: cookies[who] ?? null, ...(r.body !== undefined ? { body: r.body } : {}) });
  };

  for (const r of ROUTES) {
    describe(`${r.method} ${r.path}`, () => {
      for (const who of PRINCIPALS) {
        it(who, async () => {
          if (r.role === 'public' || r.role === 'sdk') {
            // Called without a session whoever asks: signing out must not end the others' sessions.
            const res = await call(r, 'anonymous');
            expect(res.status).toBeLessThan(500);
            if (r.path === '/api/health') expect(res.status).toBe(200);
            return;
          }
          if (who === 'anonymous') {
            expect((await call(r, who, r.id ? ids[r.id] : undefined)).status).toBe(401);
            return;
          }
          if (who === 'foreign') {
            if (!r.id) {
              expect([401, 403, 404, 500]).not.toContain((await call(r, who)).status);
              return;
            }
            const theirs = await call(r, who, ids[r.id]);
            const missing = await call(r, who, MISSING);
            expect(theirs.status).toBe(404);
            expect(JSON.stringify(theirs.body).replaceAll(ids[r.id], '<id>')).toBe(JSON.stringify(missing.body).replaceAll(MISSING, '<id>'));
            return;
          }
          const allowed = ROLE_RANK[who] >= ROLE_RANK[r.role];
          if (!allowed) {
            expect((await call(r, who, r.id ? ids[r.id] : undefined)).status).toBe(403);
            return;
          }
          if (r.id && r.method === 'GET') expect((await call(r, who, ids[r.id])).status).toBe(200);
          else if (r.id) expect((await call(r, who, MISSING)).status).toBe(404);
          else expect([401, 403, 404, 500]).not.toContain((await call(r, who)).status);
        });
      }
    });
  }
});
