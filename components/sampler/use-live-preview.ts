'use client';

import { useEffect, useRef, useState } from 'react';
import type { Shape } from '@/lib/color/types';
import { type Preview, previewRegion } from './preview-region';

export type { Preview };

const PREVIEW_WIDTH = 640;

// A quick reading while drawing, in the browser: the server's region measure on a downscaled
// copy of the photo (preview-region.ts), for each zone's shape, including the one being dragged.
// Shapes that did not change keep their reading; work is done at most once per animation frame.
// The server's measure (full resolution, the photo's own colour space, the grey card) is the one
// that counts and is saved.
export function useLivePreview(src: string, shapes: Record<string, Shape>) {
  const pixels = useRef<{ data: Uint8ClampedArray; width: number; height: number } | null>(null);
  const cache = useRef(new Map<string, { key: string; preview: Preview | null }>());
  const [ready, setReady] = useState(false);
  const [previews, setPreviews] = useState<Record<string, Preview>>({});

  useEffect(() => {
    const img = new Image();
    img.onload = () => {
      const scale = Math.min(1, PREVIEW_WIDTH / img.naturalWidth);
      const c = document.createElement('canvas');
      c.width = Math.max(1, Math.round(img.naturalWidth * scale));
      c.height = Math.max(1, Math.round(img.naturalHeight * scale));
      const ctx = c.getContext('2d', { willReadFrequently: true });
      if (!ctx) return;
      ctx.drawImage(img, 0, 0, c.width, c.height);
      pixels.current = { data: ctx.getImageData(0, 0, c.width, c.height).data, width: c.width, height: c.height };
      cache.current.clear();
      setReady(true);
    };
    img.src = src;
  }, [src]);

  useEffect(() => {
    const px = pixels.current;
    if (!ready || !px) return;
    const frame = requestAnimationFrame(() => {
      const next: Record<string, Preview> = {};
      for (const [zone, shape] of Object.entries(shapes)) {
        const key = JSON.stringify(shape);
        let hit = cache.current.get(zone);
        if (!hit || hit.key !== key) {
          hit = { key, preview: safePreview(px, shape) };
          cache.current.set(zone, hit);
        }
        if (hit.preview) next[zone] = hit.preview;
      }
      // A new object only when a reading changed, so an unchanged frame costs no render.
      setPreviews((prev) => {
        const same = Object.keys(next).length === Object.keys(prev).length && Object.entries(next).every(([z, p]) => prev[z] === p);
        return same ? prev : next;
      });
    });
    return () => cancelAnimationFrame(frame);
  }, [ready, shapes]);

  return previews;
}

// A preview is a help, never a blocker: if it cannot be worked out, the zone shows none.
function safePreview(px: { data: Uint8ClampedArray; width: number; height: number }, shape: Shape): Preview | null {
  try {
    return previewRegion(px.data, px.width, px.height, shape);
  } catch {
    return null;
  }
}
