'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useFieldArray, useForm } from 'react-hook-form';
import { useSWRConfig } from 'swr';
import { z } from 'zod';
import { Button } from '@/components/ui/button';
import { Field, TextInput, inputClass } from '@/components/ui/field';
import { FormError } from '@/components/ui/form-error';
import { apiFetch } from '@/lib/http/client';
import { createMatchSchema, zoneName } from '@/lib/validations/match';

// The form keeps zones as objects (useFieldArray needs them) and sends the
// API's list of names.
const formSchema = createMatchSchema.extend({ zones: z.array(z.object({ name: zoneName })).min(1, 'a match needs at least one zone') });
type Values = z.input<typeof formSchema>;

// Enter in a one-line box moves to the next field instead of creating the
// match half-filled: only the "Create match" button creates it.
function enterMovesOn(e: React.KeyboardEvent<HTMLFormElement>) {
  const t = e.target as HTMLElement;
  if (e.key !== 'Enter' || !(t instanceof HTMLInputElement)) return;
  e.preventDefault();
  const fields = [...e.currentTarget.querySelectorAll<HTMLElement>('input, select, textarea, button[type="submit"]')].filter((f) => !f.hasAttribute('disabled'));
  fields[fields.indexOf(t) + 1]?.focus();
}

export function NewMatchForm({ defaultTolerance, onDone }: { defaultTolerance: number; onDone?: () => void }) {
  const router = useRouter();
  const { mutate } = useSWRConfig();
  const [error, setError] = useState<string | null>(null);
  const { register, handleSubmit, control, formState } = useForm<Values>({
    resolver: zodResolver(formSchema),
    defaultValues: { name: '', zones: [{ name: 'back' }, { name: 'belly' }], tolerance: defaultTolerance, notes: '' },
  });
  const zones = useFieldArray({ control, name: 'zones' });
  const onSubmit = handleSubmit(async (v) => {
    setError(null);
    try {
      const body = { name: v.name, zones: v.zones.map((z) => z.name), tolerance: v.tolerance, notes: v.notes || undefined };
      const match = await apiFetch<{ id: string }>('/api/matches', { method: 'POST', body: JSON.stringify(body) });
      await mutate('/api/matches');
      onDone?.();
      router.push(`/matches/${match.id}`);
    } catch (e) {
      setError((e as Error).message);
    }
  });
  const err = formState.errors;
  return (
    <form onSubmit={onSubmit} onKeyDown={enterMovesOn} className="grid gap-4" noValidate aria-label="New match">
      <FormError message={error} />
      <Field label="Name" error={err.name?.message} hint="What the colour is called in the shop, e.g. “Dusk crawdad”.">
        {/* The form has just opened at the maker's request: start typing the name. */}
        <TextInput autoFocus {...register('name')} />
      </Field>
      <fieldset>
        <legend className="mb-1 text-sm font-medium">Zones (each part of the bait that carries one colour)</legend>
        <ul className="grid gap-2">
          {zones.fields.map((f, i) => (
            <li key={f.id} className="flex gap-2">
              <TextInput aria-label={`Zone ${i + 1}`} {...register(`zones.${i}.name`)} />
              <Button type="button" variant="secondary" onClick={() => zones.remove(i)} disabled={zones.fields.length <= 1} aria-label={`Remove zone ${i + 1}`}>
                Remove
              </Button>
            </li>
          ))}
        </ul>
        {err.zones?.message || err.zones?.root?.message ? <p role="alert" className="mt-1 text-sm text-band-off">{err.zones?.message ?? err.zones?.root?.message}</p> : null}
        {zones.fields.map((_, i) => err.zones?.[i]?.name?.message ? <p key={i} role="alert" className="mt-1 text-sm text-band-off">Zone {i + 1}: {err.zones[i]!.name!.message}</p> : null)}
        <Button type="button" variant="secondary" className="mt-2" onClick={() => zones.append({ name: '' })} disabled={zones.fields.length >= 12}>
          Add a zone
        </Button>
      </fieldset>
      <Field label="Tolerance (ΔE00)" error={err.tolerance?.message} hint="A pour within this ΔE00 of the target passes. 2.0 is a usual start for photo work.">
        <input type="number" step="0.1" min="0.1" max="20" className={inputClass} {...register('tolerance', { valueAsNumber: true })} />
      </Field>
      <Field label="Notes" error={err.notes?.message}>
        <textarea rows={3} className={`${inputClass} py-2`} {...register('notes')} />
      </Field>
      <div>
        <Button type="submit" disabled={formState.isSubmitting}>{formState.isSubmitting ? 'Creating…' : 'Create match'}</Button>
      </div>
    </form>
  );
}
