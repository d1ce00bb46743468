import 'server-only';
import { and, asc, desc, eq, inArray, isNotNull, ne } from 'drizzle-orm';
import type { DB } from '../open';
import { batches, colorants, matches, pours, recipeLines, samples, signOffs, users, zones } from '../schema';

// The team's standards: every match that has an approved standard pour (and
// is not archived), with the standard's colour per zone, its recipe per cup,
// who approved it, and how its production batches have gone.
export function listStandards(database: DB, teamId: string) {
  const rows = database
    .select({ m: matches, number: pours.number, tempF: pours.tempF, moldId: pours.moldId })
    .from(matches)
    .innerJoin(pours, eq(pours.id, matches.standardPourId))
    .where(and(eq(matches.teamId, teamId), isNotNull(matches.standardPourId), ne(matches.status, 'archived')))
    .orderBy(asc(matches.name))
    .all();
  if (rows.length === 0) return [];
  const pourIds = rows.map((r) => r.m.standardPourId!);
  const matchIds = rows.map((r) => r.m.id);
  const zoneRows = database.select().from(zones).where(inArray(zones.matchId, matchIds)).orderBy(asc(zones.position)).all();
  const swatches = database.select().from(samples).where(and(eq(samples.purpose, 'pour'), inArray(samples.pourId, pourIds))).all();
  const recipe = database
    .select({ pourId: recipeLines.pourId, zone: recipeLines.zone, colorantId: recipeLines.colorantId, colorant: colorants.name, kind: colorants.kind, amount: recipeLines.amount, unit: recipeLines.unit })
    .from(recipeLines)
    .innerJoin(colorants, eq(colorants.id, recipeLines.colorantId))
    .where(inArray(recipeLines.pourId, pourIds))
    .orderBy(asc(recipeLines.position))
    .all();
  const approvals = database
    .select({ pourId: signOffs.pourId, at: signOffs.createdAt, by: users.name })
    .from(signOffs)
    .leftJoin(users, eq(users.id, signOffs.decidedBy))
    .where(and(eq(signOffs.decision, 'approved'), inArray(signOffs.pourId, pourIds)))
    .orderBy(desc(signOffs.createdAt))
    .all();
  const batchRows = database
    .select({ id: batches.id, matchId: batches.matchId, pass: batches.pass, createdAt: batches.createdAt })
    .from(batches)
    .where(and(eq(batches.teamId, teamId), inArray(batches.matchId, matchIds)))
    .orderBy(desc(batches.createdAt), desc(batches.id))
    .all();
  return rows.map(({ m, number, tempF, moldId }) => {
    const pourId = m.standardPourId!;
    const order = zoneRows.filter((z) => z.matchId === m.id).map((z) => z.name);
    const mine = batchRows.filter((b) => b.matchId === m.id);
    const approval = approvals.find((a) => a.pourId === pourId);
    return {
      matchId: m.id,
      name: m.name,
      status: m.status,
      tolerance: m.tolerance,
      standardPourId: pourId,
      standardPourNumber: number,
      tempF,
      moldId,
      approvedAt: approval?.at ?? null,
      approvedBy: approval?.by ?? null,
      zones: swatches
        .filter((s) => s.pourId === pourId)
        .sort((a, b) => order.indexOf(a.zone) - order.indexOf(b.zone))
        .map((s) => ({ name: s.zone, lab: { l: s.l, a: s.a, b: s.b }, hex: s.hex })),
      recipe: recipe.filter((r) => r.pourId === pourId).map(({ pourId: _p, ...line }) => line),
      batchCount: mine.length,
      lastBatch: mine[0] ? { id: mine[0].id, pass: mine[0].pass, createdAt: mine[0].createdAt } : null,
    };
  });
}

export type StandardView = ReturnType<typeof listStandards>[number];
