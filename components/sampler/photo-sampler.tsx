'use client';

import { useEffect, useMemo, useRef, useState } from 'react';
import { useStore } from 'zustand';
import type { Shape } from '@/lib/color/types';
import { formatLab } from '@/lib/format';
import { defaultShape, describeShape, moveShape, resizeShape, shapeFromDrag, shapeLabelPoint, shapePath, toNormalised } from './geometry';
import { createSamplerStore, NEUTRAL } from './sampler-store';
import { SamplerToolbar } from './sampler-toolbar';
import { useLivePreview } from './use-live-preview';
import { useZoomGestures } from './use-zoom-gestures';

export { NEUTRAL };

type Props = {
  src: string;
  width: number;
  height: number;
  zones: string[];
  initialShapes?: Record<string, Shape>;
  withNeutral?: boolean;
  onChange: (shapes: Record<string, Shape>) => void;
};

// Draw one region per zone (and optionally the grey card) over a photo, with
// zoom and pan, on the neutral grey stage. Shapes are normalised to the photo
// as displayed (0..1). A live preview of each zone's colour is computed in the
// browser; the server measures for real when the maker confirms.
export function PhotoSampler({ src, width, height, zones, initialShapes, withNeutral = false, onChange }: Props) {
  const [store] = useState(() => createSamplerStore({ zones, shapes: initialShapes }));
  const s = useStore(store);
  const surface = useRef<SVGSVGElement>(null);
  const [drag, setDrag] = useState<{ from: [number, number]; to: [number, number] } | null>(null);
  const panFrom = useRef<{ x: number; y: number } | null>(null);
  const stage = useRef<HTMLDivElement>(null);
  const photo = useRef<HTMLImageElement>(null);
  const gestures = useZoomGestures(stage, store);
  const [fitScale, setFitScale] = useState<number | null>(null);
  const [said, setSaid] = useState('');
  // The photo's size on screen at "fit", against its own pixels: the true zoom.
  useEffect(() => {
    const img = photo.current;
    if (!img) return;
    const measure = () => setFitScale(img.offsetWidth > 0 ? img.offsetWidth / width : null);
    measure();
    const ro = new ResizeObserver(measure);
    ro.observe(img);
    return () => ro.disconnect();
  }, [width]);

  useEffect(() => onChange(s.shapes), [s.shapes, onChange]);

  const onPointerDown = (e: React.PointerEvent<SVGSVGElement>) => {
    if (!surface.current) return;
    e.currentTarget.setPointerCapture(e.pointerId);
    if (gestures.down(e)) {
      setDrag(null);
      panFrom.current = null;
      return;
    }
    if (s.tool === 'pan') panFrom.current = { x: e.clientX, y: e.clientY };
    else if (s.tool === 'polygon') s.addDraftPoint(toNormalised(surface.current, e.clientX, e.clientY));
    else {
      const p = toNormalised(surface.current, e.clientX, e.clientY);
      setDrag({ from: p, to: p });
    }
  };
  const onPointerMove = (e: React.PointerEvent<SVGSVGElement>) => {
    if (!surface.current || gestures.move(e)) return;
    if (panFrom.current) {
      s.panBy(e.clientX - panFrom.current.x, e.clientY - panFrom.current.y);
      panFrom.current = { x: e.clientX, y: e.clientY };
    } else if (drag) setDrag({ ...drag, to: toNormalised(surface.current, e.clientX, e.clientY) });
  };
  const onPointerUp = (e: React.PointerEvent<SVGSVGElement>) => {
    panFrom.current = null;
    if (gestures.up(e)) return setDrag(null);
    if (drag && (s.tool === 'rect' || s.tool === 'ellipse')) {
      const shape = shapeFromDrag(s.tool, drag.from, drag.to);
      if (shape) s.setShape(s.selected, shape);
    }
    setDrag(null);
  };
  const dragShape = useMemo(() => (drag && (s.tool === 'rect' || s.tool === 'ellipse') ? shapeFromDrag(s.tool, drag.from, drag.to) : null), [drag, s.tool]);
  // The preview follows the shape while it is dragged, so a region that reaches into another colour
  // is flagged before the pointer is let go.
  const liveShapes = useMemo(() => (dragShape ? { ...s.shapes, [s.selected]: dragShape } : s.shapes), [dragShape, s.shapes, s.selected]);
  const previews = useLivePreview(src, liveShapes);
  const labelOf = (zone: string) => (zone === NEUTRAL ? 'grey card' : zone);
  // Keyboard drawing: Enter places a region for the selected zone, arrows move
  // it, Shift+arrows resize it (Alt for fine steps); each change is announced.
  const onKeyDown = (e: React.KeyboardEvent<SVGSVGElement>) => {
    const current = s.shapes[s.selected];
    const step = e.altKey ? 0.002 : 0.01;
    let next: typeof current | null = null;
    if (e.key === 'Enter' || e.key === ' ') next = current ?? defaultShape(s.tool);
    else if (current && e.key.startsWith('Arrow')) {
      const dx = e.key === 'ArrowLeft' ? -step : e.key === 'ArrowRight' ? step : 0;
      const dy = e.key === 'ArrowUp' ? -step : e.key === 'ArrowDown' ? step : 0;
      next = e.shiftKey ? resizeShape(current, dx, dy) : moveShape(current, dx, dy);
    } else if (current && (e.key === 'Delete' || e.key === 'Backspace')) {
      e.preventDefault();
      s.setShape(s.selected, null);
      setSaid(`${labelOf(s.selected)} cleared`);
      return;
    }
    if (!next) return;
    e.preventDefault();
    s.setShape(s.selected, next);
    setSaid(`${labelOf(s.selected)}: ${describeShape(next)}`);
  };

  return (
    <div className="space-y-3">
      <SamplerToolbar store={store} zones={zones} withNeutral={withNeutral} fitScale={fitScale} />
      <div ref={stage} className="overflow-hidden rounded-md bg-stage p-3" data-testid="sampler-stage">
        <div className="relative mx-auto w-full" style={{ maxWidth: `min(100%, ${Math.round((width / height) * 70)}vh)` }}>
          <div style={{ transform: `translate(${s.panX}px, ${s.panY}px) scale(${s.zoom})`, transformOrigin: 'center' }} className="relative">
            {/* eslint-disable-next-line @next/next/no-img-element -- pixel-exact overlay on our own authenticated photo route; next/image would resize it */}
            <img ref={photo} src={src} alt="Photo being sampled" className="block h-auto w-full select-none" draggable={false} width={width} height={height} />
            <svg
              ref={surface}
              viewBox="0 0 1 1"
              preserveAspectRatio="none"
              className={`absolute inset-0 h-full w-full touch-none focus:outline focus:outline-4 focus:outline-accent ${s.tool === 'pan' ? 'cursor-grab' : 'cursor-crosshair'}`}
              onPointerDown={onPointerDown}
              onPointerMove={onPointerMove}
              onPointerUp={onPointerUp}
              onPointerCancel={onPointerUp}
              onDoubleClick={() => s.draft.length >= 3 && s.setShape(s.selected, { type: 'polygon', points: s.draft })}
              onKeyDown={onKeyDown}
              tabIndex={0}
              role="img"
              aria-label={`Drawing surface: drag to draw the selected zone (${labelOf(s.selected)}), or press Enter to place it, arrow keys to move it and Shift with the arrows to resize it`}
            >
              {Object.entries(s.shapes).map(([zone, shape]) => (
                <g key={zone}>
                  <path d={shapePath(shape)} fill="none" stroke="#000" strokeWidth={3} vectorEffect="non-scaling-stroke" />
                  <path d={shapePath(shape)} fill="none" stroke={zone === s.selected ? '#fff' : '#ddd'} strokeWidth={1.5} strokeDasharray={zone === NEUTRAL ? '4 3' : undefined} vectorEffect="non-scaling-stroke" />
                </g>
              ))}
              {dragShape ? <path d={shapePath(dragShape)} fill="none" stroke="#fff" strokeWidth={1.5} strokeDasharray="3 3" vectorEffect="non-scaling-stroke" /> : null}
              {s.draft.length ? <polyline points={s.draft.map((p) => p.join(',')).join(' ')} fill="none" stroke="#fff" strokeWidth={1.5} vectorEffect="non-scaling-stroke" /> : null}
            </svg>
            {Object.entries(s.shapes).map(([zone, shape]) => {
              const [x, y] = shapeLabelPoint(shape);
              return (
                <span key={zone} className="pointer-events-none absolute -translate-y-full rounded-sm bg-black/70 px-1 text-xs text-white" style={{ left: `${x * 100}%`, top: `${y * 100}%` }}>
                  {labelOf(zone)}{previews[zone]?.other ? ' ▲ two colours' : ''}
                </span>
              );
            })}
          </div>
        </div>
      </div>
      <p className="sr-only" aria-live="polite" data-testid="sampler-announce">{said}</p>
      <p className="text-xs text-ink-soft">Pinch or use the mouse wheel over the photo to zoom. Keyboard: Tab to the photo, Enter places the selected zone, arrows move it, Shift + arrows resize it.</p>
      <ul className="grid gap-2 sm:grid-cols-2" aria-label="Live preview">
        {[...zones, ...(withNeutral ? [NEUTRAL] : [])].map((zone) => {
          const p = previews[zone];
          return (
            <li key={zone} className="flex items-center gap-3 rounded-md border border-panel-line bg-white p-2 text-sm">
              <span className="h-10 w-10 shrink-0 rounded-sm border border-stage-rule" style={{ background: p?.hex ?? '#777777' }} aria-hidden />
              <span>
                <span className="block font-medium">{labelOf(zone)}</span>
                <span className="num block text-ink-soft">
                  {p ? `preview ${formatLab(p.lab)}` : 'not marked yet'}
                </span>
                {p?.other ? (
                  <span role="status" className="block font-medium text-band-off" data-testid={`other-warning-${zone}`}>
                    <span aria-hidden>▲ </span>This region reaches into another colour (about {Math.round(p.other.share * 100)} % of it): draw it inside one colour.
                  </span>
                ) : null}
              </span>
            </li>
          );
        })}
      </ul>
    </div>
  );
}
