import 'server-only';
import { and, asc, eq } from 'drizzle-orm';
import { bandFor, describeDifference, labToHex } from '../../lib/color';
import type { DB } from '../open';
import { type Sample, colorants, molds, pours, recipeLines, samples, users, zones } from '../schema';
import { lightState, targetHasCard } from './light';

// A pour in the API's Pour shape: measured colour and ΔE00 per zone against
// the target, with the direction in words, and its recipe per cup.
export function getPour(database: DB, teamId: string, pourId: string) {
  const row = database
    .select({ p: pours, by: users.name, mold: molds.name })
    .from(pours)
    .leftJoin(users, eq(users.id, pours.createdBy))
    .leftJoin(molds, eq(molds.id, pours.moldId))
    .where(and(eq(pours.id, pourId), eq(pours.teamId, teamId)))
    .get();
  if (!row) return null;
  const { p } = row;
  const targets = database.select().from(zones).where(eq(zones.matchId, p.matchId)).orderBy(asc(zones.position)).all();
  const zoneSamples = database.select().from(samples).where(and(eq(samples.pourId, p.id), eq(samples.purpose, 'pour'))).all();
  const recipe = getRecipe(database, p.id);
  return {
    id: p.id,
    matchId: p.matchId,
    number: p.number,
    status: p.status,
    photoId: p.photoId,
    moldId: p.moldId,
    mold: row.mold,
    batchCups: p.batchCups,
    tempF: p.tempF,
    notes: p.notes,
    correctsPourId: p.correctsPourId,
    createdBy: row.by,
    createdAt: p.createdAt,
    submittedAt: p.submittedAt,
    zones: targets
      .map((t) => {
        const s = zoneSamples.find((x) => x.zone === t.name);
        if (!s) return null;
        const target = { l: t.targetL ?? s.l, a: t.targetA ?? s.a, b: t.targetB ?? s.b };
        const lab = { l: s.l, a: s.a, b: s.b };
        return {
          name: s.zone,
          lab,
          hex: s.hex,
          target: { lab: target, hex: labToHex(target) },
          ...sampleFigures(s),
          direction: describeDifference(target, lab),
        };
      })
      .filter((z) => z !== null),
    // Whether this photo and the reference were both corrected from a grey card.
    light: lightState(zoneSamples, targetHasCard(database, teamId, p.matchId)),
    recipe,
  };
}

// A pour's recipe per cup, in the order it was written, with colorant names.
export function getRecipe(database: DB, pourId: string) {
  return database
    .select({ zone: recipeLines.zone, colorantId: recipeLines.colorantId, colorant: colorants.name, kind: colorants.kind, amount: recipeLines.amount, unit: recipeLines.unit })
    .from(recipeLines)
    .innerJoin(colorants, eq(colorants.id, recipeLines.colorantId))
    .where(eq(recipeLines.pourId, pourId))
    .orderBy(asc(recipeLines.position))
    .all();
}

// The measured figures of a compared sample (pour or batch zone), as the API shows them.
export function sampleFigures(s: Sample) {
  return {
    dE00: s.dE00!,
    dL: s.dL!,
    dC: s.dC!,
    dH: s.dH!,
    band: bandFor(s.dE00!),
    shape: s.shape,
    pixels: s.pixels,
    kept: s.kept,
    spread: s.spread,
    glare: s.glare,
    flake: s.flake,
    whiteBalance: s.whiteBalance,
    // The ± (ΔE00, about 95 %) of dE00 from both measurements; null for samples measured before it existed.
    uncertainty: s.dE00Uncertainty,
    regionUncertainty: s.uncertainty,
    shading: s.shading,
    other: s.other,
    inFrame: s.inFrame,
  };
}

// Per zone, the ± of a match's target colour: the mean of its target samples' uncertainties.
export function targetUncertainties(database: DB, teamId: string, matchId: string): Map<string, number> {
  const rows = database
    .select({ zone: samples.zone, u: samples.uncertainty })
    .from(samples)
    .where(and(eq(samples.teamId, teamId), eq(samples.matchId, matchId), eq(samples.purpose, 'target')))
    .all();
  const by = new Map<string, number[]>();
  for (const r of rows) if (r.u !== null) by.set(r.zone, [...(by.get(r.zone) ?? []), r.u]);
  return new Map([...by].map(([zone, us]) => [zone, us.reduce((a, b) => a + b, 0) / us.length]));
}

export type PourView = NonNullable<ReturnType<typeof getPour>>;
