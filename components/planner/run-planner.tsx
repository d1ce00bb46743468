'use client';

import { useState } from 'react';
import { HeatCaution } from '@/components/safety/heat-caution';
import { Field, inputClass } from '@/components/ui/field';
import { ML_PER_CUP, planRun, toCups, VOLUME_LABEL, type RunPlan, type VolumeUnit } from '@/lib/recipes';
import { PlanResult, type Shelf } from './plan-result';
import type { PlannerMold, PlannerSettings, PlannerStandard } from './types';

type Row = { on: boolean; shots: string };

// Each side's cup is mixed in whole steps: a quarter cup, or 10 mL for a shop
// that measures in millilitres (common practice at the bench).
const stepFor = (unit: VolumeUnit) => (unit === 'ml' ? 10 / ML_PER_CUP : 0.25);

// The run planner: pick a standard and the molds on the bench, then either
// "I want these baits" (shots of each mold → plastisol per side) or "I have
// this much plastisol" (→ shots of each mold in turn, baits, leftover).
export function RunPlanner({ standards, molds, settings, shelf, initialMatchId }: {
  standards: PlannerStandard[]; molds: PlannerMold[]; settings: PlannerSettings; shelf: Pick<Shelf, 'colorants' | 'baseId'>; initialMatchId?: string | null;
}) {
  const unit = settings.volumeUnit;
  const first = standards.find((s) => s.matchId === initialMatchId) ?? standards[0];
  const [matchId, setMatchId] = useState(first?.matchId ?? '');
  const [direction, setDirection] = useState<'baits' | 'cups'>('baits');
  const [have, setHave] = useState('');
  const [shares, setShares] = useState<Record<string, string>>({});
  const [rows, setRows] = useState<Record<string, Row>>(() => (first?.moldId ? { [first.moldId]: { on: true, shots: '' } } : {}));
  const std = standards.find((s) => s.matchId === matchId);
  if (!std) return <p className="rounded-lg border border-panel-line bg-white p-4 text-ink-soft">No standards yet: a run is planned for an approved colour. When a lead approves a pour, plan its runs here.</p>;

  const zones = std.zones.map((z) => z.name);
  const row = (id: string): Row => rows[id] ?? { on: false, shots: '' };
  const setRow = (id: string, patch: Partial<Row>) => setRows({ ...rows, [id]: { ...row(id), ...patch } });
  const picked = molds.filter((m) => row(m.id).on);

  let plan: RunPlan | null = null;
  let problem: string | null = null;
  try {
    if (picked.length === 0) throw new RangeError('Tick the molds on the bench for this run.');
    plan = planRun({
      direction,
      cups: direction === 'cups' ? toCups(Number(have), unit) : undefined,
      molds: picked.map((m) => ({ ...m, shots: Number(row(m.id).shots || 0) })),
      sprueAllowanceMl: settings.sprueAllowanceMl,
      dropsPerMl: settings.dropsPerMl,
      zones: zones.map((z) => ({ zone: z, weight: Number(shares[z] || 1) })),
      recipe: std.recipe.map((l) => ({ ...l, name: l.colorant })),
      stepCups: stepFor(unit),
    });
  } catch (e) {
    problem = e instanceof RangeError ? e.message : 'These figures do not make a plan.';
    if (direction === 'cups' && !(Number(have) > 0)) problem = `Give the plastisol on hand, in ${VOLUME_LABEL[unit]}.`;
  }

  return (
    <div className="space-y-4">
      <section aria-labelledby="plan-in" className="space-y-3 rounded-lg border border-panel-line bg-white p-4">
        <h2 id="plan-in" className="text-lg font-semibold">The run</h2>
        <Field label="Standard">
          <select value={matchId} onChange={(e) => setMatchId(e.target.value)} className={inputClass}>
            {standards.map((s) => <option key={s.matchId} value={s.matchId}>{s.name}</option>)}
          </select>
        </Field>
        <fieldset>
          <legend className="mb-1 text-sm font-medium">Plan from</legend>
          <div className="grid grid-cols-2 gap-2">
            {([['baits', 'I want these baits'], ['cups', 'I have plastisol']] as const).map(([v, label]) => (
              <label key={v} className={`flex min-h-tap items-center gap-2 rounded-md border px-3 ${direction === v ? 'border-ink bg-panel' : 'border-panel-line'}`}>
                <input type="radio" name="direction" value={v} checked={direction === v} onChange={() => setDirection(v)} className="h-5 w-5" />{label}
              </label>
            ))}
          </div>
        </fieldset>
        {direction === 'cups' ? (
          <Field label={`Plastisol on hand (${VOLUME_LABEL[unit]})`}>
            <input type="number" inputMode="decimal" min="0" step="any" value={have} onChange={(e) => setHave(e.target.value)} className={inputClass} />
          </Field>
        ) : null}
        <fieldset>
          <legend className="mb-1 text-sm font-medium">Molds on the bench{direction === 'baits' ? ' and shots of each' : ' (filled in turn, one shot of each)'}</legend>
          <ul className="space-y-2">
            {molds.map((m) => (
              <li key={m.id} className="grid grid-cols-[minmax(0,1fr)_5.5rem] items-center gap-2 rounded-md border border-panel-line p-2">
                <label className="flex min-h-tap items-center gap-3">
                  <input type="checkbox" checked={row(m.id).on} onChange={(e) => setRow(m.id, { on: e.target.checked })} className="h-5 w-5 shrink-0" />
                  <span className="min-w-0">{m.name}<span className="num block text-xs text-ink-soft">{m.cavities} × {m.mlPerCavity} mL{settings.sprueAllowanceMl ? ` + ${settings.sprueAllowanceMl} mL sprue` : ''} a shot</span></span>
                </label>
                {direction === 'baits' && row(m.id).on ? (
                  <label className="block text-center text-xs text-ink-soft">
                    <input
                      type="number" inputMode="numeric" min="0" step="1" aria-label={`Shots of ${m.name}`}
                      value={row(m.id).shots} onChange={(e) => setRow(m.id, { shots: e.target.value })} className={`${inputClass} text-center`}
                    />
                    shots{Number(row(m.id).shots) > 0 ? ` → ${Number(row(m.id).shots) * m.cavities} baits` : ''}
                  </label>
                ) : null}
              </li>
            ))}
          </ul>
        </fieldset>
        {zones.length > 1 ? (
          <fieldset>
            <legend className="mb-1 text-sm font-medium">Share of each shot (parts)</legend>
            <p className="mb-1 text-sm text-ink-soft">Even unless you say otherwise: 2 and 1 puts two thirds of every bait in the first colour.</p>
            <div className="grid grid-cols-2 gap-2">
              {zones.map((z) => (
                <Field key={z} label={z}>
                  <input type="number" inputMode="decimal" min="0" step="any" placeholder="1" value={shares[z] ?? ''} onChange={(e) => setShares({ ...shares, [z]: e.target.value })} className={inputClass} />
                </Field>
              ))}
            </div>
          </fieldset>
        ) : null}
      </section>
      {plan ? <PlanResult plan={plan} std={std} unit={unit} laminate={zones.length > 1} shelf={{ ...shelf, currency: settings.currency, dropsPerMl: settings.dropsPerMl, sprueAllowanceMl: settings.sprueAllowanceMl }} /> : <p role="status" className="rounded-lg border border-panel-line bg-white p-4">{problem}</p>}
      <HeatCaution compact />
    </div>
  );
}
