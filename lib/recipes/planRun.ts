import { ML_PER_CUP } from './units';
import { scaleRecipe, type RecipeLineInput, type ScaledLine } from './scaleRecipe';

export type PlanMoldInput = { id: string; name: string; cavities: number; mlPerCavity: number; shots?: number };
export type PlanZoneInput = { zone: string; weight: number };

export type RunPlanInput = {
  /** 'baits': the shots of each mold are given, the plastisol is worked out; 'cups': the plastisol is given, the shots are worked out. */
  direction: 'baits' | 'cups';
  /** The plastisol on hand, in cups (direction 'cups'). */
  cups?: number;
  molds: PlanMoldInput[];
  sprueAllowanceMl: number;
  /** The zones of the colour and their share of every shot (weights, e.g. 4 and 2); even when all equal. */
  zones: PlanZoneInput[];
  /** Per-cup recipe lines; each line's zone is one of `zones`. */
  recipe: RecipeLineInput[];
  dropsPerMl: number;
  /** Direction 'baits': each zone's cup is mixed in whole steps of this many cups (e.g. 0.25), rounded up. */
  stepCups?: number;
};

export type PlannedMold = PlanMoldInput & { shots: number; mlPerShot: number; baits: number; ml: number; sprueMl: number };
export type PlannedZone = { zone: string; share: number; cups: number; ml: number; neededMl: number; recipe: ScaledLine[] };

const EPS = 1e-9;

// A run plan: several molds, each filled some number of shots. Every shot of
// a mold takes mL per cavity × cavities + the shop's sprue allowance, and
// yields one bait per cavity (yield = volume ÷ (per cavity × cavities +
// sprue), PRODUCT.md "Recipe arithmetic"). A laminate's zones each take their
// share of every shot, mixed in their own cups.
// Direction 'baits': the shots are given; the plastisol needed is their sum.
// Direction 'cups': the plastisol is given; the molds are filled in turn, one
// shot of each while the next shot still fits (a pourer rotates molds while
// the last one sets: common practice), and what no shot can use is left over.
export function planRun(input: RunPlanInput) {
  if (input.molds.length === 0) throw new RangeError('pick at least one mold');
  if (!(input.sprueAllowanceMl >= 0)) throw new RangeError('sprue allowance cannot be negative');
  for (const m of input.molds) {
    if (!(m.cavities >= 1) || !(m.mlPerCavity > 0)) throw new RangeError(`${m.name}: a mold needs at least one cavity and a volume per cavity`);
  }
  const weights = input.zones.length ? input.zones : [{ zone: '', weight: 1 }];
  const weightSum = weights.reduce((s, z) => s + z.weight, 0);
  if (weights.some((z) => !(z.weight > 0)) || !(weightSum > 0)) throw new RangeError('each zone needs a share above 0');
  const perShot = input.molds.map((m) => m.mlPerCavity * m.cavities + input.sprueAllowanceMl);

  let shots: number[];
  if (input.direction === 'baits') {
    shots = input.molds.map((m) => {
      const n = m.shots ?? 0;
      if (!(Number.isInteger(n) && n >= 0)) throw new RangeError(`${m.name}: shots must be a whole number, 0 or more`);
      return n;
    });
    if (shots.every((n) => n === 0)) throw new RangeError('give at least one shot');
  } else {
    const cups = input.cups ?? 0;
    if (!(cups > 0)) throw new RangeError('plastisol on hand must be more than 0 cups');
    shots = fillInTurns(cups * ML_PER_CUP, perShot);
  }

  const molds: PlannedMold[] = input.molds.map((m, i) => ({
    ...m,
    shots: shots[i]!,
    mlPerShot: perShot[i]!,
    baits: shots[i]! * m.cavities,
    ml: shots[i]! * perShot[i]!,
    sprueMl: shots[i]! * input.sprueAllowanceMl,
  }));
  const neededMl = molds.reduce((s, m) => s + m.ml, 0);
  const zoneCups = weights.map((z) => {
    const share = z.weight / weightSum;
    const neededZoneMl = neededMl * share;
    let cups: number;
    if (input.direction === 'cups') cups = input.cups! * share;
    else if (input.stepCups && input.stepCups > 0) cups = Math.ceil(neededZoneMl / ML_PER_CUP / input.stepCups - EPS) * input.stepCups;
    else cups = neededZoneMl / ML_PER_CUP;
    return { zone: z.zone, share, cups, neededMl: neededZoneMl };
  });
  const zones: PlannedZone[] = zoneCups.map((z) => ({
    ...z,
    ml: z.cups * ML_PER_CUP,
    recipe: z.cups > 0 ? scaleRecipe(input.recipe.filter((l) => l.zone === z.zone || input.zones.length === 0), z.cups, input.dropsPerMl) : [],
  }));
  const mixedCups = zones.reduce((s, z) => s + z.cups, 0);
  const mixedMl = mixedCups * ML_PER_CUP;
  return {
    direction: input.direction,
    molds,
    shots: molds.reduce((s, m) => s + m.shots, 0),
    baits: molds.reduce((s, m) => s + m.baits, 0),
    neededMl,
    neededCups: neededMl / ML_PER_CUP,
    sprueMl: molds.reduce((s, m) => s + m.sprueMl, 0),
    mixedCups,
    mixedMl,
    leftoverMl: Math.max(0, mixedMl - neededMl),
    zones,
  };
}

export type RunPlan = ReturnType<typeof planRun>;

// One shot of each mold in turn while the next still fits; a mold whose shot
// no longer fits is passed over so a smaller one can use what is left.
function fillInTurns(totalMl: number, perShot: number[]): number[] {
  const shots = perShot.map(() => 0);
  const round = perShot.reduce((s, v) => s + v, 0);
  const rounds = Math.floor(totalMl / round + EPS);
  let left = totalMl - rounds * round;
  for (let i = 0; i < shots.length; i++) shots[i] = rounds;
  for (let progress = true; progress; ) {
    progress = false;
    perShot.forEach((ml, i) => {
      if (left + EPS >= ml) {
        shots[i]! += 1;
        left -= ml;
        progress = true;
      }
    });
  }
  return shots;
}
