import { and, eq, gt, inArray } from 'drizzle-orm';
import { drizzle } from 'drizzle-orm/better-sqlite3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { LARGE_SHOP, type LargeShop, seedLargeShop } from '../../bench/seed-large-shop';
import { getBatch, listBatches, pageMatchBatches, pageRecentBatches } from '../../db/queries/batches';
import { colorHistoryKeysSince, colorHistoryStamp, loadColorHistory, loadFlakeHistory, loadMatchHistory, targetFlakeCoverage } from '../../db/queries/colorHistory';
import { matchHistory } from '../../db/queries/history';
import { getMatchDetail } from '../../db/queries/matchDetail';
import { getMatch, listMatches, pageMatches } from '../../db/queries/matches';
import type { DB } from '../../db/open';
import { pagePhotos } from '../../db/queries/photos';
import { pagePourSummaries } from '../../db/queries/pourHistory';
import { getPour } from '../../db/queries/pours';
import { listSignOffQueue } from '../../db/queries/signOffQueue';
import { listStandards } from '../../db/queries/standards';
import * as schema from '../../db/schema';
import { freshDb } from '../support/db';

// Tables that grow with the shop's work: a full SCAN of one of them (with or without an
// index to walk in order) reads every team's rows to answer about one match or one page.
const BIG = ['matches', 'zones', 'pours', 'recipe_lines', 'samples', 'photos', 'batches', 'sign_offs', 'audit_events', 'stock_movements', 'swatches'];

// Columns that narrow a team's rows only to a kind or a stretch of time.
const BROAD = ['team_id', 'purpose', 'status', 'kind', 'decision', 'action', 'created_at', 'updated_at', 'submitted_at'];

type Query = { sql: string; params: unknown[] };

