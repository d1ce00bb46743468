import 'server-only';
import type { DB } from '@/db/open';
import type { DoseUnit } from '@/db/schema';
import { redoseForThickness } from '@/lib/color';
import { DOSE_STEP, MODELLED_KINDS } from './doseModel';
import { shopModel } from './shopModel';

type Thickness = 'thin' | 'standard' | 'thick';
type Line = { zone: string; colorantId: string; colorant: string; kind: string; amount: number; unit: DoseUnit };

/** A class's factor is used once this many logged colours were poured in it. */
const MIN_CLASS_COLOURS = 2;

// A standard's recipe re-dosed for a mold of another thickness class, from the shop's model
// (fitColorantModel's thickness factors): a prediction, and said to be one. Colorants the model
// does not dose (flake, additives) stay as they are.
export async function thicknessRedose(database: DB, teamId: string, recipe: Line[], from: Thickness, to: Thickness) {
  if (from === to) return null;
  const t = (await shopModel(database, teamId)).model?.thickness;
  const known = (c: Thickness) => c === 'standard' || (t?.[c].observations ?? 0) >= MIN_CLASS_COLOURS;
  if (!t || !known(from) || !known(to)) {
    const missing = [from, to].filter((c) => !known(c)).join(' and ');
    return { from, to, factor: null, lines: [], note: `The standard was poured in a ${from} mold and this batch is for a ${to} one. The shop has not logged enough pours in ${missing} molds to predict the change; pour a test first.` };
  }
  const factor = t[from].factor / t[to].factor;
  const lines = recipe.map((l) => {
    const redosed = (MODELLED_KINDS as readonly string[]).includes(l.kind) ? redoseForThickness(l.amount, DOSE_STEP[l.unit], t[from].factor, t[to].factor) : l.amount;
    return { zone: l.zone, colorantId: l.colorantId, colorant: l.colorant, unit: l.unit, amount: l.amount, redosed };
  });
  return {
    from,
    to,
    factor,
    lines,
    note: `A prediction: the standard was poured in a ${from} mold; for this ${to} mold the shop's pours suggest ${factor.toFixed(2)} × the colour doses per cup (${t[from].observations + t[to].observations} logged colours in these classes). Pour a test bait before the run.`,
  };
}
