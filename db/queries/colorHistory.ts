import 'server-only';
import { and, asc, eq, gte, inArray, lte, sql } from 'drizzle-orm';
import type { DoseObservation } from '../../lib/color/types';
import { doseKey, MODELLED_KINDS } from '../../lib/matches/doseModel';
import type { DB } from '../open';
import { colorants, molds, pours, recipeLines, samples, swatches } from '../schema';

type Doses = Record<string, number>;

// Doses per cup of the modelled colorants (MODELLED_KINDS) of every pour's zones, keyed by
// "pourId|zone": of the whole team, or of one match's pours up to number `upTo` (read through
// pours_match_number, not every pour of the team).
function poursDoses(database: DB, teamId: string, match?: { id: string; upTo: number }): Map<string, Doses> {
  const rows = database
    .select({ pourId: recipeLines.pourId, zone: recipeLines.zone, colorantId: recipeLines.colorantId, amount: recipeLines.amount, unit: recipeLines.unit })
    .from(recipeLines)
    .innerJoin(pours, eq(pours.id, recipeLines.pourId))
    .innerJoin(colorants, eq(colorants.id, recipeLines.colorantId))
    .where(and(eq(pours.teamId, teamId), match ? and(eq(pours.matchId, match.id), lte(pours.number, match.upTo)) : undefined, inArray(colorants.kind, [...MODELLED_KINDS])))
    .all();
  const out = new Map<string, Doses>();
  for (const r of rows) {
    const at = `${r.pourId}|${r.zone}`;
    const d = out.get(at) ?? {};
    const k = doseKey(r.colorantId, r.unit);
    d[k] = (d[k] ?? 0) + r.amount;
    out.set(at, d);
  }
  return out;
}

// A cheap fingerprint of the team's logged colours: the model is refitted only when it changes.
export function colorHistoryStamp(database: DB, teamId: string): string {
  const r = database
    .select({ n: sql<number>`count(*)`, last: sql<number>`max(${samples.createdAt})` })
    .from(samples)
    .where(and(eq(samples.teamId, teamId), inArray(samples.purpose, ['pour', 'swatch'])))
    .get();
  return `${r?.n ?? 0}:${r?.last ?? 0}`;
}

// Every colour the team has logged with the doses that made it: each zone of each pour, and
// each calibration swatch (a base swatch has no dose).
export function loadColorHistory(database: DB, teamId: string): DoseObservation[] {
  const doses = poursDoses(database, teamId);
  const out: DoseObservation[] = database
    .select({ pourId: samples.pourId, zone: samples.zone, l: samples.l, a: samples.a, b: samples.b, thickness: molds.thickness })
    .from(samples)
    .innerJoin(pours, eq(pours.id, samples.pourId))
    .leftJoin(molds, eq(molds.id, pours.moldId))
    .where(and(eq(samples.teamId, teamId), eq(samples.purpose, 'pour')))
    .all()
    .map((s) => ({ doses: doses.get(`${s.pourId}|${s.zone}`) ?? {}, lab: { l: s.l, a: s.a, b: s.b }, thickness: s.thickness ?? 'standard' }));
  for (const s of database
    .select({ colorantId: swatches.colorantId, kind: colorants.kind, amount: swatches.amount, unit: swatches.unit, l: samples.l, a: samples.a, b: samples.b })
    .from(swatches)
    .innerJoin(samples, eq(samples.id, swatches.sampleId))
    .innerJoin(colorants, eq(colorants.id, swatches.colorantId))
    .where(eq(swatches.teamId, teamId))
    .all()) {
    const modelled = MODELLED_KINDS.includes(s.kind) && s.amount > 0;
    out.push({ doses: modelled ? { [doseKey(s.colorantId, s.unit)]: s.amount } : {}, lab: { l: s.l, a: s.a, b: s.b } });
  }
  return out;
}

