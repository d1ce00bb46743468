'use client';

import { useCallback, useState } from 'react';
import useSWR from 'swr';
import { NEUTRAL, PhotoSampler } from '@/components/sampler/photo-sampler';
import { Button } from '@/components/ui/button';
import { Field, inputClass } from '@/components/ui/field';
import { FormError } from '@/components/ui/form-error';
import { PhotoDropzone } from '@/components/upload/photo-dropzone';
import type { Shape } from '@/lib/color/types';
import { apiFetch, swrFetcher } from '@/lib/http/client';
import type { UploadedPhoto } from '@/lib/uploads/limits';

type Row = { colorantId: string; colorant: string; kind: string; unit: string; swatches: number; observations: number; characterised: boolean; residual: number | null };
const KEY = '/api/colorants/characterisation';
const ZONES = ['swatch'];

// Which colorants the shop's colour model knows and how well, and a swatch to calibrate one:
// a known dose per cup in the base (none for the base itself), photographed with a grey card.
export function ColorantCalibration({ canCalibrate }: { canCalibrate: boolean }) {
  const { data, mutate } = useSWR<Row[]>(KEY, swrFetcher);
  const [colorantId, setColorantId] = useState('');
  const [dose, setDose] = useState('');
  const [photo, setPhoto] = useState<UploadedPhoto | null>(null);
  const [shapes, setShapes] = useState<Record<string, Shape>>({});
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const onChange = useCallback((s: Record<string, Shape>) => setShapes(s), []);
  const chosen = data?.find((r) => r.colorantId === colorantId);

  async function save() {
    if (!photo || !chosen || !shapes.swatch) return setError('Choose the colorant, add the photo and mark the swatch on it.');
    setBusy(true);
    setError(null);
    try {
      await apiFetch(`/api/colorants/${chosen.colorantId}/swatches`, {
        method: 'POST',
        body: JSON.stringify({ photoId: photo.photoId, shape: shapes.swatch, amount: chosen.kind === 'base' ? 0 : Number(dose.replace(',', '.')), neutral: shapes[NEUTRAL] ? { shape: shapes[NEUTRAL] } : undefined }),
      });
      setPhoto(null);
      setShapes({});
      setDose('');
      void mutate();
    } catch (e) {
      setError((e as Error).message);
    } finally {
      setBusy(false);
    }
  }

  return (
    <section aria-labelledby="calibration-h" className="mt-8 space-y-3">
      <h2 id="calibration-h" className="text-lg font-semibold">Colour model: what the next-pour hint knows</h2>
      <p className="text-sm text-ink-soft">A colorant is characterised once it was dosed in two logged colours (pours or swatches). The fit says how close the model comes to those colours.</p>
      <ul className="grid gap-1 text-sm" aria-label="Characterised colorants">
        {(data ?? []).map((r) => (
          <li key={r.colorantId}>
            <span className="font-medium">{r.colorant}</span>:{' '}
            {r.characterised
              ? `characterised from ${r.observations} logged colours (${r.swatches} swatches), fits to a median ${r.residual?.toFixed(1) ?? '—'} ΔE00`
              : `not yet characterised (${r.observations} logged colours); calibrate it with a swatch`}
          </li>
        ))}
      </ul>
      {canCalibrate ? (
        <div className="space-y-3 rounded-lg border border-panel-line bg-white p-4">
          <h3 className="font-semibold">Calibrate with a swatch</h3>
          <div className="grid gap-3 sm:grid-cols-2">
            <Field label="Colorant">
              <select className={inputClass} value={colorantId} onChange={(e) => setColorantId(e.target.value)}>
                <option value="">Choose…</option>
                {(data ?? []).map((r) => <option key={r.colorantId} value={r.colorantId}>{r.colorant}</option>)}
              </select>
            </Field>
            {chosen && chosen.kind !== 'base' ? (
              <Field label={`Dose per cup of base (${chosen.unit})`}>
                <input inputMode="decimal" className={inputClass} value={dose} onChange={(e) => setDose(e.target.value)} />
              </Field>
            ) : null}
          </div>
          {photo ? (
            <PhotoSampler src={`/api/photos/${photo.photoId}/image`} width={photo.width} height={photo.height} zones={ZONES} withNeutral onChange={onChange} />
          ) : (
            <PhotoDropzone endpoint="swatchPhoto" label="Add the photo of the swatch (grey card in frame)" onUploaded={setPhoto} />
          )}
          <FormError message={error} />
          <Button onClick={save} disabled={busy || !photo || !chosen}>{busy ? 'Measuring…' : 'Measure and save swatch'}</Button>
        </div>
      ) : null}
    </section>
  );
}
