'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useCallback, useState } from 'react';
import { useForm } from 'react-hook-form';
import useSWR from 'swr';
import { z } from 'zod';
import { NEUTRAL, PhotoSampler } from '@/components/sampler/photo-sampler';
import { comparedZones, InFrameToggle, referenceZone, samplerZones } from '@/components/sampler/reference-in-frame';
import { Button } from '@/components/ui/button';
import { Field, inputClass } from '@/components/ui/field';
import { FormError } from '@/components/ui/form-error';
import { PhotoDropzone } from '@/components/upload/photo-dropzone';
import type { BatchView } from '@/db/queries/batches';
import type { PourView } from '@/db/queries/pours';
import type { Shape } from '@/lib/color/types';
import { apiFetch, swrFetcher } from '@/lib/http/client';
import { fromCups, moldYield, parseAmount, toCups, VOLUME_LABEL, zoneCupsProblem, type BatchPrefill, type VolumeUnit } from '@/lib/recipes';
import { CardCarriedNote } from '@/components/match/light-note';
import type { NeutralMark } from '@/db/queries/light';
import type { MatchDetail } from '@/db/queries/matchDetail';
import type { UploadedPhoto } from '@/lib/uploads/limits';
import { MAX_BAITS, MAX_BATCH_CUPS } from '@/lib/validations/production';
import { formatMl, trimmed } from '@/lib/format';
import { BatchRunFields } from './batch-run-fields';

const RETAINED = 'retained standard';
type Mold = { id: string; name: string; cavities: number; mlPerCavity: number };
type Colorant = { id: string; name: string; kind: string };
// Number inputs give strings: empty is "not given", anything else a number (NaN fails).
const blank = (v: unknown) => (v === '' || v === null || v === undefined ? undefined : Number(v));
// An amount as a maker says it ("1 1/2", "¾", "0,5"), through the one dose parser.
const spokenAmount = (v: unknown, ctx: z.RefinementCtx) => {
  if (v === '' || v === null || v === undefined) return undefined;
  const r = parseAmount(v as string | number);
  if (r.ok) return r.value;
  ctx.addIssue({ code: 'custom', message: r.message });
  return z.NEVER;
};
const typedAmount = (v: string | undefined) => {
  const r = parseAmount(v ?? '');
  return r.ok ? r.value : Number.NaN;
};
const count = (name: string) =>
  z.preprocess(blank, z.number().int(`${name} is a whole number`).min(0, `${name} cannot be negative`).max(MAX_BAITS).optional());
const formSchema = z.object({
  // In the shop's batch size unit; the cups ceiling is checked after conversion.
  size: z.preprocess(spokenAmount, z.number({ error: 'give the batch size' }).gt(0, 'more than 0')),
  moldId: z.string().optional(),
  baitsExpected: count('the expected count'),
  baits: count('the bait count'),
  notes: z.string().max(4000).optional(),
});
type Values = z.input<typeof formSchema>;

type Props = {
  matchId: string;
  standardPourId: string;
  sprueAllowanceMl: number;
  /** The shop's batch size unit (team setting). */
  volumeUnit?: VolumeUnit;
  /** From a run plan ("Log as batch"). */
  prefill?: BatchPrefill | null;
  onLogged: (batch: BatchView) => void;
};

// Logs one production batch of the standard: size, mold and bait counts, a QC
// photo with every zone of the standard marked (starting from the standard
// pour's shapes). The server measures it and judges pass or fail.
export function BatchForm(props: Props) {
  const { data: std, error } = useSWR<PourView>(`/api/pours/${props.standardPourId}`, swrFetcher);
  const { data: molds, error: moldError } = useSWR<Mold[]>('/api/molds', swrFetcher);
  const { data: colorants } = useSWR<Colorant[]>('/api/colorants', swrFetcher);
  const { data: match } = useSWR<MatchDetail>(`/api/matches/${props.matchId}`, swrFetcher);
  const failed = error ?? moldError;
  if (failed) return <p role="alert" className="text-band-off">Could not load the standard or the molds: {(failed as Error).message}</p>;
  // The form starts from the standard's mold, so its options must be there first.
  if (!std || !molds || !colorants || !match) return <p role="status" className="text-ink-soft">Loading the standard…</p>;
  return <BatchFormFields {...props} std={std} molds={molds} bases={colorants.filter((c) => c.kind === 'base')} neutral={match.lastNeutral} />;
}

