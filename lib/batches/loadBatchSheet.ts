import 'server-only';
import { and, asc, eq, inArray, isNull, or } from 'drizzle-orm';
import type { DB } from '@/db/open';
import type { BatchView } from '@/db/queries/batches';
import { getRecipe } from '@/db/queries/pours';
import { molds, pours, teams, zones as zoneTable } from '@/db/schema';
import { standardZones } from './logBatch';
import { buildBatchSheet } from './buildBatchSheet';
import { thicknessRedose } from '@/lib/matches/thicknessRedose';
import { zoneCupsProblem } from '@/lib/recipes';

// The data of a batch's printable sheet: the batch, the standard it was
// poured to, and the sheet arithmetic with the team's dropper and sprue
// settings. Molds: the team's active molds, plus the batch's own mold even
// if it has since been archived; the batch's mold (else the standard's) is
// marked selected.
export async function loadBatchSheet(database: DB, teamId: string, batch: BatchView) {
  const team = database.select().from(teams).where(eq(teams.id, teamId)).get()!;
  const std = database.select().from(pours).where(and(eq(pours.id, batch.standardPourId), eq(pours.teamId, teamId))).get()!;
  const recipe = getRecipe(database, std.id);
  const selectedMoldId = batch.moldId ?? std.moldId;
  const moldRows = database
    .select({ id: molds.id, name: molds.name, cavities: molds.cavities, mlPerCavity: molds.mlPerCavity, thickness: molds.thickness })
    .from(molds)
    .where(and(eq(molds.teamId, teamId), selectedMoldId ? or(isNull(molds.archivedAt), eq(molds.id, selectedMoldId)) : isNull(molds.archivedAt)))
    .orderBy(asc(molds.name))
    .all();
  // Selected mold first: it is the one the sheet is for.
  moldRows.sort((a, b) => Number(b.id === selectedMoldId) - Number(a.id === selectedMoldId));
  // Layers in the match's zone order (the first is the top: the back over the
  // belly), each zone the standard measured or doses.
  const samples = standardZones(database, std.id);
  const zones = database.select({ name: zoneTable.name }).from(zoneTable).where(eq(zoneTable.matchId, batch.matchId)).orderBy(asc(zoneTable.position)).all()
    .filter((z) => samples.some((s) => s.zone === z.name) || recipe.some((l) => l.zone === z.name))
    .map((z) => {
      const s = samples.find((x) => x.zone === z.name);
      return { name: z.name, lab: s ? { l: s.l, a: s.a, b: s.b } : null, hex: s?.hex ?? null, uncertainty: s?.uncertainty ?? null };
    });
  const planIds = (batch.plan ?? []).map((p) => p.moldId);
  const planRows = planIds.length
    ? database.select({ id: molds.id, name: molds.name, cavities: molds.cavities, mlPerCavity: molds.mlPerCavity, thickness: molds.thickness })
      .from(molds).where(and(eq(molds.teamId, teamId), inArray(molds.id, planIds))).all()
    : [];
  const plan = (batch.plan ?? []).flatMap((p) => {
    const m = planRows.find((r) => r.id === p.moldId);
    return m && m.cavities >= 1 && m.mlPerCavity > 0 ? [{ ...m, shots: p.shots }] : [];
  });
  const sheet = buildBatchSheet({
    cups: batch.cups,
    dropsPerMl: team.dropsPerMl,
    sprueAllowanceMl: team.sprueAllowanceMl,
    zones,
    recipe,
    molds: moldRows,
    selectedMoldId,
    tempF: std.tempF,
    zoneCups: zoneCupsProblem(batch.cups, zones.map((z) => z.name), batch.zoneCups) ? null : batch.zoneCups,
    plan: plan.length ? plan : null,
    volumeUnit: team.volumeUnit,
  });
  // A standard poured in a mold of another thickness class: its recipe re-dosed, as a prediction.
  const thicknessOf = (id: string | null) => (id ? database.select({ t: molds.thickness }).from(molds).where(and(eq(molds.id, id), eq(molds.teamId, teamId))).get()?.t ?? null : null);
  const stdThickness = thicknessOf(std.moldId);
  const sheetThickness = thicknessOf(selectedMoldId);
  const redose = stdThickness && sheetThickness ? await thicknessRedose(database, teamId, recipe, stdThickness, sheetThickness) : null;
  return {
    thicknessRedose: redose,
    batch: { id: batch.id, createdAt: batch.createdAt, createdBy: batch.createdBy, pass: batch.pass, baits: batch.baits, baitsExpected: batch.baitsExpected, notes: batch.notes },
    cost: batch.cost,
    stock: batch.stock,
    belowZero: batch.belowZero,
    match: { id: batch.matchId, name: batch.matchName, tolerance: batch.tolerance },
    // Per zone: ΔE00 (with its ±) against the standard and, when marked, against the reference in frame.
    // Flake: the batch's coverage with its ± beside the standard's.
    qc: batch.zones.map((z) => ({
      name: z.name, dE00: z.dE00, uncertainty: z.uncertainty, band: z.band, inFrame: z.inFrame as { dE00: number; band: string; uncertainty?: number } | null,
      flake: z.flake as { coverage: number; coverageUncertainty?: number } | null, standardFlake: z.standard?.flake ?? null,
    })),
    standard: { pourId: std.id, number: std.number, moldId: std.moldId, batchCups: std.batchCups },
    ...sheet,
  };
}
