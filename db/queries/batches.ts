import 'server-only';
import { type SQL, and, asc, desc, eq, inArray } from 'drizzle-orm';
import { describeDifference, differenceUncertainty, type Lab, labToHex } from '../../lib/color';
import { type StandardRecipe, costOfBatch, defaultBase, getBase, standardRecipe } from '../../lib/batches/batchMaterials';
import { splitZoneCups } from '../../lib/recipes';
import { sampleFigures } from './pours';
import { batchMovements } from './stock';
import { lightState } from './light';
import type { DB } from '../open';
import { type PageOf, type PageRequest, afterCursor, cutPage } from './paging';
import { batches, matches, molds, pours, samples, teams, users, zones } from '../schema';

// Production batches in the API's Batch shape: ΔE00 per zone against the
// standard pour's measured colour, and pass/fail against the match's
// tolerance (stored when the batch was logged).
// `where` picks the batches (with the team), read in (createdAt, id) order, `limit` at most.
function batchViews(database: DB, teamId: string, where: SQL | undefined, order: 'asc' | 'desc' = 'asc', limit?: number) {
  const by = order === 'asc' ? asc : desc;
  const query = database
    .select({ b: batches, by: users.name, mold: molds.name, matchName: matches.name, tolerance: matches.tolerance, stdNumber: pours.number })
    .from(batches)
    .innerJoin(matches, eq(matches.id, batches.matchId))
    .innerJoin(pours, eq(pours.id, batches.standardPourId))
    .leftJoin(users, eq(users.id, batches.createdBy))
    .leftJoin(molds, eq(molds.id, batches.moldId))
    .where(and(where, eq(batches.teamId, teamId)))
    .orderBy(by(batches.createdAt), by(batches.id));
  const rows = limit === undefined ? query.all() : query.limit(limit).all();
  if (rows.length === 0) return [];
  const batchIds = rows.map((r) => r.b.id);
  const stdIds = [...new Set(rows.map((r) => r.b.standardPourId))];
  const matchIds = [...new Set(rows.map((r) => r.b.matchId))];
  const batchSamples = database.select().from(samples).where(and(eq(samples.purpose, 'batch'), inArray(samples.batchId, batchIds))).all();
  const stdSamples = database.select().from(samples).where(and(eq(samples.purpose, 'pour'), inArray(samples.pourId, stdIds))).all();
  const zoneOrder = database.select({ matchId: zones.matchId, name: zones.name, position: zones.position }).from(zones)
    .where(inArray(zones.matchId, matchIds)).orderBy(asc(zones.position)).all();
  const team = database.select().from(teams).where(eq(teams.id, teamId)).get()!;
  const moves = batchMovements(database, teamId, batchIds);
  const moldIds = [...new Set(rows.flatMap((r) => [r.b.moldId, ...(r.b.plan ?? []).map((p) => p.moldId)]).filter((x): x is string => !!x))];
  const moldRows = moldIds.length ? database.select().from(molds).where(and(eq(molds.teamId, teamId), inArray(molds.id, moldIds))).all() : [];
  const fallbackBase = defaultBase(database, teamId);
  // Each standard's recipe is read once for all its batches in the list.
  const standards = new Map<string, StandardRecipe>();
  const standardOf = (id: string) => {
    let s = standards.get(id);
    if (!s) standards.set(id, (s = standardRecipe(database, teamId, id)));
    return s;
  };
  return rows.map(({ b, by, mold, matchName, tolerance, stdNumber }) => {
    const order = zoneOrder.filter((z) => z.matchId === b.matchId).map((z) => z.name);
    const stdZoneNames = order.filter((z) => stdSamples.some((x) => x.pourId === b.standardPourId && x.zone === z));
    const zoneCups = b.zoneCups ?? splitZoneCups(b.cups, stdZoneNames);
    const plan = b.plan
      ? b.plan.map((p) => {
        const m = moldRows.find((x) => x.id === p.moldId);
        return { moldId: p.moldId, name: m?.name ?? 'a mold no longer in the library', cavities: m?.cavities ?? 0, mlPerCavity: m?.mlPerCavity ?? 0, shots: p.shots, baits: (m?.cavities ?? 0) * p.shots };
      })
      : null;
    const costMolds = [...(plan ?? []).map((p) => moldRows.find((m) => m.id === p.moldId)), moldRows.find((m) => m.id === b.moldId)]
      .filter((m, i, all): m is NonNullable<typeof m> => !!m && all.findIndex((x) => x?.id === m.id) === i);
    const base = b.baseColorantId ? getBase(database, teamId, b.baseColorantId) : fallbackBase;
    const cost = costOfBatch(database, teamId, {
      standardPourId: b.standardPourId, zoneCups, base, dropsPerMl: team.dropsPerMl, sprueAllowanceMl: team.sprueAllowanceMl,
      molds: costMolds, baits: b.baitsActual ?? b.baitsExpected, standard: standardOf(b.standardPourId),
    });
    const stock = moves.filter((m) => m.batchId === b.id).map(({ batchId: _b, ...m }) => m);
    const zs = batchSamples
      .filter((s) => s.batchId === b.id)
      .sort((x, y) => order.indexOf(x.zone) - order.indexOf(y.zone))
      .map((s) => {
        const std = stdSamples.find((x) => x.pourId === b.standardPourId && x.zone === s.zone);
        const lab = { l: s.l, a: s.a, b: s.b };
        const stdLab = std ? { l: std.l, a: std.a, b: std.b } : null;
        return {
          name: s.zone,
          lab,
          hex: s.hex,
          // The standard pour's own zone: its ± (ΔE00, about 95 %) and flake, as measured.
          standard: stdLab ? { lab: stdLab, hex: labToHex(stdLab), uncertainty: std!.uncertainty, flake: std!.flake as { coverage: number; coverageUncertainty?: number } } : null,
          ...sampleFigures(s),
          // The ± of ΔL*, ΔC*, ΔH* from both measurements (differenceUncertainty); null without both ±.
          ...componentUncertainty(stdLab, std?.uncertainty ?? null, lab, s.uncertainty),
          withinTolerance: s.dE00! <= tolerance,
          direction: stdLab ? describeDifference(stdLab, lab) : null,
        };
      });
    return {
      id: b.id,
      matchId: b.matchId,
      matchName,
      standardPourId: b.standardPourId,
      standardPourNumber: stdNumber,
      tolerance,
      pass: b.pass,
      zones: zs,
      // Against the standard's photo: was each corrected from a grey card?
      light: lightState(batchSamples.filter((s) => s.batchId === b.id), stdSamples.some((s) => s.pourId === b.standardPourId && (s.whiteBalance as { applied?: boolean } | null)?.applied)),
      cups: b.cups,
      moldId: b.moldId,
      mold,
      baits: b.baitsActual,
      baitsExpected: b.baitsExpected,
      photoId: b.photoId,
      notes: b.notes,
      createdBy: by,
      createdAt: b.createdAt,
      zoneCups,
      plan,
      baseColorantId: base?.id ?? null,
      // What the batch took from stock, and the shelf it left (issue #13).
      stock,
      belowZero: stock.filter((m) => m.balance < 0).map((m) => m.name),
      cost: { currency: team.currency, ...cost },
    };
  });
}

