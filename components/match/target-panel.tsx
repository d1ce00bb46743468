'use client';

import { useCallback, useState } from 'react';
import { NEUTRAL, PhotoSampler } from '@/components/sampler/photo-sampler';
import { Button } from '@/components/ui/button';
import { Field, inputClass } from '@/components/ui/field';
import { FormError } from '@/components/ui/form-error';
import { PhotoDropzone } from '@/components/upload/photo-dropzone';
import type { MatchDetail } from '@/db/queries/matchDetail';
import type { Shape } from '@/lib/color/types';
import { apiFetch } from '@/lib/http/client';
import type { UploadedPhoto } from '@/lib/uploads/limits';

// Sampling the target: upload a reference photo, mark each zone (and a grey
// card if one is in frame), and let the server measure. Several reference
// photos average into the target.
export function TargetSampling({ match, onSaved }: { match: MatchDetail; onSaved: () => void }) {
  const [photo, setPhoto] = useState<UploadedPhoto | null>(null);
  const [shapes, setShapes] = useState<Record<string, Shape>>({});
  const [cardL, setCardL] = useState('');
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const onChange = useCallback((s: Record<string, Shape>) => setShapes(s), []);
  const missing = match.zones.filter((z) => !shapes[z]);

  async function save() {
    if (!photo) return;
    setBusy(true);
    setError(null);
    try {
      const neutral = shapes[NEUTRAL] ? { shape: shapes[NEUTRAL], ...(cardL ? { L: Number(cardL) } : {}) } : undefined;
      await apiFetch(`/api/matches/${match.id}/target`, {
        method: 'POST',
        body: JSON.stringify({ photoId: photo.photoId, zones: match.zones.filter((z) => shapes[z]).map((name) => ({ name, shape: shapes[name] })), neutral }),
      });
      setPhoto(null);
      setShapes({});
      onSaved();
    } catch (e) {
      setError((e as Error).message);
    } finally {
      setBusy(false);
    }
  }

  if (!photo) {
    return (
      <div className="space-y-2">
        <p className="text-sm text-ink-soft">Shoot the reference under the same light you will use for the pours, with a grey or white card in frame.</p>
        <PhotoDropzone endpoint="referencePhoto" label="Add a reference photo" onUploaded={setPhoto} />
      </div>
    );
  }
  return (
    <div className="space-y-3">
      <p className="text-sm">Pick a zone, then drag over it on the photo. Mark the grey card too, if there is one.</p>
      <PhotoSampler src={`/api/photos/${photo.photoId}/image`} width={photo.width} height={photo.height} zones={match.zones} withNeutral onChange={onChange} />
      {shapes[NEUTRAL] ? (
        <Field label="Grey card's nominal L* (optional)" hint="Leave empty to correct colour cast only; give it (e.g. 50 for an 18 % grey card) to correct exposure too.">
          <input type="number" min="1" max="100" step="0.1" value={cardL} onChange={(e) => setCardL(e.target.value)} className={inputClass} />
        </Field>
      ) : null}
      <FormError message={error} />
      <div className="flex flex-wrap gap-2">
        <Button onClick={save} disabled={busy || missing.length === match.zones.length}>
          {busy ? 'Measuring…' : 'Measure and save target'}
        </Button>
        <Button variant="secondary" onClick={() => setPhoto(null)}>Use another photo</Button>
      </div>
      {missing.length ? <p className="text-sm text-ink-soft">Not marked yet: {missing.join(', ')}.</p> : null}
    </div>
  );
}
