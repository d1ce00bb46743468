'use client';

import { type RefObject, useEffect, useRef } from 'react';
import { MAX_ZOOM, MIN_ZOOM, type SamplerStore } from './sampler-store';

// Wheel and two-finger pinch zoom over the sampler's photo. The wheel zooms
// while there is room to zoom that way and otherwise lets the page scroll, so
// the photo never traps the scroll. A pinch is two pointers on the drawing
// surface (touch-action: none there, so the browser leaves them to us).
export function useZoomGestures(stage: RefObject<HTMLElement | null>, store: SamplerStore) {
  useEffect(() => {
    const el = stage.current;
    if (!el) return;
    const onWheel = (e: WheelEvent) => {
      const { zoom, setZoom } = store.getState();
      const factor = Math.exp(-e.deltaY * (e.deltaMode === 1 ? 0.05 : 0.002));
      if ((factor > 1 && zoom >= MAX_ZOOM) || (factor < 1 && zoom <= MIN_ZOOM)) return;
      e.preventDefault();
      setZoom(zoom * factor);
    };
    el.addEventListener('wheel', onWheel, { passive: false });
    return () => el.removeEventListener('wheel', onWheel);
  }, [stage, store]);

  const pointers = useRef(new Map<number, { x: number; y: number }>());
  const pinch = useRef<{ distance: number; zoom: number } | null>(null);
  const spread = () => {
    const [a, b] = [...pointers.current.values()];
    return a && b ? Math.hypot(a.x - b.x, a.y - b.y) : 0;
  };
  return {
    /** True while two fingers are down: the caller should not draw. */
    down(e: React.PointerEvent) {
      pointers.current.set(e.pointerId, { x: e.clientX, y: e.clientY });
      if (pointers.current.size === 2) pinch.current = { distance: spread(), zoom: store.getState().zoom };
      return pointers.current.size >= 2;
    },
    move(e: React.PointerEvent) {
      if (!pointers.current.has(e.pointerId)) return false;
      pointers.current.set(e.pointerId, { x: e.clientX, y: e.clientY });
      if (!pinch.current || pointers.current.size < 2) return false;
      const d = spread();
      if (pinch.current.distance > 0 && d > 0) store.getState().setZoom((pinch.current.zoom * d) / pinch.current.distance);
      return true;
    },
    up(e: React.PointerEvent) {
      pointers.current.delete(e.pointerId);
      const was = pinch.current !== null;
      if (pointers.current.size < 2) pinch.current = null;
      return was;
    },
  };
}
