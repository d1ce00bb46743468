import 'server-only';
import type { DoseUnit } from '@/db/schema';
import { ML_PER_CUP, moldYield, planRun, scaleRecipe, splitZoneCups, type ScaledLine, type VolumeUnit } from '@/lib/recipes';
import { BATCH_SHEET_CAUTIONS, temperatureNote } from './safetyCautions';

export type SheetRecipeLine = { zone: string; colorantId: string; colorant: string; kind: string; amount: number; unit: DoseUnit };
export type SheetMold = { id: string; name: string; cavities: number; mlPerCavity: number; thickness: string };
/** `uncertainty`: the standard zone's own ± (ΔE00, about 95 %), when it was measured with one. */
export type SheetZone = { name: string; lab: { l: number; a: number; b: number } | null; hex: string | null; uncertainty?: number | null };

export type BatchSheetInput = {
  cups: number;
  dropsPerMl: number;
  sprueAllowanceMl: number;
  /** The standard's zones in the match's order: the first is the top layer (the back). */
  zones: SheetZone[];
  recipe: SheetRecipeLine[];
  molds: SheetMold[];
  selectedMoldId: string | null;
  tempF: number | null;
  /** Cups of each zone's colour; null or absent: the batch split evenly between the zones. */
  zoneCups?: { zone: string; cups: number }[] | null;
  /** The run plan the batch was poured to: molds with their shots. */
  plan?: (SheetMold & { shots: number })[] | null;
  volumeUnit?: VolumeUnit;
};

export type SheetLine = ScaledLine & { colorant: string; kind: string };

// The arithmetic of a printable batch sheet: the standard's per-cup recipe
// scaled to the batch (scaleRecipe: drops through the team's drops per mL,
// teaspoons by the exact 1/48 cup), the yield of each mold (moldYield: batch
// volume ÷ (mL per cavity × cavities + the team's sprue allowance)), the
// laminate layout in zone order, the temperature and the cautions. Each zone
// of a laminate is mixed in its own cup: its doses are scaled to that zone's
// own cups (the batch split evenly unless the batch recorded the split).
export function buildBatchSheet(input: BatchSheetInput) {
  const names = input.zones.map((z) => z.name);
  const split = names.length ? splitZoneCups(input.cups, names, input.zoneCups) : [];
  const cupsOf = (zone: string) => split.find((z) => z.zone === zone)?.cups ?? input.cups / Math.max(1, names.length);
  const recipe: SheetLine[] = input.recipe.map((l) => {
    const [scaled] = scaleRecipe([{ zone: l.zone, colorantId: l.colorantId, name: l.colorant, amount: l.amount, unit: l.unit }], cupsOf(l.zone), input.dropsPerMl);
    return { ...scaled!, colorant: l.colorant, kind: l.kind };
  });
  const layout = input.zones.map((z, position) => ({
    zone: z.name,
    position,
    lab: z.lab,
    uncertainty: z.uncertainty ?? null,
    hex: z.hex,
    cups: cupsOf(z.name),
    ml: cupsOf(z.name) * ML_PER_CUP,
    recipe: recipe.filter((l) => l.zone === z.name),
  }));
  const plan = input.plan?.length
    ? planRun({
      direction: 'baits', molds: input.plan, sprueAllowanceMl: input.sprueAllowanceMl, dropsPerMl: input.dropsPerMl,
      zones: [], recipe: [],
    })
    : null;
  const molds = input.molds.map((m) => {
    const y = m.cavities >= 1 && m.mlPerCavity > 0 ? moldYield(input.cups, m, input.sprueAllowanceMl) : null;
    return {
      id: m.id,
      name: m.name,
      cavities: m.cavities,
      mlPerCavity: m.mlPerCavity,
      thickness: m.thickness,
      mlPerShot: y?.mlPerShot ?? null,
      shots: y?.shots ?? null,
      baits: y?.baits ?? null,
      leftoverMl: y?.leftoverMl ?? null,
      selected: m.id === input.selectedMoldId,
    };
  });
  return {
    cups: input.cups,
    volumeUnit: input.volumeUnit ?? 'cups',
    batchMl: input.cups * ML_PER_CUP,
    plan: plan && { molds: plan.molds, shots: plan.shots, baits: plan.baits, neededMl: plan.neededMl, sprueMl: plan.sprueMl, leftoverMl: Math.max(0, input.cups * ML_PER_CUP - plan.neededMl), shortMl: Math.max(0, plan.neededMl - input.cups * ML_PER_CUP) },
    dropsPerMl: input.dropsPerMl,
    sprueAllowanceMl: input.sprueAllowanceMl,
    tempF: input.tempF,
    tempC: input.tempF === null ? null : ((input.tempF - 32) * 5) / 9,
    tempNote: temperatureNote(input.tempF),
    laminate: layout.length > 1,
    order: layout.map((l) => l.zone).join(' over '),
    layout,
    recipe,
    molds,
    cautions: [...BATCH_SHEET_CAUTIONS],
  };
}

export type BatchSheet = ReturnType<typeof buildBatchSheet>;
