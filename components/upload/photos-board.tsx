'use client';

import { useState } from 'react';
import useSWRInfinite from 'swr/infinite';
import type { PhotoListItem } from '@/db/queries/photos';
import { Button } from '@/components/ui/button';
import { When } from '@/components/ui/when';
import { swrFetcher } from '@/lib/http/client';
import { formatBytes, PHOTO_ENDPOINTS, type PhotoEndpoint } from '@/lib/uploads/limits';
import { PhotoDropzone } from './photo-dropzone';
import { PhotoOnStage } from './photo-on-stage';
import { PhotoMatchLine, ReuseAsReference } from './photo-match-link';

const KIND_LABELS: Record<PhotoEndpoint, string> = {
  referencePhoto: 'Reference',
  pourPhoto: 'Test pour',
  batchPhoto: 'Batch',
  swatchPhoto: 'Swatch',
};

type Page = { items: PhotoListItem[]; nextCursor: string | null };
const PAGE = 48;
const pageKey = (i: number, previous: Page | null) =>
  i === 0 ? `/api/photos?limit=${PAGE}` : previous?.nextCursor ? `/api/photos?limit=${PAGE}&cursor=${encodeURIComponent(previous.nextCursor)}` : null;

// The team's photos, newest first, a page at a time, with a dropzone for makers and up (the
// server decides anyway).
export function PhotosBoard({ canUpload }: { canUpload: boolean }) {
  const [endpoint, setEndpoint] = useState<PhotoEndpoint>('referencePhoto');
  const { data: pages, error, isLoading, isValidating, mutate, size, setSize } = useSWRInfinite<Page>(pageKey, swrFetcher);
  const data = pages?.flatMap((p) => p.items);
  const more = Boolean(pages?.[pages.length - 1]?.nextCursor);

  return (
    <div className="space-y-6">
      {canUpload ? (
        <section aria-labelledby="upload-heading" className="space-y-3 rounded-lg border border-panel-line bg-white p-4">
          <h2 id="upload-heading" className="text-lg font-semibold">Upload a photo</h2>
          <fieldset>
            <legend className="mb-1 text-sm font-medium">What is it?</legend>
            <div className="flex flex-wrap gap-2">
              {(Object.keys(PHOTO_ENDPOINTS) as PhotoEndpoint[]).map((e) => (
                <button
                  key={e}
                  type="button"
                  aria-pressed={endpoint === e}
                  onClick={() => setEndpoint(e)}
                  className={`min-h-tap rounded-md border px-4 font-medium ${endpoint === e ? 'border-accent bg-accent-soft text-ink' : 'border-panel-line bg-white text-ink-soft hover:bg-panel'}`}
                >
                  {KIND_LABELS[e]}
                </button>
              ))}
            </div>
          </fieldset>
          <p className="text-sm text-ink-soft">Shoot reference and pours under the same light, with a grey or white card in frame.</p>
          <PhotoDropzone key={endpoint} endpoint={endpoint} label={`Add a ${KIND_LABELS[endpoint].toLowerCase()} photo`} onUploaded={() => void mutate()} />
        </section>
      ) : (
        <p className="rounded-md border border-panel-line bg-white p-3 text-sm text-ink-soft">Viewers see the team&apos;s photos; makers, leads and owners upload them.</p>
      )}

      <section aria-labelledby="recent-heading">
        <h2 id="recent-heading" className="mb-2 text-lg font-semibold">Recent photos</h2>
        {error ? <p role="alert" className="text-band-off">Could not load photos: {(error as Error).message}</p> : null}
        {isLoading ? <p role="status" className="text-ink-soft">Loading photos…</p> : null}
        {data && data.length === 0 ? <p className="rounded-md border border-dashed border-panel-line bg-white p-4 text-ink-soft">No photos yet.</p> : null}
        {data && data.length > 0 ? (
          <ul className="grid grid-cols-1 gap-4 sm:grid-cols-2 lg:grid-cols-3" aria-label="Recent photos">
            {data.map((p) => (
              <li key={p.id} className="overflow-hidden rounded-lg border border-panel-line bg-white">
                <PhotoOnStage photoId={p.id} alt={`${p.kind} photo ${p.fileName}`} />
                <div className="space-y-0.5 p-3 text-sm">
                  <p className="break-all font-medium">{p.fileName}</p>
                  <p className="num text-ink-soft">
                    {p.kind} · {p.width} × {p.height} px · {formatBytes(p.size)} · <When at={p.createdAt} />
                  </p>
                  <PhotoMatchLine link={p.match} />
                  {canUpload ? <ReuseAsReference photoId={p.id} current={p.match} /> : null}
                </div>
              </li>
            ))}
          </ul>
        ) : null}
        {more ? (
          <div className="mt-4">
            <Button variant="secondary" disabled={isValidating} onClick={() => void setSize(size + 1)}>{isValidating ? 'Loading…' : 'Show older photos'}</Button>
          </div>
        ) : null}
      </section>
    </div>
  );
}
