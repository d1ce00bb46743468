'use client';

import { useStore } from 'zustand';
import { MAX_ZOOM, MIN_ZOOM, NEUTRAL, type SamplerStore, type Tool } from './sampler-store';
import { polygonFromDraft } from './geometry';

const TOOLS: { id: Tool; label: string }[] = [
  { id: 'rect', label: 'Rectangle' },
  { id: 'ellipse', label: 'Ellipse' },
  { id: 'polygon', label: 'Polygon' },
  { id: 'pan', label: 'Move' },
];

const chip = (on: boolean) =>
  `min-h-tap rounded-md border px-3 text-sm font-medium ${on ? 'border-accent bg-accent text-white' : 'border-panel-line bg-white text-ink hover:bg-panel'}`;

// The zoom read-out tells the truth: "fit" while the photo is fitted to the
// stage, and otherwise the share of the photo's own pixels shown per screen pixel.
export function zoomReadout(zoom: number, fitScale: number | null): string {
  const real = fitScale === null ? null : `${Math.round(zoom * fitScale * 100)} %`;
  if (zoom <= 1.0001) return real ? `fit (${real})` : 'fit';
  return real ?? `${zoom.toFixed(1)} × fit`;
}

export function SamplerToolbar({ store, zones, withNeutral, fitScale = null }: { store: SamplerStore; zones: string[]; withNeutral: boolean; fitScale?: number | null }) {
  const s = useStore(store);
  const targets = withNeutral ? [...zones, NEUTRAL] : zones;
  const finishPolygon = () => {
    const shape = polygonFromDraft(s.draft);
    if (shape) s.setShape(s.selected, shape);
  };
  return (
    <div className="space-y-2">
      <div role="group" aria-label="Zone to mark" className="flex flex-wrap gap-2">
        {targets.map((z) => (
          <button key={z} type="button" aria-pressed={s.selected === z} onClick={() => s.select(z)} className={chip(s.selected === z)}>
            {z === NEUTRAL ? 'Grey card' : z}
            {s.shapes[z] ? ' ✓' : ''}
          </button>
        ))}
      </div>
      <div className="flex flex-wrap gap-2">
        <div role="group" aria-label="Tool" className="flex flex-wrap gap-2">
          {TOOLS.map((t) => (
            <button key={t.id} type="button" aria-pressed={s.tool === t.id} onClick={() => s.setTool(t.id)} className={chip(s.tool === t.id)}>
              {t.label}
            </button>
          ))}
        </div>
        <div role="group" aria-label="Zoom" className="flex gap-2">
          <button type="button" className={`${chip(false)} min-w-tap text-lg`} onClick={() => s.setZoom(s.zoom / 1.5)} disabled={s.zoom <= MIN_ZOOM} aria-label="Zoom out">−</button>
          <span className="num flex min-w-20 items-center justify-center text-sm" aria-live="polite" data-testid="zoom-readout">
            <span className="sr-only">Zoom: </span>{zoomReadout(s.zoom, fitScale)}
          </span>
          <button type="button" className={`${chip(false)} min-w-tap text-lg`} onClick={() => s.setZoom(s.zoom * 1.5)} disabled={s.zoom >= MAX_ZOOM} aria-label="Zoom in">+</button>
          <button type="button" className={`${chip(false)} min-w-tap`} onClick={s.resetView}>Fit</button>
        </div>
        {s.tool === 'polygon' ? (
          <button type="button" className={chip(false)} onClick={finishPolygon} disabled={s.draft.length < 3}>
            Finish polygon ({s.draft.length} points)
          </button>
        ) : null}
        <button type="button" className={chip(false)} onClick={() => s.setShape(s.selected, null)} disabled={!s.shapes[s.selected]}>
          Clear {s.selected === NEUTRAL ? 'grey card' : s.selected}
        </button>
      </div>
    </div>
  );
}
