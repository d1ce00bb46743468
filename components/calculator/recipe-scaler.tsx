'use client';

import { useState } from 'react';
import useSWR from 'swr';
import { HeatCaution } from '@/components/safety/heat-caution';
import { Button } from '@/components/ui/button';
import { Field, inputClass } from '@/components/ui/field';
import { DOSE_UNITS, type DoseUnit } from '@/db/schema';
import { swrFetcher } from '@/lib/http/client';
import { formatDose, formatMl, trimmed } from '@/lib/format';
import { ML_PER_CUP, moldYield, parseAmount, scaleRecipe, toCups, VOLUME_LABEL, VOLUME_UNITS, type VolumeUnit } from '@/lib/recipes';
import { AmountEcho } from '@/components/ui/amount-echo';

type Row = { name: string; amount: string; unit: DoseUnit };
type Mold = { id: string; name: string; cavities: number; mlPerCavity: number };

// Scales a per-cup recipe to a batch in cups, fluid ounces, gallons or
// millilitres, and says how many baits the batch fills in a mold.
export function RecipeScaler({ dropsPerMl, sprueAllowanceMl }: { dropsPerMl: number; sprueAllowanceMl: number }) {
  const { data: molds } = useSWR<Mold[]>('/api/molds', swrFetcher);
  const [size, setSize] = useState('2');
  const [unit, setUnit] = useState<VolumeUnit>('cups');
  const [moldId, setMoldId] = useState('');
  const [rows, setRows] = useState<Row[]>([{ name: 'Pigment', amount: '6', unit: 'drops' }, { name: 'Flake', amount: '0.25', unit: 'tsp' }]);
  // Every amount goes through the one dose parser: "1/2" is a half, never 12.
  const sizeParsed = parseAmount(size);
  const cups = sizeParsed.ok ? toCups(sizeParsed.value, unit) : Number.NaN;
  const parsedRows = rows.map((r) => (r.amount.trim() ? parseAmount(r.amount) : null));
  const badRow = parsedRows.findIndex((p) => p !== null && !p.ok);
  const rowError = badRow >= 0 ? `Dose ${badRow + 1}: ${(parsedRows[badRow] as { message: string }).message}` : null;
  const valid = cups > 0 && Number.isFinite(cups) && !rowError;
  const lines = valid
    ? scaleRecipe(
        rows.flatMap((r, i) => {
          const p = parsedRows[i];
          return p?.ok && p.value > 0 ? [{ zone: '', colorantId: r.name, name: r.name, amount: p.value, unit: r.unit }] : [];
        }),
        cups,
        dropsPerMl,
      )
    : [];
  const mold = molds?.find((m) => m.id === moldId);
  const yieldOf = valid && mold ? moldYield(cups, mold, sprueAllowanceMl) : null;
  const set = (i: number, patch: Partial<Row>) => setRows(rows.map((r, j) => (j === i ? { ...r, ...patch } : r)));
  return (
    <section aria-labelledby="scale-h" className="space-y-3 rounded-lg border border-panel-line bg-white p-4">
      <h2 id="scale-h" className="text-lg font-semibold">Scale a recipe</h2>
      <div className="grid gap-3 sm:grid-cols-3">
        <Field label="Batch size" hint={<AmountEcho id="scale-size-echo" value={size} label={VOLUME_LABEL[unit]} />}><input type="text" inputMode="decimal" autoComplete="off" value={size} onChange={(e) => setSize(e.target.value)} className={inputClass} /></Field>
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
            <li key={i} className="grid grid-cols-2 items-end gap-2 rounded-md border border-panel-line bg-panel p-2 sm:grid-cols-[1fr_7rem_6rem_auto]">
              <label className="col-span-2 sm:col-span-1"><span className="mb-0.5 block text-xs font-medium text-ink-soft">Colorant</span>
                <input aria-label={`Dose ${i + 1} name`} value={r.name} onChange={(e) => set(i, { name: e.target.value })} className={inputClass} /></label>
              <label><span className="mb-0.5 block text-xs font-medium text-ink-soft">Amount per cup</span>
                <input aria-label={`Dose ${i + 1} amount`} aria-describedby={`scale-dose-${i}-echo`} type="text" inputMode="decimal" autoComplete="off" placeholder="e.g. 1/2" value={r.amount} onChange={(e) => set(i, { amount: e.target.value })} className={inputClass} /></label>
              <label><span className="mb-0.5 block text-xs font-medium text-ink-soft">Unit</span>
                <select aria-label={`Dose ${i + 1} unit`} value={r.unit} onChange={(e) => set(i, { unit: e.target.value as DoseUnit })} className={inputClass}>{DOSE_UNITS.map((u) => <option key={u}>{u}</option>)}</select></label>
              <Button type="button" variant="secondary" className="col-span-2 sm:col-span-1" onClick={() => setRows(rows.filter((_, j) => j !== i))} aria-label={`Remove dose ${i + 1}`}>Remove</Button>
              <div className="col-span-full"><AmountEcho id={`scale-dose-${i}-echo`} value={r.amount} unit={r.unit} /></div>
            </li>
          ))}
        </ul>
        <Button type="button" variant="secondary" className="mt-2" onClick={() => setRows([...rows, { name: '', amount: '', unit: 'drops' }])}>Add a dose</Button>
      </fieldset>
      {valid ? (
        <table className="w-full text-left text-sm" aria-label="Scaled recipe">
          <thead><tr className="text-ink-soft"><th className="py-1">Colorant</th><th className="text-right">Per cup</th><th className="text-right">For {sizeParsed.ok ? trimmed(sizeParsed.value, 3) : size} {VOLUME_LABEL[unit]}</th><th className="text-right">≈ mL</th></tr></thead>
          <tbody>
            {lines.map((l, i) => (
              <tr key={i} className="border-t border-panel-line">
                <td className="py-1">{l.name}</td>
                <td className="text-right">{formatDose(l.perCup, l.unit)}</td>
                <td className="text-right font-semibold">{formatDose(l.total, l.unit)}</td>
                <td className="text-right">{l.approxMl === null ? '—' : trimmed(l.approxMl, 2)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : (
        <p role="alert" className="text-sm text-band-off">
          {rowError ?? (sizeParsed.ok ? 'Give a batch size above 0.' : `Batch size: ${sizeParsed.message}.`)}
        </p>
      )}
      <p className="num text-sm text-ink-soft">
        {valid ? `${trimmed(cups, 3)} cups = ${formatMl(cups * ML_PER_CUP)} (1 cup = ${ML_PER_CUP.toFixed(7)} mL; drops at ${dropsPerMl} per mL, the shop's dropper setting).` : ''}
        {yieldOf ? ` ${mold!.name}: ${yieldOf.shots} shots of ${formatMl(yieldOf.mlPerShot)} → ${yieldOf.baits} baits, ${formatMl(yieldOf.leftoverMl)} left over.` : ''}
      </p>
      <HeatCaution compact />
    </section>
  );
}
