import 'server-only';
import { and, eq } from 'drizzle-orm';
import type { DB } from '@/db/open';
import type { Member } from '@/db/queries/members';
import { getLiveMold } from '@/db/queries/libraries';
import { batches, matches, pours, samples, teams } from '@/db/schema';
import { compareLab } from '@/lib/color';
import { recordAudit } from '@/lib/audit';
import { newId } from '@/lib/ids';
import { ApiError } from '@/lib/http/api';
import { queueMail } from '@/lib/mail/queue';
import { batchFailedMail } from '@/lib/mail/templates-production';
import { loadMatch } from '@/lib/matches/loadMatch';
import { insertSample } from '@/lib/matches/insertSample';
import { comparedExtras, measureZones } from '@/lib/matches/measureZones';
import { moldYield, splitZoneCups, zoneCupsProblem } from '@/lib/recipes';
import { moveStock } from '@/lib/stock/moveStock';
import { batchMaterials, defaultBase, getBase } from './batchMaterials';
import { leadsAndOwners } from '@/lib/signoff/recipients';
import type { BatchInput } from '@/lib/validations/production';

export const batchLink = (baseUrl: string, matchId: string, batchId: string) =>
  `${baseUrl}/matches/${encodeURIComponent(matchId)}?batch=${encodeURIComponent(batchId)}`;

// The standard's measured colour per zone: the samples of the standard pour.
export function standardZones(database: Pick<DB, 'select'>, standardPourId: string) {
  return database.select().from(samples).where(and(eq(samples.pourId, standardPourId), eq(samples.purpose, 'pour'))).all();
}

// The molds of a run plan, each from the team's live library.
function planMolds(database: DB, teamId: string, plan: { moldId: string; shots: number }[] | null) {
  if (!plan) return null;
  return plan.map((p, i) => {
    const m = getLiveMold(database, teamId, p.moldId);
    if (!m) throw new ApiError(400, 'invalid_body', `plan[${i}].moldId: no such mold in your library`);
    return { ...m, shots: p.shots };
  });
}

