'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useCallback, useState } from 'react';
import { useForm } from 'react-hook-form';
import useSWR from 'swr';
import { z } from 'zod';
import { NEUTRAL, PhotoSampler } from '@/components/sampler/photo-sampler';
import { Button } from '@/components/ui/button';
import { Field, inputClass } from '@/components/ui/field';
import { FormError } from '@/components/ui/form-error';
import { PhotoDropzone } from '@/components/upload/photo-dropzone';
import type { BatchView } from '@/db/queries/batches';
import type { PourView } from '@/db/queries/pours';
import type { Shape } from '@/lib/color/types';
import { apiFetch, swrFetcher } from '@/lib/http/client';
import { moldYield } from '@/lib/recipes';
import type { UploadedPhoto } from '@/lib/uploads/limits';
import { MAX_BAITS, MAX_BATCH_CUPS } from '@/lib/validations/production';

type Mold = { id: string; name: string; cavities: number; mlPerCavity: number };
const blank = (v: unknown) => (v === '' || v === null || Number.isNaN(v) ? undefined : v);
const count = (name: string) =>
  z.preprocess(blank, z.number().int(`${name} is a whole number`).min(0, `${name} cannot be negative`).max(MAX_BAITS).optional());
const formSchema = z.object({
  cups: z.preprocess(blank, z.number({ error: 'give the batch size in cups' }).gt(0, 'more than 0 cups').max(MAX_BATCH_CUPS, `at most ${MAX_BATCH_CUPS} cups`)),
  moldId: z.string().optional(),
  baitsExpected: count('the expected count'),
  baits: count('the bait count'),
  notes: z.string().max(4000).optional(),
});
type Values = z.input<typeof formSchema>;

type Props = { matchId: string; standardPourId: string; sprueAllowanceMl: number; onLogged: (batch: BatchView) => void };

// Logs one production batch of the standard: size, mold and bait counts, a QC
// photo with every zone of the standard marked (starting from the standard
// pour's shapes). The server measures it and judges pass or fail.
export function BatchForm({ matchId, standardPourId, sprueAllowanceMl, onLogged }: Props) {
  const { data: std } = useSWR<PourView>(`/api/pours/${standardPourId}`, swrFetcher);
  const { data: molds } = useSWR<Mold[]>('/api/molds', swrFetcher);
  const [photo, setPhoto] = useState<UploadedPhoto | null>(null);
  const [shapes, setShapes] = useState<Record<string, Shape>>({});
  const [error, setError] = useState<string | null>(null);
  const onShapes = useCallback((s: Record<string, Shape>) => setShapes(s), []);
  const { register, handleSubmit, watch, formState } = useForm<Values>({
    resolver: zodResolver(formSchema),
    values: { cups: '', moldId: std?.moldId ?? '', baitsExpected: '', baits: '', notes: '' },
    resetOptions: { keepDirtyValues: true },
  });
  const zones = std?.zones.map((z) => z.name) ?? [];
  const missing = zones.filter((z) => !shapes[z]);
  const cups = Number(watch('cups'));
  const mold = molds?.find((m) => m.id === watch('moldId'));
  const yieldHint = mold && cups > 0 && cups <= MAX_BATCH_CUPS ? moldYield(cups, mold, sprueAllowanceMl) : null;

  const onSubmit = handleSubmit(async (raw) => {
    setError(null);
    if (!photo) return setError('Add the QC photo of this batch first.');
    if (missing.length) return setError(`Mark every zone of the standard on the photo (missing: ${missing.join(', ')}).`);
    const v = formSchema.parse(raw);
    try {
      const batch = await apiFetch<BatchView>(`/api/matches/${matchId}/batches`, {
        method: 'POST',
        body: JSON.stringify({
          photoId: photo.photoId,
          zones: zones.map((name) => ({ name, shape: shapes[name] })),
          neutral: shapes[NEUTRAL] ? { shape: shapes[NEUTRAL] } : undefined,
          cups: v.cups,
          moldId: v.moldId || null,
          baitsExpected: v.baitsExpected ?? null,
          baits: v.baits ?? null,
          notes: v.notes || null,
        }),
      });
      onLogged(batch);
    } catch (e) {
      setError((e as Error).message);
    }
  });

  if (!std) return <p role="status" className="text-ink-soft">Loading the standard…</p>;
  const e = formState.errors;
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Log a batch" className="space-y-4">
      <div className="grid gap-3 sm:grid-cols-2">
        <Field label="Batch size (cups)" error={e.cups?.message}>
          <input type="number" inputMode="decimal" step="any" min="0" className={inputClass} {...register('cups')} />
        </Field>
        <Field label="Mold" hint={std.mold ? `The standard was poured in ${std.mold}.` : undefined}>
          <select className={inputClass} {...register('moldId')}>
            <option value="">—</option>
            {(molds ?? []).map((m) => <option key={m.id} value={m.id}>{m.name}</option>)}
          </select>
        </Field>
        <Field
          label="Expected bait count (optional)"
          error={e.baitsExpected?.message}
          hint={yieldHint ? `Empty: ${yieldHint.baits} baits from ${yieldHint.shots} shots of ${yieldHint.mlPerShot.toFixed(1)} mL.` : 'Empty: worked out from the mold and batch size.'}
        >
          <input type="number" inputMode="numeric" step="1" min="0" className={inputClass} {...register('baitsExpected')} />
        </Field>
        <Field label="Actual bait count (optional)" error={e.baits?.message}>
          <input type="number" inputMode="numeric" step="1" min="0" className={inputClass} {...register('baits')} />
        </Field>
      </div>
      <Field label="Notes (optional)">
        <textarea rows={2} className={`${inputClass} py-2`} {...register('notes')} />
      </Field>
      {photo ? (
        <>
          <p className="text-sm">The zones start where they were on the standard pour’s photo: move them onto this batch’s baits, and mark the grey card if one is in frame.</p>
          <PhotoSampler
            src={`/api/photos/${photo.photoId}/image`}
            width={photo.width}
            height={photo.height}
            zones={zones}
            initialShapes={Object.fromEntries(std.zones.map((z) => [z.name, z.shape as Shape]))}
            withNeutral
            onChange={onShapes}
          />
        </>
      ) : (
        <div className="space-y-2">
          <p className="text-sm text-ink-soft">Shoot a few baits of the batch under the same light as the standard, with the grey card in frame.</p>
          <PhotoDropzone endpoint="batchPhoto" label="Add the QC photo of this batch" onUploaded={setPhoto} />
        </div>
      )}
      <FormError message={error} />
      <Button type="submit" disabled={formState.isSubmitting}>{formState.isSubmitting ? 'Measuring…' : 'Measure and log batch'}</Button>
    </form>
  );
}
