'use client';

import { type Control, type UseFormRegister, type UseFormSetValue, useFieldArray, type FieldErrors } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { inputClass } from '@/components/ui/field';
import { DOSE_UNITS } from '@/db/schema';
import type { PourFormValues } from './pour-form';

export type ColorantOption = { id: string; name: string; kind: string; unit: (typeof DOSE_UNITS)[number] };

// Recipe lines per zone: colorant, amount and unit, per cup of plastisol.
export function RecipeLines({ control, register, setValue, errors, zones, colorants }: {
  control: Control<PourFormValues>;
  register: UseFormRegister<PourFormValues>;
  setValue: UseFormSetValue<PourFormValues>;
  errors: FieldErrors<PourFormValues>;
  zones: string[];
  colorants: ColorantOption[];
}) {
  const lines = useFieldArray({ control, name: 'recipe' });
  return (
    <fieldset>
      <legend className="mb-1 text-sm font-medium">Recipe, per cup of plastisol</legend>
      <ul className="grid gap-2">
        {lines.fields.map((f, i) => {
          const err = errors.recipe?.[i];
          return (
            <li key={f.id} className="grid grid-cols-2 gap-2 rounded-md border border-panel-line bg-panel p-2 sm:grid-cols-[8rem_1fr_6rem_6rem_auto]">
              <select aria-label={`Line ${i + 1} zone`} className={inputClass} {...register(`recipe.${i}.zone`)}>
                {zones.map((z) => <option key={z} value={z}>{z}</option>)}
              </select>
              <select
                aria-label={`Line ${i + 1} colorant`}
                className={inputClass}
                {...register(`recipe.${i}.colorantId`, {
                  onChange: (e) => {
                    const c = colorants.find((x) => x.id === e.target.value);
                    if (c) setValue(`recipe.${i}.unit`, c.unit);
                  },
                })}
              >
                <option value="">Choose a colorant…</option>
                {colorants.map((c) => <option key={c.id} value={c.id}>{c.name}</option>)}
              </select>
              <input aria-label={`Line ${i + 1} amount`} type="number" step="any" min="0" className={inputClass} {...register(`recipe.${i}.amount`, { valueAsNumber: true })} />
              <select aria-label={`Line ${i + 1} unit`} className={inputClass} {...register(`recipe.${i}.unit`)}>
                {DOSE_UNITS.map((u) => <option key={u} value={u}>{u}</option>)}
              </select>
              <Button type="button" variant="secondary" onClick={() => lines.remove(i)} aria-label={`Remove line ${i + 1}`}>Remove</Button>
              {err ? <p role="alert" className="col-span-full text-sm text-band-off">{err.colorantId?.message ?? err.amount?.message ?? err.unit?.message ?? err.zone?.message ?? err.root?.message}</p> : null}
            </li>
          );
        })}
      </ul>
      <Button type="button" variant="secondary" className="mt-2" onClick={() => lines.append({ zone: zones[0] ?? 'back', colorantId: '', amount: Number.NaN, unit: 'drops' })}>
        Add a recipe line
      </Button>
    </fieldset>
  );
}
