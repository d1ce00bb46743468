import 'server-only';
import { and, eq, inArray, isNull, max } from 'drizzle-orm';
import type { DB } from '@/db/open';
import type { Member } from '@/db/queries/members';
import { colorants, matches, pours, recipeLines, teams } from '@/db/schema';
import { getLiveMold } from '@/db/queries/libraries';
import { targetUncertainties } from '@/db/queries/pours';
import { compareLab } from '@/lib/color';
import { recordAudit } from '@/lib/audit';
import { newId } from '@/lib/ids';
import { ApiError } from '@/lib/http/api';
import type { PourInput } from '@/lib/validations/match';
import { defaultBase } from '@/lib/batches/batchMaterials';
import { batchDraws, splitZoneCups } from '@/lib/recipes';
import { moveStock } from '@/lib/stock/moveStock';
import { toLibraryUnits } from './libraryUnits';
import { assertZonesOfMatch, loadMatch } from './loadMatch';
import { insertSample } from './insertSample';
import { comparedExtras, measureZones } from './measureZones';

// Measures a test pour's photo and stores it as the match's next numbered
// pour, with its recipe and ΔE00 per zone against the target. A pour is never
// edited afterwards; a correction is a new pour that names the one it replaces.
export async function addPour(database: DB, member: Member, matchId: string, input: PourInput): Promise<string> {
  const teamId = member.team.id;
  const { match, zones: zoneRows } = loadMatch(database, teamId, matchId);
  if (match.status === 'archived') throw new ApiError(409, 'archived', 'This match is archived; reopen it before pouring again');
  if (zoneRows.length === 0 || zoneRows.some((z) => z.targetL === null)) {
    throw new ApiError(409, 'no_target', 'This match has no target yet: sample every zone on a reference photo first');
  }
  assertZonesOfMatch(input.zones.map((z) => z.name), zoneRows);
  const zoneNames = new Set(zoneRows.map((z) => z.name));
  input.recipe.forEach((l, i) => {
    if (!zoneNames.has(l.zone)) throw new ApiError(400, 'invalid_body', `recipe[${i}].zone: "${l.zone}" is not a zone of this match`);
  });
  const colorantIds = [...new Set(input.recipe.map((l) => l.colorantId))];
  const known = new Map(
    (colorantIds.length
      ? database.select({ id: colorants.id, name: colorants.name, unit: colorants.unit }).from(colorants).where(and(eq(colorants.teamId, teamId), inArray(colorants.id, colorantIds), isNull(colorants.archivedAt))).all()
      : []
    ).map((c) => [c.id, c]),
  );
  input.recipe.forEach((l, i) => {
    if (!known.has(l.colorantId)) throw new ApiError(400, 'invalid_body', `recipe[${i}].colorantId: no such colorant in your library (or it was archived)`);
  });
  const team = database.select({ dropsPerMl: teams.dropsPerMl }).from(teams).where(eq(teams.id, teamId)).get()!;
  const recipe = toLibraryUnits(input.recipe, known, team.dropsPerMl);
  if (input.moldId && !getLiveMold(database, teamId, input.moldId)) {
    throw new ApiError(400, 'invalid_body', 'moldId: no such mold in your library (or it was archived)');
  }
  if (input.correctsPourId && !database.select({ id: pours.id }).from(pours).where(and(eq(pours.id, input.correctsPourId), eq(pours.matchId, matchId))).get()) {
    throw new ApiError(400, 'invalid_body', 'correctsPourId: no such pour in this match');
  }
  const measured = await measureZones(database, teamId, input.photoId, input.zones, input.neutral);
  const targetU = targetUncertainties(database, teamId, matchId);
  const id = newId();
  const draws = pourDraws(database, teamId, input, zoneRows.map((z) => z.name));
  database.transaction((tx) => {
    const last = tx.select({ n: max(pours.number) }).from(pours).where(eq(pours.matchId, matchId)).get();
    const number = (last?.n ?? 0) + 1;
    tx.insert(pours)
      .values({
        id, teamId, matchId, number, photoId: input.photoId, moldId: input.moldId ?? null, batchCups: input.batchCups ?? null,
        tempF: input.tempF ?? null, notes: input.notes ?? null, correctsPourId: input.correctsPourId ?? null, createdBy: member.user.id,
      })
      .run();
    recipe.forEach((l, position) => tx.insert(recipeLines).values({ id: newId(), pourId: id, position, ...l }).run());
    measured.regions.forEach((r, i) => {
      const z = zoneRows.find((zr) => zr.name === r.name)!;
      insertSample(tx, {
        teamId, photoId: input.photoId, of: { purpose: 'pour', matchId, pourId: id }, region: r,
        shape: input.zones[i]!.shape, neutral: input.neutral, whiteBalance: measured.whiteBalance,
        compared: {
          cmp: compareLab({ l: z.targetL!, a: z.targetA!, b: z.targetB! }, r.lab, match.tolerance),
          extras: comparedExtras(r, targetU.get(r.name) ?? null, measured.references[r.name], input.zones[i]!.reference, match.tolerance),
        },
      });
    });
    for (const d of draws) {
      if (d.amount > 0) moveStock(tx, { teamId, colorantId: d.colorantId, kind: 'pour', amount: -d.amount, pourId: id, createdBy: member.user.id });
    }
    tx.update(matches).set({ updatedAt: Date.now() }).where(eq(matches.id, matchId)).run();
    recordAudit(tx, { teamId, actorId: member.user.id, action: 'pour.created', entity: 'pour', entityId: id, data: { matchId, number } });
  });
  return id;
}

// When the shop's setting says so, a test pour with a batch size draws its
// doses (its cups split evenly between the match's zones) and its plastisol
// from stock, as a batch does.
function pourDraws(database: DB, teamId: string, input: PourInput, zones: string[]) {
  const team = database.select({ on: teams.stockDrawsPours, dropsPerMl: teams.dropsPerMl }).from(teams).where(eq(teams.id, teamId)).get();
  if (!team?.on || !input.batchCups || !(input.batchCups > 0)) return [];
  const ids = [...new Set(input.recipe.map((l) => l.colorantId))];
  const rows = ids.length
    ? database.select({ id: colorants.id, name: colorants.name, unit: colorants.unit, costPerUnit: colorants.costPerUnit }).from(colorants).where(and(eq(colorants.teamId, teamId), inArray(colorants.id, ids))).all()
    : [];
  return batchDraws({ zoneCups: splitZoneCups(input.batchCups, zones), recipe: input.recipe, colorants: rows, base: defaultBase(database, teamId), dropsPerMl: team.dropsPerMl }).draws;
}
