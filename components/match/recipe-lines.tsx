'use client';

import { type Control, type UseFormRegister, type UseFormSetValue, useFieldArray, useWatch, type FieldErrors } from 'react-hook-form';
import { AmountEcho } from '@/components/ui/amount-echo';
import { Button } from '@/components/ui/button';
import { inputClass } from '@/components/ui/field';
import { DOSE_UNITS, type DoseUnit } from '@/lib/enums';
import type { PourFormValues } from './pour-form-schema';

export type ColorantOption = { id: string; name: string; kind: string; unit: (typeof DOSE_UNITS)[number] };

const small = 'mb-0.5 block text-xs font-medium text-ink-soft';

// Recipe lines per zone: colorant, amount and unit, per cup of plastisol.
// Amounts are typed as makers say them ("1/2", "1 1/4", "¼", "0,5"), read by
// the one dose parser (lib/recipes/parseAmount); every box has a visible label.
export function RecipeLines({ control, register, setValue, errors, zones, colorants }: {
  control: Control<PourFormValues>;
  register: UseFormRegister<PourFormValues>;
  setValue: UseFormSetValue<PourFormValues>;
  errors: FieldErrors<PourFormValues>;
  zones: string[];
  colorants: ColorantOption[];
}) {
  const lines = useFieldArray({ control, name: 'recipe' });
  const values = useWatch({ control, name: 'recipe' }) ?? [];
  return (
    <fieldset>
      <legend className="mb-1 text-sm font-medium">Recipe, per cup of plastisol</legend>
      <ul className="grid gap-2">
        {lines.fields.map((f, i) => {
          const err = errors.recipe?.[i];
          const v = values[i];
          const colorant = colorants.find((c) => c.id === v?.colorantId);
          const unit = (v?.unit ?? 'drops') as DoseUnit;
          const echoId = `recipe-${f.id}-echo`;
          const mismatch = colorant && colorant.unit !== unit;
          return (
            <li key={f.id} className="grid grid-cols-2 gap-2 rounded-md border border-panel-line bg-panel p-2 sm:grid-cols-[8rem_minmax(10rem,1fr)_7rem_6rem_auto] sm:items-end">
              <label>
                <span className={small}>Zone</span>
                <select aria-label={`Line ${i + 1} zone`} className={inputClass} {...register(`recipe.${i}.zone`)}>
                  {zones.map((z) => <option key={z} value={z}>{z}</option>)}
                </select>
              </label>
              <label className="col-span-2 row-start-2 sm:col-span-1 sm:row-start-auto">
                <span className={small}>Colorant</span>
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
              </label>
              <label className="row-start-3 sm:row-start-auto">
                <span className={small}>Amount per cup</span>
                <input
                  aria-label={`Line ${i + 1} amount`}
                  aria-describedby={echoId}
                  type="text"
                  inputMode="decimal"
                  autoComplete="off"
                  placeholder="e.g. 1/2"
                  className={inputClass}
                  {...register(`recipe.${i}.amount`)}
                />
              </label>
              <label className="row-start-3 sm:row-start-auto">
                <span className={small}>Unit</span>
                <select aria-label={`Line ${i + 1} unit`} className={inputClass} {...register(`recipe.${i}.unit`)}>
                  {DOSE_UNITS.map((u) => <option key={u} value={u}>{u}</option>)}
                </select>
              </label>
              <Button type="button" variant="secondary" className="row-start-1 col-start-2 sm:row-start-auto sm:col-start-auto" onClick={() => lines.remove(i)} aria-label={`Remove line ${i + 1}`}>Remove</Button>
              <div className="col-span-full">
                <AmountEcho id={echoId} value={v?.amount} unit={unit} />
                {mismatch ? (
                  <p className="text-xs text-ink-soft">
                    {colorant.name} is dosed in {colorant.unit} in the library:{' '}
                    {unit === 'g' || colorant.unit === 'g'
                      ? `${unit} cannot be converted to ${colorant.unit}, so the pour will be refused; give it in ${colorant.unit}.`
                      : `the dose is saved converted to ${colorant.unit} (teaspoons by 1/48 cup, drops by the shop’s dropper setting).`}
                  </p>
                ) : null}
                {err ? <p role="alert" className="text-sm text-band-off">{err.colorantId?.message ?? err.amount?.message ?? err.unit?.message ?? err.zone?.message ?? err.root?.message}</p> : null}
              </div>
            </li>
          );
        })}
      </ul>
      <Button type="button" variant="secondary" className="mt-2" onClick={() => lines.append({ zone: zones[0] ?? 'back', colorantId: '', amount: '', unit: 'drops' })}>
        Add a recipe line
      </Button>
    </fieldset>
  );
}
