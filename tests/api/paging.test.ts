import { beforeAll, describe, expect, it } from 'vitest';
import { api, expectErrorShape, signUpShop } from '../support/http';

// The list routes without paging parameters answer as before (a plain array); with `limit`
// or `cursor`, { items, nextCursor }. A new shop of its own, so the counts are known.
describe('paged list routes', () => {
  let cookie: string;
  const names = ['Amber grub', 'Bluegill fry', 'Amber craw', 'Dusk leech', 'Moss frog', 'Amber shad', 'Pale minnow'];
  beforeAll(async () => {
    ({ cookie } = await signUpShop('Paging shop'));
    for (const [i, name] of names.entries()) {
      const res = await api('/api/matches', { cookie, body: { name, zones: ['back', 'belly'], notes: i === 3 ? 'an amber belly' : null } });
      expect(res.status).toBe(201);
    }
  });

  it('GET /api/matches without parameters: the whole list, an array as API.md has it', async () => {
    const res = await api('/api/matches', { cookie });
    expect(res.status).toBe(200);
    expect(Array.isArray(res.body)).toBe(true);
    expect(res.body).toHaveLength(names.length);
  });

  it('GET /api/matches?limit=3: pages that follow nextCursor to the end, same order, no repeats', async () => {
    const all = (await api('/api/matches', { cookie })).body.map((m: { id: string }) => m.id);
    const seen: string[] = [];
    let url = '/api/matches?limit=3';
    for (let i = 0; i < 10; i++) {
      const res = await api(url, { cookie });
      expect(res.status).toBe(200);
      expect(res.body.items.length).toBeLessThanOrEqual(3);
      // Each item is a whole Match: zones, target, pours, standardPourId.
      for (const m of res.body.items) expect(Object.keys(m)).toEqual(expect.arrayContaining(['id', 'name', 'status', 'zones', 'tolerance', 'target', 'pours', 'standardPourId']));
      seen.push(...res.body.items.map((m: { id: string }) => m.id));
      if (res.body.nextCursor === null) break;
      url = `/api/matches?limit=3&cursor=${encodeURIComponent(res.body.nextCursor)}`;
    }
    expect(seen).toEqual(all);
  });

  it('filters by status and by a search of name and notes (case-blind)', async () => {
    const found = await api('/api/matches?q=AMBER&limit=50', { cookie });
    expect(found.body.items.map((m: { name: string }) => m.name).sort()).toEqual(['Amber craw', 'Amber grub', 'Amber shad', 'Dusk leech']);
    expect(found.body.nextCursor).toBeNull();
    const open = await api('/api/matches?status=open', { cookie });
    expect(open.body).toHaveLength(names.length);
    expect((await api('/api/matches?status=approved', { cookie })).body).toEqual([]);
  });

  it('refuses a bad limit, status or cursor with 400 in the one error shape', async () => {
    for (const q of ['limit=0', 'limit=201', 'limit=two', 'status=done', 'cursor=not-a-cursor']) {
      const res = await api(`/api/matches?${q}`, { cookie });
      expect(res.status, q).toBe(400);
      expectErrorShape(res.body);
      expect(res.body.error.code, q).toBe('invalid_query');
    }
  });

  it('pours, batches and photos page the same way; without parameters they answer arrays', async () => {
    const match = (await api('/api/matches', { cookie })).body[0];
    for (const path of [`/api/matches/${match.id}/pours`, `/api/matches/${match.id}/batches`, '/api/batches', '/api/photos']) {
      const plain = await api(path, { cookie });
      expect(plain.status, path).toBe(200);
      expect(plain.body, path).toEqual([]);
      const paged = await api(`${path}?limit=5`, { cookie });
      expect(paged.status, path).toBe(200);
      expect(paged.body, path).toEqual({ items: [], nextCursor: null });
    }
    expect((await api('/api/matches/no-such-match/pours?limit=5', { cookie })).status).toBe(404);
  });
});
