import { and, asc, eq } from 'drizzle-orm';
import type { DoseStep } from '../../lib/color/estimateColorantEffects';
import type { DB } from '../open';
import { pours, recipeLines, samples } from '../schema';

export const doseKey = (colorantId: string, unit: string) => `${colorantId}:${unit}`;

// Every step of the team's history: for consecutive pours of a match, per zone,
// how each colorant's dose per cup changed and how the measured colour moved.
export function loadDoseSteps(database: DB, teamId: string): DoseStep[] {
  const pourRows = database
    .select({ id: pours.id, matchId: pours.matchId, number: pours.number })
    .from(pours)
    .where(eq(pours.teamId, teamId))
    .orderBy(asc(pours.matchId), asc(pours.number))
    .all();
  const lines = database
    .select({ pourId: recipeLines.pourId, zone: recipeLines.zone, colorantId: recipeLines.colorantId, amount: recipeLines.amount, unit: recipeLines.unit })
    .from(recipeLines)
    .innerJoin(pours, eq(pours.id, recipeLines.pourId))
    .where(eq(pours.teamId, teamId))
    .all();
  const labs = new Map<string, { l: number; a: number; b: number }>();
  for (const r of database
    .select({ pourId: samples.pourId, zone: samples.zone, l: samples.l, a: samples.a, b: samples.b })
    .from(samples)
    .where(and(eq(samples.teamId, teamId), eq(samples.purpose, 'pour')))
    .all()) {
    labs.set(`${r.pourId}|${r.zone}`, r);
  }
  const doses = new Map<string, Record<string, number>>();
  for (const l of lines) {
    const at = `${l.pourId}|${l.zone}`;
    const d = doses.get(at) ?? {};
    d[doseKey(l.colorantId, l.unit)] = (d[doseKey(l.colorantId, l.unit)] ?? 0) + l.amount;
    doses.set(at, d);
  }
  const zonesOf = (pourId: string) => [...labs.keys()].filter((k) => k.startsWith(`${pourId}|`)).map((k) => k.slice(pourId.length + 1));
  const steps: DoseStep[] = [];
  for (let i = 1; i < pourRows.length; i++) {
    const p = pourRows[i - 1]!;
    const q = pourRows[i]!;
    if (p.matchId !== q.matchId) continue;
    for (const zone of zonesOf(q.id)) {
      const sq = labs.get(`${q.id}|${zone}`)!;
      const sp = labs.get(`${p.id}|${zone}`);
      if (!sp) continue;
      const before = doses.get(`${p.id}|${zone}`) ?? {};
      const after = doses.get(`${q.id}|${zone}`) ?? {};
      const changed: Record<string, number> = {};
      for (const k of new Set([...Object.keys(before), ...Object.keys(after)])) {
        const d = (after[k] ?? 0) - (before[k] ?? 0);
        if (Math.abs(d) > 1e-9) changed[k] = d;
      }
      if (Object.keys(changed).length) steps.push({ doses: changed, moved: { l: sq.l - sp.l, a: sq.a - sp.a, b: sq.b - sp.b } });
    }
  }
  return steps;
}
