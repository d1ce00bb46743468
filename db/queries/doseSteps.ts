import { asc, eq } from 'drizzle-orm';
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
  const labs = database
    .select({ pourId: samples.pourId, zone: samples.zone, l: samples.l, a: samples.a, b: samples.b })
    .from(samples)
    .where(eq(samples.teamId, teamId))
    .all()
    .filter((s) => s.pourId);
  const dosesOf = (pourId: string, zone: string) => {
    const out: Record<string, number> = {};
    for (const l of lines) if (l.pourId === pourId && l.zone === zone) out[doseKey(l.colorantId, l.unit)] = (out[doseKey(l.colorantId, l.unit)] ?? 0) + l.amount;
    return out;
  };
  const steps: DoseStep[] = [];
  for (let i = 1; i < pourRows.length; i++) {
    const p = pourRows[i - 1]!;
    const q = pourRows[i]!;
    if (p.matchId !== q.matchId) continue;
    for (const sq of labs.filter((s) => s.pourId === q.id)) {
      const sp = labs.find((s) => s.pourId === p.id && s.zone === sq.zone);
      if (!sp) continue;
      const before = dosesOf(p.id, sq.zone);
      const after = dosesOf(q.id, sq.zone);
      const doses: Record<string, number> = {};
      for (const k of new Set([...Object.keys(before), ...Object.keys(after)])) {
        const d = (after[k] ?? 0) - (before[k] ?? 0);
        if (Math.abs(d) > 1e-9) doses[k] = d;
      }
      if (Object.keys(doses).length) steps.push({ doses, moved: { l: sq.l - sp.l, a: sq.a - sp.a, b: sq.b - sp.b } });
    }
  }
  return steps;
}