// One match's pours up to and including pour `upTo`, oldest first, per zone: its own history,
// which corrects the shop's model locally.
export function loadMatchHistory(database: DB, teamId: string, matchId: string, upTo: number): Map<string, DoseObservation[]> {
  const doses = poursDoses(database, teamId, { id: matchId, upTo });
  const out = new Map<string, DoseObservation[]>();
  for (const s of database
    .select({ pourId: samples.pourId, zone: samples.zone, l: samples.l, a: samples.a, b: samples.b })
    .from(samples)
    .innerJoin(pours, eq(pours.id, samples.pourId))
    .where(and(eq(pours.teamId, teamId), eq(pours.matchId, matchId), lte(pours.number, upTo), eq(samples.purpose, 'pour')))
    .orderBy(asc(pours.number))
    .all()) {
    const list = out.get(s.zone) ?? [];
    list.push({ doses: doses.get(`${s.pourId}|${s.zone}`) ?? {}, lab: { l: s.l, a: s.a, b: s.b } });
    out.set(s.zone, list);
  }
  return out;
}

// The modelled colorant keys (colorant and unit) dosed in the team's pours and swatches logged
// at or after `since` (unix ms): what a cached fit has to check for a colorant it has not seen.
export function colorHistoryKeysSince(database: DB, teamId: string, since: number): string[] {
  const lines = database
    .selectDistinct({ colorantId: recipeLines.colorantId, unit: recipeLines.unit })
    .from(pours)
    .innerJoin(recipeLines, eq(recipeLines.pourId, pours.id))
    .innerJoin(colorants, eq(colorants.id, recipeLines.colorantId))
    .where(and(eq(pours.teamId, teamId), gte(pours.createdAt, since), inArray(colorants.kind, [...MODELLED_KINDS])))
    .all();
  const sw = database
    .selectDistinct({ colorantId: swatches.colorantId, unit: swatches.unit })
    .from(swatches)
    .innerJoin(colorants, eq(colorants.id, swatches.colorantId))
    .where(and(eq(swatches.teamId, teamId), gte(swatches.createdAt, since), inArray(colorants.kind, [...MODELLED_KINDS]), sql`${swatches.amount} > 0`))
    .all();
  return [...new Set([...lines, ...sw].map((r) => doseKey(r.colorantId, r.unit)))].sort();
}

// Flake observations per flake colorant key: every pour zone dosed with exactly one flake
// colorant, its dose per cup and the measured flake coverage of the zone.
export function loadFlakeHistory(database: DB, teamId: string): Record<string, { dose: number; coverage: number }[]> {
  const lines = database
    .select({ pourId: recipeLines.pourId, zone: recipeLines.zone, colorantId: recipeLines.colorantId, amount: recipeLines.amount, unit: recipeLines.unit })
    .from(recipeLines)
    .innerJoin(pours, eq(pours.id, recipeLines.pourId))
    .innerJoin(colorants, eq(colorants.id, recipeLines.colorantId))
    .where(and(eq(pours.teamId, teamId), eq(colorants.kind, 'flake')))
    .all();
  const byZone = new Map<string, { key: string; dose: number }[]>();
  for (const l of lines) byZone.set(`${l.pourId}|${l.zone}`, [...(byZone.get(`${l.pourId}|${l.zone}`) ?? []), { key: doseKey(l.colorantId, l.unit), dose: l.amount }]);
  const out: Record<string, { dose: number; coverage: number }[]> = {};
  if (byZone.size === 0) return out;
  for (const s of database
    .select({ pourId: samples.pourId, zone: samples.zone, flake: samples.flake })
    .from(samples)
    .where(and(eq(samples.teamId, teamId), eq(samples.purpose, 'pour')))
    .all()) {
    const f = byZone.get(`${s.pourId}|${s.zone}`);
    if (!f || new Set(f.map((x) => x.key)).size !== 1) continue;
    const coverage = (s.flake as { coverage?: number } | null)?.coverage;
    if (typeof coverage !== 'number') continue;
    (out[f[0]!.key] ??= []).push({ dose: f.reduce((t, x) => t + x.dose, 0), coverage });
  }
  return out;
}

// The mean measured flake coverage of each zone of a match's target.
export function targetFlakeCoverage(database: DB, teamId: string, matchId: string): Map<string, number> {
  const acc = new Map<string, number[]>();
  for (const s of database
    .select({ zone: samples.zone, flake: samples.flake })
    .from(samples)
    .where(and(eq(samples.teamId, teamId), eq(samples.matchId, matchId), eq(samples.purpose, 'target')))
    .all()) {
    const c = (s.flake as { coverage?: number } | null)?.coverage;
    if (typeof c === 'number') acc.set(s.zone, [...(acc.get(s.zone) ?? []), c]);
  }
  return new Map([...acc].map(([z, v]) => [z, v.reduce((a, b) => a + b, 0) / v.length]));
}