// Logs one production batch of a match's standard: measures the QC photo's
// zones, compares each with the standard pour's colour for that zone
// (CIEDE2000 through compareLab) and passes the batch when every zone is
// within the match's tolerance. Every zone of the standard must be marked, so
// a batch cannot pass on the zones it left out. Stored in one transaction; a
// failed batch is e-mailed to the team's leads and owners.
export async function logBatch(database: DB, member: Member, matchId: string, input: BatchInput, baseUrl: string) {
  const teamId = member.team.id;
  const { match, zones: zoneRows } = loadMatch(database, teamId, matchId);
  if (match.status === 'archived') throw new ApiError(409, 'archived', 'This match is archived; no batches are logged against it');
  const standardPourId = match.standardPourId;
  if (!standardPourId) throw new ApiError(409, 'no_standard', 'This match has no approved standard yet: a lead signs off a pour first');
  const std = standardZones(database, standardPourId);
  const stdNames = new Set(std.map((s) => s.zone));
  input.zones.forEach((z, i) => {
    if (!stdNames.has(z.name)) {
      throw new ApiError(400, 'invalid_body', `zones[${i}].name: "${z.name}" is not a zone of the standard (zones: ${[...stdNames].join(', ')})`);
    }
  });
  const marked = new Set(input.zones.map((z) => z.name));
  const missing = [...stdNames].filter((n) => !marked.has(n));
  if (missing.length) throw new ApiError(400, 'invalid_body', `zones: mark every zone of the standard (missing: ${missing.join(', ')})`);
  const mold = input.moldId ? getLiveMold(database, teamId, input.moldId) : undefined;
  if (input.moldId && !mold) throw new ApiError(400, 'invalid_body', 'moldId: no such mold in your library');
  const team = database.select({ sprue: teams.sprueAllowanceMl, dropsPerMl: teams.dropsPerMl }).from(teams).where(eq(teams.id, teamId)).get()!;
  const usable = mold && mold.cavities >= 1 && mold.mlPerCavity > 0;
  const planned = planMolds(database, teamId, input.plan ?? null);
  const baitsExpected = input.baitsExpected
    ?? (planned ? planned.reduce((s, p) => s + p.cavities * p.shots, 0) : usable ? moldYield(input.cups, mold, team.sprue).baits : null);
  // Each zone's own cups (a laminate mixes each colour in its own cup).
  const zoneNames = [...stdNames].sort((a, b) => zoneRows.findIndex((z) => z.name === a) - zoneRows.findIndex((z) => z.name === b));
  const splitProblem = input.zoneCups?.length ? zoneCupsProblem(input.cups, zoneNames, input.zoneCups) : null;
  if (splitProblem) throw new ApiError(400, 'invalid_body', splitProblem);
  const zoneCups = splitZoneCups(input.cups, zoneNames, input.zoneCups);
  const base = input.baseColorantId ? getBase(database, teamId, input.baseColorantId) : defaultBase(database, teamId);
  if (input.baseColorantId && !base) throw new ApiError(400, 'invalid_body', 'baseColorantId: no such colorant in your library');
  const { draws } = batchMaterials(database, teamId, { standardPourId, zoneCups, base, dropsPerMl: team.dropsPerMl });

  const measured = await measureZones(database, teamId, input.photoId, input.zones, input.neutral);
  const figures = measured.regions.map((r, i) => {
    const s = std.find((x) => x.zone === r.name)!;
    return {
      region: r, shape: input.zones[i]!.shape, cmp: compareLab({ l: s.l, a: s.a, b: s.b }, r.lab, match.tolerance),
      extras: comparedExtras(r, s.uncertainty ?? null, measured.references[r.name], input.zones[i]!.reference, match.tolerance),
    };
  });
  const pass = figures.every((f) => f.cmp.withinTolerance);
  const id = newId();
  database.transaction((tx) => {
    // The standard may have changed while the photo was measured.
    const now = tx.select({ std: matches.standardPourId }).from(matches).where(eq(matches.id, matchId)).get();
    if (now?.std !== standardPourId) throw new ApiError(409, 'standard_changed', 'The standard changed while the batch was measured; log it again');
    tx.insert(batches)
      .values({
        id, teamId, matchId, standardPourId, photoId: input.photoId, moldId: input.moldId ?? null, cups: input.cups,
        baitsExpected, baitsActual: input.baits ?? null, pass, notes: input.notes ?? null, createdBy: member.user.id,
        zoneCups, plan: input.plan ?? null, baseColorantId: base?.id ?? null,
      })
      .run();
    // The batch draws its doses and plastisol from stock in the same
    // transaction: a batch that is not stored moves nothing.
    for (const d of draws) {
      if (d.amount > 0) moveStock(tx, { teamId, colorantId: d.colorantId, kind: 'batch', amount: -d.amount, batchId: id, createdBy: member.user.id });
    }
    for (const { region, shape, cmp, extras } of figures) {
      insertSample(tx, {
        teamId, photoId: input.photoId, of: { purpose: 'batch', matchId, batchId: id }, region, shape,
        neutral: input.neutral, whiteBalance: measured.whiteBalance, compared: { cmp, extras },
      });
    }
    recordAudit(tx, {
      teamId, actorId: member.user.id, action: 'batch.logged', entity: 'batch', entityId: id,
      data: { matchId, standardPourId, pass, cups: input.cups, tolerance: match.tolerance },
    });
  });

  if (!pass) {
    const stdNumber = database.select({ n: pours.number }).from(pours).where(eq(pours.id, standardPourId)).get()?.n ?? 0;
    const order = (name: string) => zoneRows.findIndex((z) => z.name === name);
    const mail = batchFailedMail({
      matchName: match.name,
      standardNumber: stdNumber,
      cups: input.cups,
      loggedBy: member.user.name,
      tolerance: match.tolerance,
      zones: figures
        .map((f) => ({ name: f.region.name, dE00: f.cmp.dE00, band: f.cmp.band }))
        .sort((a, b) => order(a.name) - order(b.name)),
      link: batchLink(baseUrl, matchId, id),
    });
    for (const to of leadsAndOwners(database, teamId)) queueMail(database, { teamId, to: to.email, ...mail });
  }
  return id;
}
