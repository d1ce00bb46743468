'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { type Resolver, useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { Field, TextInput, inputClass } from '@/components/ui/field';
import { FormError } from '@/components/ui/form-error';
import type { MoldView } from '@/db/queries/libraries';
import { THICKNESS } from '@/lib/enums';
import { moldSchema } from '@/lib/validations/library';
import { numberOrNull } from './format';
import { useEntrySubmit } from './use-entry-submit';

type Input = z.input<typeof moldSchema>;
type Output = z.output<typeof moldSchema>;
// Blank number inputs hold null until zod answers "… is required".
type Values = Omit<Input, 'cavities' | 'mlPerCavity'> & { cavities: number | null; mlPerCavity: number | null };

const validate = zodResolver(moldSchema);
const resolver: Resolver<Values, unknown, Output> = (values, ctx, opts) => validate(values as Input, ctx, opts as Parameters<typeof validate>[2]);

const FIELDS = Object.keys(moldSchema.shape);
const THICKNESS_OPTION: Record<(typeof THICKNESS)[number], string> = {
  thin: 'Thin body (shows lighter)',
  standard: 'Standard body',
  thick: 'Thick body (shows darker)',
};

const emptyValues = (): Values => ({ name: '', bodyStyle: '', lengthIn: null, cavities: null, mlPerCavity: null, thickness: 'standard' });

export function MoldForm({ mold, onSaved, onCancel }: { mold?: MoldView; onSaved: (m: MoldView) => void | Promise<void>; onCancel?: () => void }) {
  const { register, handleSubmit, formState, reset, setFocus, setError: setFieldError } = useForm<Values, unknown, Output>({
    resolver,
    defaultValues: mold ?? emptyValues(),
  });
  const num = { setValueAs: numberOrNull };
  const err = formState.errors;

  const { error, saved, submit } = useEntrySubmit<Values, Output, MoldView>({
    base: '/api/molds',
    id: mold?.id,
    fields: FIELDS,
    setFieldError,
    onSaved,
    afterAdd: () => {
      reset(emptyValues());
      setFocus('name');
    },
  });
  const onSubmit = handleSubmit(submit);

  return (
    <form onSubmit={onSubmit} noValidate aria-label={mold ? `Edit ${mold.name}` : 'Add a mold'} className="grid gap-3 sm:grid-cols-2">
      <div className="sm:col-span-2"><FormError message={error} /></div>
      <Field label="Name" error={err.name?.message} hint="e.g. “Ribbon tail 6 in, 3 cavity”.">
        <TextInput autoComplete="off" {...register('name')} />
      </Field>
      <Field label="Body style" error={err.bodyStyle?.message} hint="stick worm, craw, creature, swimbait…">
        <TextInput autoComplete="off" {...register('bodyStyle')} />
      </Field>
      <Field label="Length (in)" error={err.lengthIn?.message} hint="Optional; bait length in inches, 0.5 to 24.">
        <input type="number" step="any" min="0.5" max="24" className={`${inputClass} num`} {...register('lengthIn', num)} />
      </Field>
      <Field label="Cavities" error={err.cavities?.message} hint="Baits per shot, 1 to 50.">
        <input type="number" step="1" min="1" max="50" inputMode="numeric" className={`${inputClass} num`} {...register('cavities', num)} />
      </Field>
      <Field label="Plastisol per cavity (mL)" error={err.mlPerCavity?.message} hint="Millilitres one bait takes, without the sprue.">
        <input type="number" step="any" min="0.1" max="500" className={`${inputClass} num`} {...register('mlPerCavity', num)} />
      </Field>
      <Field label="Body thickness" error={err.thickness?.message} hint="Thin bodies show a lighter colour for the same recipe (common practice).">
        <select className={inputClass} {...register('thickness')}>
          {THICKNESS.map((t) => <option key={t} value={t}>{THICKNESS_OPTION[t]}</option>)}
        </select>
      </Field>
      <div className="flex flex-wrap items-center gap-3 sm:col-span-2">
        <Button type="submit" disabled={formState.isSubmitting}>{formState.isSubmitting ? 'Saving…' : mold ? 'Save changes' : 'Add mold'}</Button>
        {onCancel ? <Button type="button" variant="secondary" onClick={onCancel}>{mold ? 'Cancel' : 'Close'}</Button> : null}
        {saved ? <span role="status" className="text-sm text-ink-soft">{saved}</span> : null}
      </div>
    </form>
  );
}
