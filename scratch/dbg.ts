import { adviseZone, deltaE2000, fitColorantModel, type DoseObservation } from '../lib/color';
import { simTargets, SWATCHES, trueLab, COLORANTS } from '../tests/color/sim/shop';
const t = simTargets(24, 7)[0]!;
const key = (i: number) => `c${i}:drops`;
const toDoses = (v: number[]) => Object.fromEntries(v.flatMap((d, i) => (d > 0 ? [[key(i), d]] : [])));
const shop: DoseObservation[] = SWATCHES.map((d) => ({ doses: toDoses(d), lab: trueLab(d) }));
let recipe = t.firstGuess.map((g) => [...g]);
const pours: DoseObservation[][] = [[], []];
console.log('truth', t.zones.map((z) => z.doses.join(',')));
for (let n = 1; n <= 6; n++) {
  const labs = recipe.map((r) => trueLab(r));
  recipe.forEach((r, z) => { const o = { doses: toDoses(r), lab: labs[z]! }; shop.push(o); pours[z]!.push(o); });
  const model = fitColorantModel(shop)!;
  console.log(n, recipe.map((r, z) => `${r.join(',')} dE=${deltaE2000(trueLab(t.zones[z]!.doses), labs[z]!).toFixed(2)}`));
  recipe = recipe.map((r, z) => {
    const a = adviseZone({ model, target: trueLab(t.zones[z]!.doses), pours: pours[z]!, lines: r.flatMap((d, i) => (d > 0 ? [{ key: key(i), amount: d, step: 0.5 }] : [])), candidates: COLORANTS.flatMap((_, i) => (r[i]! > 0 ? [] : [{ key: key(i), step: 0.5, typical: 3 }])), tolerance: 2 });
    console.log('  ', z, JSON.stringify(a));
    if (a.status !== 'suggested') return r;
    const nx = [...r]; for (const c of a.changes) nx[Number(c.key.slice(1, c.key.indexOf(':')))] = c.to; return nx;
  });
}
