import 'server-only';
import { loadMatchHistory, targetFlakeCoverage } from '@/db/queries/colorHistory';
import { listColorants } from '@/db/queries/libraries';
import type { DB } from '@/db/open';
import { getPour, type PourView } from '@/db/queries/pours';
import type { DoseUnit } from '@/db/schema';
import { adviseFlake, adviseZone, MIN_OBSERVATIONS, type ColorantModel } from '@/lib/color';
import { ApiError } from '@/lib/http/api';
import { DOSE_STEP, doseKey, MODELLED_KINDS } from './doseModel';
import { shopModel } from './shopModel';
import type { PourSuggestion, ZoneSuggestion } from './suggestionTypes';

export type { PourSuggestion, ZoneSuggestion } from './suggestionTypes';

type PourZone = PourView['zones'][number];

const shortName = (name: string) => name.replace(/^[^,]*,\s*/, '');

// "Learnt from 9 logged colours of the shop (7 with reed green, 3 with brick red) and this
// match's 2 pours."
function learntFrom(model: ColorantModel, keys: string[], names: Map<string, string>, matchPours: number): string {
  const per = keys.map((k) => `${model.colorants[k]?.observations ?? 0} with ${shortName(names.get(k.split(':')[0]!) ?? 'a colorant')}`);
  const own = matchPours === 1 ? 'this pour' : `this match's ${matchPours} pours`;
  return `Learnt from ${model.observations} logged colours of the shop (${per.join(', ')}) and ${own}; the model fits the shop's colours to a median ${model.residual.toFixed(1)} ΔE00.`;
}

// For each zone of a pour outside the tolerance: the dose changes per cup that the shop's
// colorant model, corrected by this match's own pours, predicts bring the next pour nearest
// the target (lib/color/adviseZone.ts). Applying the changes to the pour's recipe (to: 0 takes
// a line out) gives a recipe the pour route accepts.
export async function suggestNextPour(database: DB, teamId: string, pourId: string, tolerance: number): Promise<PourSuggestion> {
  const pour = getPour(database, teamId, pourId);
  if (!pour) throw new ApiError(404, 'not_found', 'No such pour in your team');
  const view: PourView = pour;
  const { model, typical, flake } = await shopModel(database, teamId);
  const targetFlake = targetFlakeCoverage(database, teamId, pour.matchId);
  const history = loadMatchHistory(database, teamId, pour.matchId, pour.number);
  const library = listColorants(database, teamId);
  const names = new Map(library.map((c) => [c.id, c.name]));
  const modelled = (kind: string) => (MODELLED_KINDS as readonly string[]).includes(kind);
  const zones: ZoneSuggestion[] = pour.zones.map((z) => withFlake(colourAdvice(z), z));
  function colourAdvice(z: PourZone): ZoneSuggestion {
    const lines = new Map<string, { colorantId: string; colorant: string; unit: DoseUnit; amount: number }>();
    for (const l of view.recipe.filter((r) => r.zone === z.name && modelled(r.kind))) {
      const k = doseKey(l.colorantId, l.unit);
      const had = lines.get(k);
      lines.set(k, { colorantId: l.colorantId, colorant: l.colorant, unit: l.unit, amount: (had?.amount ?? 0) + l.amount });
    }
    const candidates = library
      .filter((c) => modelled(c.kind) && !lines.has(doseKey(c.id, c.unit)) && (model?.colorants[doseKey(c.id, c.unit)]?.observations ?? 0) >= MIN_OBSERVATIONS)
      .map((c) => ({ key: doseKey(c.id, c.unit), step: DOSE_STEP[c.unit], typical: typical[doseKey(c.id, c.unit)] ?? DOSE_STEP[c.unit] * 4 }));
    const pours = history.get(z.name) ?? [{ doses: {}, lab: z.lab }];
    const advice = adviseZone({
      model,
      target: z.target.lab,
      pours,
      lines: [...lines].map(([key, l]) => ({ key, amount: Number(l.amount.toFixed(6)), step: DOSE_STEP[l.unit] })),
      candidates,
      tolerance,
    });
    const base = { zone: z.name, dE00: z.dE00, changes: [], predicted: null, reason: null, learntFrom: null, toCalibrate: [] };
    if (advice.status === 'within_tolerance') return { ...base, status: 'within_tolerance' };
    if (advice.status === 'no_history') {
      const toCalibrate = advice.unknown.map((k) => ({ colorantId: k.split(':')[0]!, colorant: names.get(k.split(':')[0]!) ?? k }));
      const reason = toCalibrate.length ? `${advice.reason} Not yet characterised: ${toCalibrate.map((c) => c.colorant).join(', ')}.` : advice.reason;
      return { ...base, status: 'no_history', reason, toCalibrate };
    }
    const changes = advice.changes.map((c) => {
      const [colorantId, unit] = c.key.split(':') as [string, DoseUnit];
      return { colorantId, colorant: names.get(colorantId) ?? lines.get(c.key)?.colorant ?? colorantId, unit, from: c.from, to: c.to };
    });
    const keys = [...new Set([...lines.keys(), ...advice.changes.map((c) => c.key)])];
    return {
      ...base,
      status: 'suggested',
      changes,
      predicted: { lab: advice.predicted.lab, dE00: advice.predicted.dE00 },
      reason: advice.note,
      learntFrom: learntFrom(model!, keys, names, pours.length),
    };
  }
  // Flake is dosed by coverage, apart from the colour (lib/color/adviseFlake.ts).
  function withFlake(advice: ZoneSuggestion, z: PourZone): ZoneSuggestion {
    const lines = view.recipe.filter((r) => r.zone === z.name && r.kind === 'flake');
    const target = targetFlake.get(z.name);
    const now = (z.flake as { coverage?: number } | null)?.coverage;
    if (lines.length !== 1 || target === undefined || typeof now !== 'number') return advice;
    const l = lines[0]!;
    const key = doseKey(l.colorantId, l.unit);
    const f = adviseFlake({ key, amount: l.amount, step: DOSE_STEP[l.unit] }, now, target, flake[key]?.k ?? null);
    // Never empty a zone: flake alone in a zone is not taken out.
    if (!f || (f.to === 0 && view.recipe.filter((r) => r.zone === z.name).length === 1)) return advice;
    const change = { colorantId: l.colorantId, colorant: l.colorant, unit: l.unit, from: f.from, to: f.to };
    return {
      ...advice,
      status: 'suggested',
      changes: advice.status === 'suggested' ? [...advice.changes, change] : [change],
      predicted: advice.predicted ?? { lab: z.lab, dE00: z.dE00 },
      reason: [advice.reason, f.note].filter(Boolean).join(' '),
    };
  }
  return { pourId, number: pour.number, zones };
}
