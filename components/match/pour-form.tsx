'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useCallback, useState } from 'react';
import { useForm } from 'react-hook-form';
import useSWR from 'swr';
import { HeatCaution } from '@/components/safety/heat-caution';
import { NEUTRAL, PhotoSampler } from '@/components/sampler/photo-sampler';
import { comparedZones, InFrameToggle, samplerZones } from '@/components/sampler/reference-in-frame';
import { Button } from '@/components/ui/button';
import { Field, inputClass } from '@/components/ui/field';
import { FormError } from '@/components/ui/form-error';
import { PhotoDropzone } from '@/components/upload/photo-dropzone';
import type { MatchDetail } from '@/db/queries/matchDetail';
import type { PourView } from '@/db/queries/pours';
import type { Shape } from '@/lib/color/types';
import { apiFetch, swrFetcher } from '@/lib/http/client';
import type { UploadedPhoto } from '@/lib/uploads/limits';
import type { PourSuggestion } from '@/lib/matches/suggestionTypes';
import { NextPourHint } from './next-pour-hint';
import { CardCarriedNote } from './light-note';
import { formSchema, type PourFormValues } from './pour-form-schema';
import { type ColorantOption, RecipeLines } from './recipe-lines';
import { StartingRecipeButton } from './starting-recipe-button';

type Props = { match: MatchDetail; initialShapes: Record<string, Shape>; previous?: PourView; onSaved: (pourId: string) => void };

export function PourForm({ match, initialShapes, previous, onSaved }: Props) {
  const { data: colorants } = useSWR<ColorantOption[]>('/api/colorants', swrFetcher);
  const { data: molds } = useSWR<{ id: string; name: string }[]>('/api/molds', swrFetcher);
  const [photo, setPhoto] = useState<UploadedPhoto | null>(null);
  const [shapes, setShapes] = useState<Record<string, Shape>>(initialShapes);
  const [error, setError] = useState<string | null>(null);
  // The reference in frame: a reference bait lying beside the pour, its zones marked too.
  const [withRef, setWithRef] = useState(false);
  const onShapes = useCallback((s: Record<string, Shape>) => setShapes(s), []);
  const { register, control, handleSubmit, setValue, getValues, formState } = useForm<PourFormValues>({
    resolver: zodResolver(formSchema),
    // The last pour's recipe, mold, size and temperature, ready to adjust.
    defaultValues: {
      recipe: (previous?.recipe ?? []).map(({ zone, colorantId, amount, unit }) => ({ zone, colorantId, amount, unit })),
      moldId: previous?.moldId ?? '',
      batchCups: previous?.batchCups ?? undefined,
      tempF: previous?.tempF ?? undefined,
      notes: '',
    },
  });
  const missing = match.zones.filter((z) => !shapes[z]);
  // The hint's changes applied to the lines as they stand: a line per changed colorant, none for 0.
  const useAdvice = (advice: PourSuggestion) => {
    let lines = getValues('recipe');
    for (const z of advice.zones) {
      if (z.status !== 'suggested') continue;
      for (const c of z.changes) {
        lines = lines.filter((l) => !(l.zone === z.zone && l.colorantId === c.colorantId && l.unit === c.unit));
        if (c.to > 0) lines.push({ zone: z.zone, colorantId: c.colorantId, amount: c.to, unit: c.unit });
      }
    }
    setValue('recipe', lines, { shouldDirty: true });
  };
  const useStart = (lines: PourFormValues['recipe']) => setValue('recipe', lines, { shouldDirty: true });

  const onSubmit = handleSubmit(async (v) => {
    setError(null);
    if (!photo) return setError('Add the photo of this pour first.');
    if (missing.length) return setError(`Mark every zone on the photo (missing: ${missing.join(', ')}).`);
    const parsed = formSchema.parse(v);
    try {
      const pour = await apiFetch<{ id: string }>(`/api/matches/${match.id}/pours`, {
        method: 'POST',
        body: JSON.stringify({
          photoId: photo.photoId,
          recipe: parsed.recipe,
          moldId: parsed.moldId || undefined,
          batchCups: parsed.batchCups,
          tempF: parsed.tempF,
          notes: parsed.notes || undefined,
          correctsPourId: parsed.correctsPourId || undefined,
          zones: comparedZones(match.zones, shapes, withRef ? 'reference' : null),
          neutral: shapes[NEUTRAL] ? { shape: shapes[NEUTRAL], ...(match.lastNeutral?.L ? { L: match.lastNeutral.L } : {}) } : undefined,
        }),
      });
      onSaved(pour.id);
    } catch (e) {
      setError((e as Error).message);
    }
  });

  // The selects need their options before the form's values can show in them.
  if (!colorants || !molds) return <p role="status" className="text-ink-soft">Loading the colorant and mold libraries…</p>;
  return (
    <form onSubmit={onSubmit} className="space-y-4" noValidate aria-label="New pour">
      {previous ? <NextPourHint pourId={previous.id} onUse={useAdvice} /> : <StartingRecipeButton matchId={match.id} onUse={useStart} />}
      <RecipeLines control={control} register={register} setValue={setValue} errors={formState.errors} zones={match.zones} colorants={colorants} />
      <div className="grid gap-3 sm:grid-cols-3">
        <Field label="Mold">
          <select className={inputClass} {...register('moldId')}>
            <option value="">—</option>
            {molds.map((m) => <option key={m.id} value={m.id}>{m.name}</option>)}
          </select>
        </Field>
        <Field label="Batch size (cups)" error={formState.errors.batchCups?.message}>
          <input type="text" inputMode="decimal" autoComplete="off" className={inputClass} {...register('batchCups')} />
        </Field>
        <Field label="Pour / injection temperature (°F)" error={formState.errors.tempF?.message}>
          <input type="number" step="1" className={inputClass} {...register('tempF', { valueAsNumber: true })} />
        </Field>
      </div>
      <HeatCaution compact />
      <Field label="Notes">
        <textarea rows={2} className={`${inputClass} py-2`} {...register('notes')} />
      </Field>
      {match.pours.length ? (
        <Field label="This pour corrects (optional)">
          <select className={inputClass} {...register('correctsPourId')}>
            <option value="">— a new iteration —</option>
            {match.pours.map((p) => <option key={p.id} value={p.id}>pour #{p.number}</option>)}
          </select>
        </Field>
      ) : null}
      {photo ? (
        <>
          <InFrameToggle checked={withRef} onChange={setWithRef}>
            The reference bait lies in this photo too: mark its zones (compared under the same light, no card needed)
          </InFrameToggle>
          <PhotoSampler key={withRef ? 'with-reference' : 'pour-only'} src={`/api/photos/${photo.photoId}/image`} width={photo.width} height={photo.height} zones={samplerZones(match.zones, withRef ? 'reference' : null)} initialShapes={{ ...initialShapes, ...shapes }} withNeutral onChange={onShapes} />
          <CardCarriedNote neutral={match.lastNeutral} marked={Boolean(shapes[NEUTRAL])} />
          {shapes[NEUTRAL] || match.lastNeutral ? null : (
            <p className="text-sm text-ink-soft">
              No grey card marked: a change of light between this photo and the reference will read as a colour difference. Mark the card if it is in frame.
            </p>
          )}
        </>
      ) : (
        <PhotoDropzone endpoint="pourPhoto" label="Add the photo of this pour" onUploaded={setPhoto} />
      )}
      <FormError message={error} />
      <Button type="submit" disabled={formState.isSubmitting}>{formState.isSubmitting ? 'Measuring…' : 'Measure and save pour'}</Button>
    </form>
  );
}