export function getBatch(database: DB, teamId: string, batchId: string) {
  return batchViews(database, teamId, eq(batches.id, batchId))[0] ?? null;
}

// A match's batches, oldest first (the order of a run chart).
export function listBatches(database: DB, teamId: string, matchId: string) {
  return batchViews(database, teamId, eq(batches.matchId, matchId));
}

// The team's most recent batches across all its standards, newest first.
export function listRecentBatches(database: DB, teamId: string, limit = 100) {
  return pageRecentBatches(database, teamId, { limit, cursor: null }).items;
}

// One page of them, newest first (keyset on createdAt, id: batches_team_created_idx).
export function pageRecentBatches(database: DB, teamId: string, page: PageRequest): PageOf<BatchView> {
  const views = batchViews(database, teamId, afterCursor(batches.createdAt, batches.id, page.cursor, 'desc'), 'desc', page.limit + 1);
  return cutPage(views, page.limit, (v) => ({ at: v.createdAt, id: v.id }), (kept) => kept);
}

// One page of a match's batches, oldest first (the run chart's order).
export function pageMatchBatches(database: DB, teamId: string, matchId: string, page: PageRequest): PageOf<BatchView> {
  const views = batchViews(database, teamId, and(eq(batches.matchId, matchId), afterCursor(batches.createdAt, batches.id, page.cursor, 'asc')), 'asc', page.limit + 1);
  return cutPage(views, page.limit, (v) => ({ at: v.createdAt, id: v.id }), (kept) => kept);
}

export type BatchView = NonNullable<ReturnType<typeof getBatch>>;

function componentUncertainty(std: Lab | null, uStd: number | null, lab: Lab, u: number | null) {
  const d = std && uStd !== null && u !== null ? differenceUncertainty(std, uStd, lab, u) : null;
  return { dLUncertainty: d?.dL ?? null, dCUncertainty: d?.dC ?? null, dHUncertainty: d?.dH ?? null };
}
