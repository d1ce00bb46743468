'use client';

import { useCallback, useEffect, useState } from 'react';
import { NEUTRAL, PhotoSampler } from '@/components/sampler/photo-sampler';
import { Button } from '@/components/ui/button';
import { Field, inputClass } from '@/components/ui/field';
import { FormError } from '@/components/ui/form-error';
import { PhotoDropzone } from '@/components/upload/photo-dropzone';
import type { MatchDetail } from '@/db/queries/matchDetail';
import type { Shape } from '@/lib/color/types';
import { apiFetch } from '@/lib/http/client';
import type { UploadedPhoto } from '@/lib/uploads/limits';

// Marks drawn on a draft photo, kept in this browser so a reload does not wipe them.
const marksKey = (matchId: string, photoId: string) => `pourproof:draft-marks:${matchId}:${photoId}`;
function readMarks(matchId: string, photoId: string): Record<string, Shape> | undefined {
  try {
    const raw = window.localStorage.getItem(marksKey(matchId, photoId));
    return raw ? (JSON.parse(raw) as Record<string, Shape>) : undefined;
  } catch {
    return undefined;
  }
}

// Sampling the target: upload a reference photo, mark each zone (and a grey
// card if one is in frame), and let the server measure. Several reference
// photos average into the target. The uploaded photo is attached to the match
// at once as a draft (POST …/draft-photo), so it survives a reload.
export function TargetSampling({ match, onSaved, onReleased }: { match: MatchDetail; onSaved: () => void; onReleased?: () => void }) {
  const [photo, setPhoto] = useState<Pick<UploadedPhoto, 'photoId' | 'width' | 'height'> | null>(match.draft);
  // This renders only in the browser (the match comes from SWR), so the marks
  // kept in localStorage can be read as the state starts.
  const [initial, setInitial] = useState<Record<string, Shape> | undefined>(() =>
    match.draft && typeof window !== 'undefined' ? readMarks(match.id, match.draft.photoId) : undefined,
  );
  const [shapes, setShapes] = useState<Record<string, Shape>>({});
  const [cardL, setCardL] = useState('');
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const onChange = useCallback((s: Record<string, Shape>) => setShapes(s), []);
  const missing = match.zones.filter((z) => !shapes[z]);

  useEffect(() => {
    if (!photo) return;
    try {
      window.localStorage.setItem(marksKey(match.id, photo.photoId), JSON.stringify(shapes));
    } catch {
      // Private browsing or a full store: the marks just are not kept.
    }
  }, [match.id, photo, shapes]);

  async function attach(p: UploadedPhoto) {
    setInitial(undefined);
    setPhoto(p);
    setError(null);
    try {
      await apiFetch(`/api/matches/${match.id}/draft-photo`, { method: 'POST', body: JSON.stringify({ photoId: p.photoId }) });
    } catch (e) {
      setError(`The photo is uploaded, but could not be kept with this match: ${(e as Error).message}`);
    }
  }

  async function release() {
    const old = photo;
    setPhoto(null);
    setShapes({});
    if (old) window.localStorage.removeItem(marksKey(match.id, old.photoId));
    try {
      await apiFetch(`/api/matches/${match.id}/draft-photo`, { method: 'DELETE' });
      onReleased?.();
    } catch (e) {
      setError((e as Error).message);
    }
  }

  async function save() {
    if (!photo) return;
    setBusy(true);
    setError(null);
    try {
      const neutral = shapes[NEUTRAL] ? { shape: shapes[NEUTRAL], ...(cardL ? { L: Number(cardL) } : {}) } : undefined;
      await apiFetch(`/api/matches/${match.id}/target`, {
        method: 'POST',
        body: JSON.stringify({ photoId: photo.photoId, zones: match.zones.map((name) => ({ name, shape: shapes[name] })), neutral }),
      });
      window.localStorage.removeItem(marksKey(match.id, photo.photoId));
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
        <PhotoDropzone endpoint="referencePhoto" label="Add a reference photo" onUploaded={(p) => void attach(p)} />
        <FormError message={error} />
      </div>
    );
  }
  return (
    <div className="space-y-3">
      <p className="text-sm">Pick a zone, then drag over it on the photo. Mark the grey card too, if there is one. This photo is kept with the match until you save the target.</p>
      <PhotoSampler key={photo.photoId} src={`/api/photos/${photo.photoId}/image`} width={photo.width} height={photo.height} zones={match.zones} initialShapes={initial} withNeutral onChange={onChange} />
      {shapes[NEUTRAL] ? (
        <Field label="Grey card's nominal L* (optional)" hint="Leave empty to correct colour cast only; give it (e.g. 50 for an 18 % grey card) to correct exposure too.">
          <input type="number" min="1" max="100" step="0.1" value={cardL} onChange={(e) => setCardL(e.target.value)} className={inputClass} />
        </Field>
      ) : null}
      <FormError message={error} />
      {missing.length ? (
        <p id="target-missing" className="text-sm font-medium">Mark every zone before measuring. Not marked yet: {missing.join(', ')}.</p>
      ) : null}
      <div className="flex flex-wrap gap-2">
        <Button onClick={save} disabled={busy || missing.length > 0} aria-describedby={missing.length ? 'target-missing' : undefined}>
          {busy ? 'Measuring…' : 'Measure and save target'}
        </Button>
        <Button variant="secondary" onClick={() => void release()}>Use another photo</Button>
      </div>
    </div>
  );
}
