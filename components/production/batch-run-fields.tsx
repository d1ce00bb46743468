'use client';

import { Button } from '@/components/ui/button';
import { Field, inputClass } from '@/components/ui/field';
import { formatVolume, trimmed } from '@/lib/format';
import { fromCups, VOLUME_LABEL, type VolumeUnit } from '@/lib/recipes';

type Mold = { id: string; name: string; cavities: number };
type Base = { id: string; name: string };

// The production side of a batch beyond its size: the cups of each side of a
// laminate (blank: the batch split evenly), the run plan it came from, and
// the base its plastisol is drawn from.
export function BatchRunFields(props: {
  zones: string[];
  unit: VolumeUnit;
  totalCups: number | null;
  zoneSizes: Record<string, string>;
  onZoneSize: (zone: string, v: string) => void;
  splitError: string | null;
  plan: { moldId: string; shots: number }[] | null;
  molds: Mold[];
  onDropPlan: () => void;
  bases: Base[];
  baseId: string;
  onBase: (id: string) => void;
}) {
  const { zones, unit, totalCups } = props;
  const evenCups = totalCups && totalCups > 0 ? totalCups / zones.length : null;
  const even = evenCups ? trimmed(fromCups(evenCups, unit)) : '';
  return (
    <div className="space-y-3">
      {zones.length > 1 ? (
        <fieldset className="rounded-md border border-panel-line p-3">
          <legend className="px-1 text-sm font-medium">Each side’s own cup ({VOLUME_LABEL[unit]})</legend>
          <p className="mb-2 text-sm text-ink-soft">A laminate mixes each colour in its own cup. Leave blank to split the batch evenly{evenCups ? ` (${formatVolume(evenCups, unit)} each)` : ''}.</p>
          <div className="grid grid-cols-2 gap-3">
            {zones.map((z) => (
              <Field key={z} label={`${z[0]!.toUpperCase()}${z.slice(1)}`}>
                <input
                  type="number" inputMode="decimal" step="any" min="0" placeholder={even} aria-label={`${z} (${VOLUME_LABEL[unit]})`}
                  value={props.zoneSizes[z] ?? ''} onChange={(e) => props.onZoneSize(z, e.target.value)} className={inputClass}
                />
              </Field>
            ))}
          </div>
          {props.splitError ? <p role="alert" className="mt-1 text-sm text-band-off">{props.splitError}</p> : null}
        </fieldset>
      ) : null}
      {props.plan ? (
        <div className="rounded-md border border-panel-line p-3 text-sm">
          <p className="font-medium">Run plan</p>
          <ul className="num">
            {props.plan.map((l) => {
              const m = props.molds.find((x) => x.id === l.moldId);
              return <li key={l.moldId}>{m?.name ?? 'a mold not in the library'}: {l.shots} shots{m ? ` → ${l.shots * m.cavities} baits` : ''}</li>;
            })}
          </ul>
          <Button type="button" variant="secondary" className="mt-2" onClick={props.onDropPlan}>Log without the plan</Button>
        </div>
      ) : null}
      {props.bases.length ? (
        <Field label="Plastisol drawn from" hint="The batch’s plastisol comes out of this base’s stock.">
          <select value={props.baseId} onChange={(e) => props.onBase(e.target.value)} className={inputClass}>
            {props.bases.map((b) => <option key={b.id} value={b.id}>{b.name}</option>)}
          </select>
        </Field>
      ) : null}
    </div>
  );
}
