'use client';

import { useState } from 'react';
import useSWR from 'swr';
import { HeatCaution } from '@/components/safety/heat-caution';
import { AmountEcho } from '@/components/ui/amount-echo';
import { Button } from '@/components/ui/button';
import { Field, inputClass } from '@/components/ui/field';
import { DOSE_UNITS, type DoseUnit } from '@/lib/enums';
import { formatDose, formatMl, trimmed } from '@/lib/format';
import { swrFetcher } from '@/lib/http/client';
import { ML_PER_CUP, moldYield, parseAmount, scaleRecipe, toCups, VOLUME_LABEL, VOLUME_UNITS, type VolumeUnit } from '@/lib/recipes';

type Row = { name: string; amount: string; unit: DoseUnit; side: string };
type Mold = { id: string; name: string; cavities: number; mlPerCavity: number };
const SIDES = ['back', 'belly'];
const sideLabel = (side: string) => (side === 'one' ? 'Batch size' : `${side[0]!.toUpperCase()}${side.slice(1)} cup`);

// Scales a per-cup recipe to a batch in cups, fluid ounces, gallons or
// millilitres (the shop's batch size unit first), and says how many baits the
// batch fills in a mold. A laminate mixes each side in its own cup, so each
// side's doses scale to that side's own size. Every amount is read by the one
// dose parser: "1/2" is a half, never 12.
export function RecipeScaler({ dropsPerMl, sprueAllowanceMl, volumeUnit = 'cups' }: { dropsPerMl: number; sprueAllowanceMl: number; volumeUnit?: VolumeUnit }) {
  const { data: molds } = useSWR<Mold[]>('/api/molds', swrFetcher);
  const [laminate, setLaminate] = useState(false);
  const [sizes, setSizes] = useState<Record<string, string>>({ one: '2', back: '1', belly: '1' });
  const [unit, setUnit] = useState<VolumeUnit>(volumeUnit);
  const [moldId, setMoldId] = useState('');
  const [rows, setRows] = useState<Row[]>([{ name: 'Pigment', amount: '6', unit: 'drops', side: 'back' }, { name: 'Flake', amount: '1/4', unit: 'tsp', side: 'back' }]);
  const sides = laminate ? SIDES : ['one'];
  const sizeOf = (side: string) => parseAmount(sizes[side] ?? '');
  const cupsOf = (side: string) => {
    const p = sizeOf(side);
    return p.ok ? toCups(p.value, unit) : Number.NaN;
  };
  const parsedRows = rows.map((r) => (r.amount.trim() ? parseAmount(r.amount) : null));
  const badRow = parsedRows.findIndex((p) => p !== null && !p.ok);
  const rowError = badRow >= 0 ? `Dose ${badRow + 1}: ${(parsedRows[badRow] as { message: string }).message}` : null;
  const badSide = sides.find((s) => !(cupsOf(s) > 0 && Number.isFinite(cupsOf(s))));
  const valid = !badSide && !rowError;
  const totalCups = sides.reduce((s, side) => s + cupsOf(side), 0);
  const scaled = valid
    ? sides.map((side) => ({
        side,
        lines: scaleRecipe(
          rows.flatMap((r, i) => {
            const p = parsedRows[i];
            return p?.ok && p.value > 0 && (!laminate || r.side === side) ? [{ zone: side, colorantId: r.name, name: r.name, amount: p.value, unit: r.unit }] : [];
          }),
          cupsOf(side),
          dropsPerMl,
        ),
      }))
    : [];
  const mold = molds?.find((m) => m.id === moldId);
  const yieldOf = valid && mold ? moldYield(totalCups, mold, sprueAllowanceMl) : null;
  const set = (i: number, patch: Partial<Row>) => setRows(rows.map((r, j) => (j === i ? { ...r, ...patch } : r)));
  const sizeProblem = (side: string) => {
    const p = sizeOf(side);
    return p.ok ? `Give ${laminate ? `the ${side} cup` : 'a batch'} a size above 0.` : `${sideLabel(side)}: ${p.message}.`;
  };
  return (
    <section aria-labelledby="scale-h" className="space-y-3 rounded-lg border border-panel-line bg-white p-4">
      <h2 id="scale-h" className="text-lg font-semibold">Scale a recipe</h2>
      <label className="flex min-h-tap items-center gap-3 text-sm">
        <input type="checkbox" checked={laminate} onChange={(e) => setLaminate(e.target.checked)} className="h-5 w-5" />
        Laminate: back and belly, each mixed in its own cup
      </label>
      <div className="grid gap-3 sm:grid-cols-3">
        {sides.map((side) => (
          <Field key={side} label={sideLabel(side)} hint={<AmountEcho id={`scale-size-${side}-echo`} value={sizes[side] ?? ''} label={VOLUME_LABEL[unit]} />}>
            <input type="text" inputMode="decimal" autoComplete="off" value={sizes[side]} onChange={(e) => setSizes({ ...sizes, [side]: e.target.value })} className={inputClass} />
          </Field>
        ))}
        <Field label="Unit">
          <select value={unit} onChange={(e) => setUnit(e.target.value as VolumeUnit)} className={inputClass}>{VOLUME_UNITS.map((u) => <option key={u} value={u}>{VOLUME_LABEL[u]}</option>)}</select>
        </Field>
        <Field label="Mold">
          <select value={moldId} onChange={(e) => setMoldId(e.target.value)} className={inputClass}>
            <option value="">—</option>
            {(molds ?? []).map((m) => <option key={m.id} value={m.id}>{m.name}</option>)}
          </select>
        </Field>
      </div>
      <fieldset>
        <legend className="mb-1 text-sm font-medium">Doses per cup of plastisol</legend>
        <ul className="grid gap-2">
          {rows.map((r, i) => (
            <li key={i} className={`grid grid-cols-2 items-end gap-2 rounded-md border border-panel-line bg-panel p-2 ${laminate ? 'sm:grid-cols-[1fr_7rem_6rem_6rem_auto]' : 'sm:grid-cols-[1fr_7rem_6rem_auto]'}`}>
              <label className="col-span-2 sm:col-span-1"><span className="mb-0.5 block text-xs font-medium text-ink-soft">Colorant</span>
                <input aria-label={`Dose ${i + 1} name`} value={r.name} onChange={(e) => set(i, { name: e.target.value })} className={inputClass} /></label>
              <label><span className="mb-0.5 block text-xs font-medium text-ink-soft">Amount per cup</span>
                <input aria-label={`Dose ${i + 1} amount`} aria-describedby={`scale-dose-${i}-echo`} type="text" inputMode="decimal" autoComplete="off" placeholder="e.g. 1/2" value={r.amount} onChange={(e) => set(i, { amount: e.target.value })} className={inputClass} /></label>
              <label><span className="mb-0.5 block text-xs font-medium text-ink-soft">Unit</span>
                <select aria-label={`Dose ${i + 1} unit`} value={r.unit} onChange={(e) => set(i, { unit: e.target.value as DoseUnit })} className={inputClass}>{DOSE_UNITS.map((u) => <option key={u}>{u}</option>)}</select></label>
              {laminate ? (
                <label><span className="mb-0.5 block text-xs font-medium text-ink-soft">Side</span>
                  <select aria-label={`Dose ${i + 1} side`} value={r.side} onChange={(e) => set(i, { side: e.target.value })} className={inputClass}>{SIDES.map((s) => <option key={s}>{s}</option>)}</select></label>
              ) : null}
              <Button type="button" variant="secondary" className="col-span-2 sm:col-span-1" onClick={() => setRows(rows.filter((_, j) => j !== i))} aria-label={`Remove dose ${i + 1}`}>Remove</Button>
              <div className="col-span-full"><AmountEcho id={`scale-dose-${i}-echo`} value={r.amount} unit={r.unit} /></div>
            </li>
          ))}
        </ul>
        <Button type="button" variant="secondary" className="mt-2" onClick={() => setRows([...rows, { name: '', amount: '', unit: 'drops', side: 'back' }])}>Add a dose</Button>
      </fieldset>
      {valid ? (
        scaled.map(({ side, lines }) => (
          <table key={side} className="w-full text-left text-sm" aria-label={side === 'one' ? 'Scaled recipe' : `Scaled recipe, ${side}`}>
            <thead><tr className="text-ink-soft"><th className="py-1 capitalize">{side === 'one' ? 'Colorant' : side}</th><th className="text-right">Per cup</th><th className="text-right">For {trimmed(fromSize(sizeOf(side)), 3)} {VOLUME_LABEL[unit]}</th><th className="text-right">≈ mL</th></tr></thead>
            <tbody>
              {lines.map((l, i) => (
                <tr key={i} className="border-t border-panel-line">
                  <td className="py-1">{l.name}</td>
                  <td className="text-right">{formatDose(l.perCup, l.unit)}</td>
                  <td className="text-right font-semibold">{formatDose(l.total, l.unit)}</td>
                  <td className="text-right">{l.approxMl === null ? '—' : trimmed(l.approxMl, 2)}</td>
                </tr>
              ))}
              {lines.length === 0 ? <tr><td colSpan={4} className="py-1 text-ink-soft">No doses for this side: plain plastisol.</td></tr> : null}
            </tbody>
          </table>
        ))
      ) : (
        <p role="alert" className="text-sm text-band-off">{rowError ?? sizeProblem(badSide!)}</p>
      )}
      <p className="num text-sm text-ink-soft">
        {valid ? `${trimmed(totalCups, 3)} cups = ${formatMl(totalCups * ML_PER_CUP)} (1 cup = ${ML_PER_CUP.toFixed(7)} mL; drops at ${dropsPerMl} per mL, the shop's dropper setting).` : ''}
        {yieldOf ? ` ${mold!.name}: ${yieldOf.shots} shots of ${formatMl(yieldOf.mlPerShot)} → ${yieldOf.baits} baits, ${formatMl(yieldOf.leftoverMl)} left over.` : ''}
      </p>
      <HeatCaution compact />
    </section>
  );
}

function fromSize(p: ReturnType<typeof parseAmount>): number {
  return p.ok ? p.value : 0;
}
