'use client';

import { useCallback, useState } from 'react';
import { PhotoSampler, NEUTRAL } from '@/components/sampler/photo-sampler';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import type { Shape } from '@/lib/color/types';
import { ApiClientError } from '@/lib/http/client';
import { MeasureReadout, type MeasureResult } from './measure-readout';

const ZONE = 'region';

// Measure any photo without keeping it: the file stays in the browser until
// "Measure", which sends it with the drawn region to /api/measure.
export function PhotoCheck() {
  const [file, setFile] = useState<File | null>(null);
  const [size, setSize] = useState<{ w: number; h: number } | null>(null);
  const [url, setUrl] = useState<string | null>(null);
  const [shapes, setShapes] = useState<Record<string, Shape>>({});
  const [result, setResult] = useState<MeasureResult | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const onShapes = useCallback((s: Record<string, Shape>) => setShapes(s), []);


  async function run() {
    if (!file || !shapes[ZONE]) return;
    setBusy(true);
    setError(null);
    const form = new FormData();
    form.set('image', file);
    form.set('regions', JSON.stringify([{ name: ZONE, shape: shapes[ZONE] }]));
    if (shapes[NEUTRAL]) form.set('neutral', JSON.stringify({ shape: shapes[NEUTRAL] }));
    try {
      const res = await fetch('/api/measure', { method: 'POST', body: form });
      const body = await res.json();
      if (!res.ok) throw new ApiClientError(res.status, body?.error?.code ?? 'error', body?.error?.message ?? `Failed (${res.status})`);
      setResult(body as MeasureResult);
    } catch (e) {
      setError((e as Error).message);
    } finally {
      setBusy(false);
    }
  }

  // The chosen file as a URL the sampler can show (the last one let go of),
  // and its size once the browser has opened it.
  const choose = (f: File | null) => {
    setResult(null);
    setError(null);
    setSize(null);
    setFile(f);
    if (url) URL.revokeObjectURL(url);
    const next = f ? URL.createObjectURL(f) : null;
    setUrl(next);
    if (!next) return;
    const img = new Image();
    img.onload = () => setSize({ w: img.naturalWidth, h: img.naturalHeight });
    img.onerror = () => setError('This file does not open as a picture here. Use a JPEG, PNG or WebP photo.');
    img.src = next;
  };

  return (
    <section aria-labelledby="photo-check-h" className="space-y-3 rounded-lg border border-panel-line bg-white p-4">
      <h2 id="photo-check-h" className="text-lg font-semibold">Measure a photo</h2>
      <p className="text-sm text-ink-soft">Nothing is stored. Draw a region over the colour; mark a grey card too if one is in the photo.</p>
      <label className="flex min-h-tap cursor-pointer items-center justify-center rounded-md border-2 border-dashed border-panel-line bg-panel px-4 py-6 text-center font-medium">
        {file ? `Photo: ${file.name} — choose another` : 'Choose or drop a photo (JPEG, PNG or WebP)'}
        <input
          data-testid="check-photo-input"
          type="file"
          accept="image/jpeg,image/png,image/webp"
          className="sr-only"
          onChange={(e) => choose(e.target.files?.[0] ?? null)}
        />
      </label>
      <label className="flex min-h-tap cursor-pointer items-center justify-center gap-2 rounded-md border border-panel-line bg-white px-4 font-medium hover:bg-panel">
        Take a photo with the camera
        {/* On a phone, the back camera straight away (HTML Media Capture, W3C). */}
        <input type="file" accept="image/*" capture="environment" className="sr-only" data-testid="check-camera-input" onChange={(e) => choose(e.target.files?.[0] ?? null)} />
      </label>
      {url && size ? <PhotoSampler key={url} src={url} width={size.w} height={size.h} zones={[ZONE]} withNeutral onChange={onShapes} /> : null}
      <FormError message={error} />
      {file ? <Button onClick={run} disabled={busy || !shapes[ZONE]}>{busy ? 'Measuring…' : 'Measure'}</Button> : null}
      {result ? <MeasureReadout result={result} /> : null}
    </section>
  );
}