function BatchFormFields({ matchId, sprueAllowanceMl, volumeUnit = 'cups', prefill, onLogged, std, molds, bases, neutral }: Props & { std: PourView; molds: Mold[]; bases: Colorant[]; neutral: NeutralMark | null }) {
  const unit = volumeUnit;
  const inUnit = (cups: number) => trimmed(fromCups(cups, unit));
  const [zoneSizes, setZoneSizes] = useState<Record<string, string>>(() => Object.fromEntries((prefill?.zoneCups ?? []).map((z) => [z.zone, inUnit(z.cups)])));
  const [plan, setPlan] = useState(prefill?.plan ?? null);
  const [baseId, setBaseId] = useState(bases[0]?.id ?? '');
  const [photo, setPhoto] = useState<UploadedPhoto | null>(null);
  const [shapes, setShapes] = useState<Record<string, Shape>>({});
  // The retained standard lying in the QC photo too, its zones marked: compared under the same light.
  const [withStd, setWithStd] = useState(false);
  const inFrame = withStd ? RETAINED : null;
  const [error, setError] = useState<string | null>(null);
  const onShapes = useCallback((s: Record<string, Shape>) => setShapes(s), []);
  const { register, handleSubmit, watch, formState } = useForm<Values>({
    resolver: zodResolver(formSchema),
    defaultValues: { size: prefill?.cups ? inUnit(prefill.cups) : '', moldId: prefill?.moldId ?? std.moldId ?? '', baitsExpected: '', baits: '', notes: '' },
  });
  const zones = std.zones.map((z) => z.name);
  const missing = zones.filter((z) => !shapes[z]);
  const cups = toCups(typedAmount(watch('size') as string | undefined), unit);
  const mold = molds.find((m) => m.id === watch('moldId'));
  const yieldHint = mold && cups > 0 && cups <= MAX_BATCH_CUPS ? moldYield(cups, mold, sprueAllowanceMl) : null;
  const planBaits = plan?.reduce((s, l) => s + l.shots * (molds.find((m) => m.id === l.moldId)?.cavities ?? 0), 0) ?? null;
  // Each side's cups, when any is typed: all of them, adding up to the batch.
  const typed = zones.some((z) => (zoneSizes[z] ?? '').trim() !== '');
  const zoneCups = typed ? zones.map((z) => ({ zone: z, cups: toCups(zoneSizes[z]?.trim() ? typedAmount(zoneSizes[z]) : 0, unit) })) : null;
  const splitError = zoneCups && cups > 0 ? zoneCupsProblem(cups, zones, zoneCups)?.replace(/^zoneCups: /, '').replace(/cups/g, VOLUME_LABEL[unit]) ?? null : null;
  const sizeError = cups > MAX_BATCH_CUPS ? `at most ${inUnit(MAX_BATCH_CUPS)} ${VOLUME_LABEL[unit]} (${MAX_BATCH_CUPS} cups)` : undefined;

  const onSubmit = handleSubmit(async (raw) => {
    setError(null);
    if (!photo) return setError('Add the QC photo of this batch first.');
    if (missing.length) return setError(`Mark every zone of the standard on the photo (missing: ${missing.join(', ')}).`);
    if (inFrame && !zones.some((z) => shapes[referenceZone(z, inFrame)])) return setError('Mark at least one zone of the retained standard in the photo, or untick it.');
    if (sizeError || splitError) return setError(sizeError ? `Batch size: ${sizeError}.` : `Each side’s cup: ${splitError}.`);
    const v = formSchema.parse(raw);
    try {
      const batch = await apiFetch<BatchView>(`/api/matches/${matchId}/batches`, {
        method: 'POST',
        body: JSON.stringify({
          photoId: photo.photoId,
          zones: comparedZones(zones, shapes, inFrame),
          neutral: shapes[NEUTRAL] ? { shape: shapes[NEUTRAL], ...(neutral?.L ? { L: neutral.L } : {}) } : undefined,
          cups: toCups(v.size, unit),
          zoneCups,
          plan,
          baseColorantId: baseId || null,
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
        <Field label={`Batch size (${VOLUME_LABEL[unit]})`} error={e.size?.message ?? sizeError} hint={unit !== 'cups' && cups > 0 ? `${trimmed(cups)} cups` : undefined}>
          <input type="text" inputMode="decimal" autoComplete="off" className={inputClass} {...register('size')} />
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
          hint={planBaits
            ? `Leave empty to use the run plan’s ${planBaits} baits.`
            : yieldHint
            ? `Leave empty to use the mold’s yield: ${yieldHint.baits} baits (${yieldHint.shots} shots of ${formatMl(yieldHint.mlPerShot)}).`
            : 'Leave empty to work it out from the mold and the batch size.'}
        >
          <input type="number" inputMode="numeric" step="1" min="0" className={inputClass} {...register('baitsExpected')} />
        </Field>
        <Field label="Actual bait count (optional)" error={e.baits?.message}>
          <input type="number" inputMode="numeric" step="1" min="0" className={inputClass} {...register('baits')} />
        </Field>
      </div>
      <BatchRunFields
        zones={zones} unit={unit} totalCups={cups > 0 ? cups : null} zoneSizes={zoneSizes}
        onZoneSize={(z, val) => setZoneSizes({ ...zoneSizes, [z]: val })} splitError={splitError}
        plan={plan} molds={molds} onDropPlan={() => setPlan(null)} bases={bases} baseId={baseId} onBase={setBaseId}
      />
      <Field label="Notes (optional)">
        <textarea rows={2} className={`${inputClass} py-2`} {...register('notes')} />
      </Field>
      {photo ? (
        <>
          <p className="text-sm">The zones start where they were on the standard pour’s photo. If one does not sit on this batch’s baits, pick it and draw it again; mark the grey card too, if one is in frame.</p>
          <InFrameToggle checked={withStd} onChange={setWithStd}>
            The retained standard lies in this photo too: mark its zones (compared under the same light, no card needed; shown beside the check against the standard and on the batch sheet)
          </InFrameToggle>
          <PhotoSampler
            key={withStd ? 'with-standard' : 'batch-only'}
            src={`/api/photos/${photo.photoId}/image`}
            width={photo.width}
            height={photo.height}
            zones={samplerZones(zones, inFrame)}
            initialShapes={{ ...Object.fromEntries(std.zones.map((z) => [z.name, z.shape as Shape])), ...(neutral ? { [NEUTRAL]: neutral.shape } : {}), ...shapes }}
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
