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
import { CardCarriedNote } from '@/components/match/light-note';
import type { BatchView } from '@/db/queries/batches';
import type { NeutralMark } from '@/db/queries/light';
import type { MatchDetail } from '@/db/queries/matchDetail';
import type { PourView } from '@/db/queries/pours';
import type { Shape } from '@/lib/color/types';
import { apiFetch, swrFetcher } from '@/lib/http/client';
import { moldYield, parseAmount } from '@/lib/recipes';
import type { UploadedPhoto } from '@/lib/uploads/limits';
import { MAX_BAITS, MAX_BATCH_CUPS } from '@/lib/validations/production';

type Mold = { id: string; name: string; cavities: number; mlPerCavity: number };
// Number inputs give strings: empty is "not given", anything else a number (NaN fails).
const blank = (v: unknown) => (v === '' || v === null || v === undefined ? undefined : Number(v));
// The batch size as a maker says it ("1 1/2", "¾", "0,5"), through the one dose parser.
const amount = (v: unknown, ctx: z.RefinementCtx) => {
  if (blank(v) === undefined) return undefined;
  const r = parseAmount(v as string | number);
  if (r.ok) return r.value;
  ctx.addIssue({ code: 'custom', message: r.message });
  return z.NEVER;
};
const count = (name: string) =>
  z.preprocess(blank, z.number().int(`${name} is a whole number`).min(0, `${name} cannot be negative`).max(MAX_BAITS).optional());
const formSchema = z.object({
  cups: z.preprocess(amount, z.number({ error: 'give the batch size in cups' }).gt(0, 'more than 0 cups').max(MAX_BATCH_CUPS, `at most ${MAX_BATCH_CUPS} cups`)),
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
export function BatchForm(props: Props) {
  const { data: std, error } = useSWR<PourView>(`/api/pours/${props.standardPourId}`, swrFetcher);
  const { data: molds, error: moldError } = useSWR<Mold[]>('/api/molds', swrFetcher);
  const { data: match } = useSWR<MatchDetail>(`/api/matches/${props.matchId}`, swrFetcher);
  const failed = error ?? moldError;
  if (failed) return <p role="alert" className="text-band-off">Could not load the standard or the molds: {(failed as Error).message}</p>;
  // The form starts from the standard's mold, so its options must be there first.
  if (!std || !molds || !match) return <p role="status" className="text-ink-soft">Loading the standard…</p>;
  return <BatchFormFields {...props} std={std} molds={molds} neutral={match.lastNeutral} />;
}

function BatchFormFields({ matchId, sprueAllowanceMl, onLogged, std, molds, neutral }: Props & { std: PourView; molds: Mold[]; neutral: NeutralMark | null }) {
  const [photo, setPhoto] = useState<UploadedPhoto | null>(null);
  const [shapes, setShapes] = useState<Record<string, Shape>>({});
  const [error, setError] = useState<string | null>(null);
  const onShapes = useCallback((s: Record<string, Shape>) => setShapes(s), []);
  const { register, handleSubmit, watch, formState } = useForm<Values>({
    resolver: zodResolver(formSchema),
    defaultValues: { cups: '', moldId: std.moldId ?? '', baitsExpected: '', baits: '', notes: '' },
  });
  const zones = std.zones.map((z) => z.name);
  const missing = zones.filter((z) => !shapes[z]);
  const parsedCups = parseAmount(watch('cups') as string);
  const cups = parsedCups.ok ? parsedCups.value : Number.NaN;
  const mold = molds.find((m) => m.id === watch('moldId'));
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
          neutral: shapes[NEUTRAL] ? { shape: shapes[NEUTRAL], ...(neutral?.L ? { L: neutral.L } : {}) } : undefined,
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

  const e = formState.errors;
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Log a batch" className="space-y-4">
      <div className="grid gap-3 sm:grid-cols-2">
        <Field label="Batch size (cups)" error={e.cups?.message}>
          <input type="text" inputMode="decimal" autoComplete="off" className={inputClass} {...register('cups')} />
        </Field>
        <Field label="Mold" hint={std.mold ? `The standard was poured in ${std.mold}.` : undefined}>
          <select className={inputClass} {...register('moldId')}>
            <option value="">—</option>
            {molds.map((m) => <option key={m.id} value={m.id}>{m.name}</option>)}
          </select>
        </Field>
        <Field
          label="Expected bait count (optional)"
          error={e.baitsExpected?.message}
          hint={yieldHint
            ? `Leave empty to use the mold’s yield: ${yieldHint.baits} baits (${yieldHint.shots} shots of ${yieldHint.mlPerShot.toFixed(1)} mL).`
            : 'Leave empty to work it out from the mold and the batch size.'}
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
          <p className="text-sm">The zones start where they were on the standard pour’s photo. If one does not sit on this batch’s baits, pick it and draw it again; mark the grey card too, if one is in frame.</p>
          <PhotoSampler
            src={`/api/photos/${photo.photoId}/image`}
            width={photo.width}
            height={photo.height}
            zones={zones}
            initialShapes={{ ...Object.fromEntries(std.zones.map((z) => [z.name, z.shape as Shape])), ...(neutral ? { [NEUTRAL]: neutral.shape } : {}) }}
            withNeutral
            onChange={onShapes}
          />
          <CardCarriedNote neutral={neutral} marked={Boolean(shapes[NEUTRAL])} />
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
