import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { type LargeShop, seedLargeShop } from '../../bench/seed-large-shop';
import { listBatches, pageMatchBatches, pageRecentBatches } from '../../db/queries/batches';
import { getMatch, listMatches, pageMatches } from '../../db/queries/matches';
import type { Cursor, PageOf, PageRequest } from '../../db/queries/paging';
import { pagePhotos } from '../../db/queries/photos';
import { listPourSummaries, pagePourSummaries } from '../../db/queries/pourHistory';
import { freshDb } from '../support/db';

// Follows the cursors to the end and returns every item, checking no page is over its limit.
function walk<T>(limit: number, read: (page: PageRequest) => PageOf<T>): T[] {
  const out: T[] = [];
  let cursor: Cursor | null = null;
  for (let guard = 0; guard < 1000; guard++) {
    const page = read({ limit, cursor });
    expect(page.items.length).toBeLessThanOrEqual(limit);
    out.push(...page.items);
    if (!page.next) return out;
    cursor = page.next;
  }
  throw new Error('the cursors never ended');
}

const ids = (xs: { id: string }[]) => xs.map((x) => x.id);

describe('keyset paging of the lists (fresh database, a seeded large shop)', () => {
  const { database, cleanup } = freshDb();
  let shop: LargeShop;
  let other: LargeShop;
  beforeAll(async () => {
    shop = await seedLargeShop(database, { matches: 30, pours: 450 });
    // A second shop beside it: its rows must never show up in the first one's pages.
    other = await seedLargeShop(database, { matches: 5, pours: 40, emailTag: 'other' });
  }, 60_000);
  afterAll(cleanup);

  it('pages of matches add up to the whole list, in its order, with no repeats', () => {
    const all = listMatches(database, shop.teamId);
    expect(all).toHaveLength(30);
    const paged = walk(7, (p) => pageMatches(database, shop.teamId, {}, p));
    expect(ids(paged)).toEqual(ids(all));
    expect(new Set(ids(paged)).size).toBe(30);
    expect(ids(paged).some((id) => other.matchIds.includes(id))).toBe(false);
  });

  it('filters matches in SQL by status and by a search of name and notes', () => {
    const all = listMatches(database, shop.teamId);
    const approved = listMatches(database, shop.teamId, { status: 'approved' });
    expect(approved.length).toBeGreaterThan(0);
    expect(ids(approved)).toEqual(ids(all.filter((m) => m.status === 'approved')));
    const word = all[3]!.name.split(' ')[0]!.toLowerCase();
    const found = listMatches(database, shop.teamId, { q: word });
    expect(ids(found)).toEqual(ids(all.filter((m) => m.name.toLowerCase().includes(word) || (m.notes ?? '').toLowerCase().includes(word))));
    expect(ids(walk(2, (p) => pageMatches(database, shop.teamId, { status: 'approved' }, p)))).toEqual(ids(approved));
    // LIKE's own wildcards are searched for as themselves.
    expect(listMatches(database, shop.teamId, { q: '%' })).toEqual([]);
    expect(listMatches(database, shop.teamId, { q: '_' })).toEqual([]);
  });

  it('a match keeps every pour; the pour history pages newest first', () => {
    const match = getMatch(database, shop.teamId, shop.matchIds[4]!)!;
    expect(match.pours.length).toBeGreaterThan(5);
    const all = listPourSummaries(database, shop.teamId, match.id);
    expect(all.map((p) => p.number)).toEqual(match.pours.map((p) => p.number).reverse());
    expect(walk(4, (p) => pagePourSummaries(database, shop.teamId, match.id, p))).toEqual(all);
    expect(listPourSummaries(database, other.teamId, match.id)).toEqual([]);
  });

  it('pages of batches (a standard\'s, oldest first; the team\'s, newest first) and of photos', () => {
    const approved = listMatches(database, shop.teamId, { status: 'approved' })[0]!;
    const batches = listBatches(database, shop.teamId, approved.id);
    expect(batches.length).toBeGreaterThan(3);
    expect(ids(walk(3, (p) => pageMatchBatches(database, shop.teamId, approved.id, p)))).toEqual(ids(batches));
    const recent = walk(25, (p) => pageRecentBatches(database, shop.teamId, p));
    expect(recent.length).toBe(shop.batches);
    const times = recent.map((b) => b.createdAt);
    expect(times).toEqual([...times].sort((a, b) => b - a));
    const photos = walk(40, (p) => pagePhotos(database, shop.teamId, p));
    expect(photos.length).toBe(shop.photos);
    expect(new Set(ids(photos)).size).toBe(shop.photos);
    expect(photos.every((p) => p.match !== null)).toBe(true);
  });
});