describe('query plans of the hot reads on a large shop (EXPLAIN QUERY PLAN)', () => {
  const { database, cleanup } = freshDb();
  const seen: Query[] = [];
  // The same connection, with a logger that keeps every statement the queries run.
  const logged = drizzle(database.$client, { schema, logger: { logQuery: (sql, params) => seen.push({ sql, params }) } }) as unknown as DB;
  let shop: LargeShop;
  beforeAll(async () => {
    shop = await seedLargeShop(database, { matches: 40, pours: 800 });
  }, 60_000);
  afterAll(cleanup);

  // Runs `read`, then the plan of every statement it sent; returns the plans' lines.
  function plansOf(read: (d: DB) => unknown): { sql: string; plan: string[] }[] {
    seen.length = 0;
    read(logged);
    expect(seen.length, 'the read sent no statement').toBeGreaterThan(0);
    return seen.map(({ sql, params }) => ({
      sql,
      plan: database.$client.prepare(`explain query plan ${sql}`).all(...(params as unknown[])).map((r) => (r as { detail: string }).detail),
    }));
  }

  // A full SCAN of a big table; and a big table reached by the team alone (every row of the
  // shop's, filtered afterwards) unless the read is about the whole shop or that table is the
  // one the read lists (`teamWide`): a read about one match, pour or batch, or one page of a
  // list, touches the rows it answers with.
  function badSteps(read: (d: DB) => unknown, teamWide: string[] | 'all'): string[] {
    const bad = (line: string) => {
      const scan = line.match(/^SCAN (\w+)/);
      if (scan) return BIG.includes(scan[1]!);
      // SEARCH t USING INDEX i (team_id=? AND purpose=?): the team, narrowed only by a kind or a time.
      const search = line.match(/^SEARCH (\w+) USING (?:COVERING )?INDEX \w+ \((.+)\)$/);
      if (!search || teamWide === 'all' || !BIG.includes(search[1]!) || teamWide.includes(search[1]!)) return false;
      const columns = search[2]!.split(' AND ').map((c) => c.replace(/[=<>].*$/, ''));
      return columns.includes('team_id') && columns.every((c) => BROAD.includes(c));
    };
    return plansOf(read).flatMap(({ sql, plan }) => plan.filter(bad).map((line) => `${line}\n    in: ${sql}`));
  }

  const team = () => shop.teamId;
  const approved = () => getMatch(database, team(), shop.matchIds[4]!)!; // every fourth match is approved with batches
  // [what, the read, the tables it may read by the team alone ('all': a read about the whole shop)]
  const cases: [string, (d: DB) => unknown, string[] | 'all'][] = [
    ['a match by id with its pours (GET /api/matches/:id)', (d) => getMatchDetail(d, team(), shop.matchIds[7]!), []],
    ['listMatches, no filter', (d) => listMatches(d, team()), ['matches']],
    ['listMatches by status and search', (d) => listMatches(d, team(), { status: 'open', q: 'craw' }), ['matches']],
    ['a page of matches after a cursor, filtered', (d) => pageMatches(d, team(), { status: 'approved' }, { limit: 10, cursor: { at: Date.now(), id: 'zzzz' } }), ['matches']],
    ['a page of a match\'s pours', (d) => pagePourSummaries(d, team(), shop.matchIds[7]!, { limit: 10, cursor: { at: 12, id: 'x' } }), []],
    ['a pour', (d) => getPour(d, team(), approved().pours[0]!.id), []],
    ['the batches of a standard', (d) => listBatches(d, team(), approved().id), []],
    ['a page of a standard\'s batches', (d) => pageMatchBatches(d, team(), approved().id, { limit: 5, cursor: { at: 0, id: '' } }), []],
    ['a page of the team\'s recent batches', (d) => pageRecentBatches(d, team(), { limit: 20, cursor: { at: Date.now(), id: 'zzzz' } }), ['batches']],
    ['a batch', (d) => getBatch(d, team(), pageRecentBatches(database, team(), { limit: 1, cursor: null }).items[0]!.id), []],
    ['a page of the team\'s photos', (d) => pagePhotos(d, team(), { limit: 48, cursor: { at: Date.now(), id: 'zzzz' } }), ['photos']],
    ['a match\'s sign-off history', (d) => matchHistory(d, team(), approved().id), []],
    ['the dose history of a match (next-pour hint)', (d) => loadMatchHistory(d, team(), shop.matchIds[7]!, 10), []],
    ['the shop\'s colour history and its fingerprint', (d) => [colorHistoryStamp(d, team()), loadColorHistory(d, team()), colorHistoryKeysSince(d, team(), Date.now() - 86400_000)], 'all'],
    ['the flake history and a target\'s flake coverage', (d) => [loadFlakeHistory(d, team()), targetFlakeCoverage(d, team(), shop.matchIds[7]!)], 'all'],
    ['the standards and the sign-off queue', (d) => [listStandards(d, team()), listSignOffQueue(d, team())], 'all'],
  ];

  for (const [name, read, teamWide] of cases) {
    const alone = teamWide === 'all' ? '' : `, no other read by the team alone${teamWide.length ? ` than ${teamWide.join(', ')}` : ''}`;
    it(`${name}: no full scan of a big table${alone}`, () => {
      expect(badSteps(read, teamWide)).toEqual([]);
    });
  }

  it('catches a read of the whole team\'s rows for one page (the check can fail)', () => {
    const ids = pagePhotos(database, team(), { limit: 5, cursor: null }).items.map((p) => p.id);
    const steps = badSteps((d) => d.select().from(schema.samples).where(and(eq(schema.samples.teamId, team()), inArray(schema.samples.photoId, ids))).all(), ['photos']);
    expect(steps).toHaveLength(1);
    expect(steps[0]).toMatch(/^SEARCH samples USING INDEX \w+ \(team_id=\?\)/);
  });

  it('catches a full scan when there is one (the check can fail)', () => {
    const scans = badSteps((d) => d.select().from(schema.samples).where(gt(schema.samples.l, 50)).all(), 'all');
    expect(scans.length).toBe(1);
    expect(scans[0]).toMatch(/^SCAN samples/);
  });

  it('the seeded shop is the size asked for, with invented names', () => {
    expect(database.$client.prepare('select count(*) as n from pours where team_id = ?').get(team())).toEqual({ n: 800 });
    expect(LARGE_SHOP.maker).toMatch(/\.test$/);
  });
});
