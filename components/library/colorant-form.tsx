'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { type Resolver, useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { Field, TextInput, inputClass } from '@/components/ui/field';
import { FormError } from '@/components/ui/form-error';
import type { ColorantView } from '@/db/queries/libraries';
import { COLORANT_KINDS, DOSE_UNITS } from '@/lib/enums';
import { colorantFields, colorantSchema } from '@/lib/validations/library';
import { KIND_OPTION, UNIT_LABEL, USUAL_UNIT, numberOrNull, perUnit } from './format';
import { useEntrySubmit } from './use-entry-submit';

type Values = z.input<typeof colorantSchema>;
type Output = z.output<typeof colorantSchema>;

const FIELDS = Object.keys(colorantFields.shape);
const isBlank = (v: unknown) => v === null || v === undefined || (typeof v === 'number' && Number.isNaN(v));

// What the inputs hold becomes what the API takes: an untouched swatch is no
// swatch, and the flake fields count only for a flake (hidden otherwise, so a
// stale value there must not block the form).
function normalise(v: Values): Values {
  const s = v.swatch;
  const swatch = !s || (isBlank(s.l) && isBlank(s.a) && isBlank(s.b)) ? null : s;
  const flake = v.kind === 'flake';
  return { ...v, swatch, flakeSizeIn: flake ? v.flakeSizeIn : null, flakeColor: flake ? v.flakeColor || null : null, notes: v.notes || null };
}

const SWATCH_LABEL = { l: 'L*', a: 'a*', b: 'b*' } as const;

const validate = zodResolver(colorantSchema);
const resolver: Resolver<Values, unknown, Output> = (values, ctx, opts) => validate(normalise(values), ctx, opts);

const emptyValues = (kind: Values['kind'] = 'pigment'): Values => ({ name: '', kind, unit: USUAL_UNIT[kind], costPerUnit: null, stock: null, lowStockAt: null, flakeSizeIn: null, flakeColor: '', swatch: undefined, notes: '' });

export function ColorantForm({ colorant, onSaved, onCancel }: { colorant?: ColorantView; onSaved: (c: ColorantView) => void | Promise<void>; onCancel?: () => void }) {
  const { register, handleSubmit, formState, watch, setValue, getFieldState, reset, setFocus, setError: setFieldError } = useForm<Values, unknown, Output>({
    resolver,
    defaultValues: colorant ? { ...colorant, flakeColor: colorant.flakeColor ?? '', notes: colorant.notes ?? '', swatch: colorant.swatch ?? undefined } : emptyValues(),
  });
  const kind = watch('kind');
  const unit = watch('unit');
  const num = { setValueAs: numberOrNull };
  const err = formState.errors;

  const { error, saved, submit } = useEntrySubmit<Values, Output, ColorantView>({
    base: '/api/colorants',
    id: colorant?.id,
    fields: FIELDS,
    setFieldError,
    onSaved,
    afterAdd: (v) => {
      reset(emptyValues(v.kind));
      setFocus('name');
    },
  });
  const onSubmit = handleSubmit(submit);

  const label = colorant ? `Edit ${colorant.name}` : 'Add a colorant';
  return (
    <form onSubmit={onSubmit} noValidate aria-label={label} className="grid gap-3 sm:grid-cols-2">
      <div className="sm:col-span-2"><FormError message={error} /></div>
      <Field label="Name" error={err.name?.message} hint="As the shop calls it, e.g. “Pigment, moss green”.">
        <TextInput autoComplete="off" {...register('name')} />
      </Field>
      <Field label="Kind" error={err.kind?.message}>
        <select
          className={inputClass}
          {...register('kind', {
            onChange: (e) => {
              if (!colorant && !getFieldState('unit').isDirty) setValue('unit', USUAL_UNIT[e.target.value as Values['kind']] ?? 'drops');
            },
          })}
        >
          {COLORANT_KINDS.map((k) => <option key={k} value={k}>{KIND_OPTION[k]}</option>)}
        </select>
      </Field>
      <Field label="Dosed in" error={err.unit?.message} hint="The unit recipes use for it, per cup of plastisol.">
        <select className={inputClass} {...register('unit')}>
          {DOSE_UNITS.map((u) => <option key={u} value={u}>{UNIT_LABEL[u]}</option>)}
        </select>
      </Field>
      {kind === 'flake' ? (
        <>
          <Field label="Flake size (in)" error={err.flakeSizeIn?.message} hint="Inches across, 0.005 to 0.25 (e.g. 0.015, 0.025, 1/32 in = 0.031).">
            <input type="number" step="any" min="0.005" max="0.25" className={`${inputClass} num`} {...register('flakeSizeIn', num)} />
          </Field>
          <Field label="Flake colour" error={err.flakeColor?.message}>
            <TextInput autoComplete="off" placeholder="e.g. black, gold, red" {...register('flakeColor')} />
          </Field>
        </>
      ) : null}
      <Field label={`Cost per ${perUnit(unit)}`} error={err.costPerUnit?.message} hint="Optional; in the shop's currency.">
        <input type="number" step="any" min="0" className={`${inputClass} num`} {...register('costPerUnit', num)} />
      </Field>
      <Field label={`Stock (${unit === 'ml' ? 'mL' : unit})`} error={err.stock?.message} hint={colorant ? 'A new count goes into the stock ledger as an adjustment.' : 'Optional; how much is on the shelf.'}>
        <input type="number" step="any" min="0" className={`${inputClass} num`} {...register('stock', num)} />
      </Field>
      <Field label={`Low-stock mark (${unit === 'ml' ? 'mL' : unit})`} error={err.lowStockAt?.message} hint="Optional; below this the library marks it low.">
        <input type="number" step="any" min="0" className={`${inputClass} num`} {...register('lowStockAt', num)} />
      </Field>
      <fieldset className="sm:col-span-2">
        <legend className="text-sm font-medium">Measured swatch, CIELAB (D65) — optional</legend>
        <p className="mb-1 text-sm text-ink-soft">L* 0 to 100; a* and b* −128 to 127. Leave blank if it has not been measured.</p>
        <div className="grid grid-cols-3 gap-2">
          {(['l', 'a', 'b'] as const).map((k) => (
            <Field key={k} label={SWATCH_LABEL[k]} error={err.swatch?.[k]?.message}>
              <input type="number" step="0.1" className={`${inputClass} num`} {...register(`swatch.${k}`, num)} />
            </Field>
          ))}
        </div>
        {err.swatch?.message ? <p role="alert" className="mt-1 text-sm text-band-off">{err.swatch.message}</p> : null}
      </fieldset>
      <div className="sm:col-span-2">
        <Field label="Notes" error={err.notes?.message}>
          <textarea rows={2} className={`${inputClass} py-2`} {...register('notes')} />
        </Field>
      </div>
      <div className="flex flex-wrap items-center gap-3 sm:col-span-2">
        <Button type="submit" disabled={formState.isSubmitting}>{formState.isSubmitting ? 'Saving…' : colorant ? 'Save changes' : 'Add colorant'}</Button>
        {onCancel ? <Button type="button" variant="secondary" onClick={onCancel}>{colorant ? 'Cancel' : 'Close'}</Button> : null}
        {saved ? <span role="status" className="text-sm text-ink-soft">{saved}</span> : null}
      </div>
    </form>
  );
}
