'use client';

import { converter, formatHex } from 'culori';
import { useEffect, useRef, useState } from 'react';
import { shapeSpans } from '@/lib/color/shapeSpans';
import type { Lab, Shape } from '@/lib/color/types';

const toLab = converter('lab65');
const PREVIEW_WIDTH = 640;
const MAX_SAMPLES = 6000;

export type Preview = { lab: Lab; hex: string; pixels: number };

// A quick estimate while drawing, in the browser: the per-channel median in
// CIELAB (culori lab65) of a subsample of the shape's pixels on a downscaled
// copy of the photo. The server's measure (flake and glare left out, full
// resolution, white balance) is the one that counts and is saved.
export function useLivePreview(src: string, shapes: Record<string, Shape>) {
  const canvas = useRef<HTMLCanvasElement | null>(null);
  const [ready, setReady] = useState(false);
  const [previews, setPreviews] = useState<Record<string, Preview>>({});

  useEffect(() => {
    const img = new Image();
    img.onload = () => {
      const scale = Math.min(1, PREVIEW_WIDTH / img.naturalWidth);
      const c = document.createElement('canvas');
      c.width = Math.max(1, Math.round(img.naturalWidth * scale));
      c.height = Math.max(1, Math.round(img.naturalHeight * scale));
      c.getContext('2d', { willReadFrequently: true })?.drawImage(img, 0, 0, c.width, c.height);
      canvas.current = c;
      setReady(true);
    };
    img.src = src;
  }, [src]);

  useEffect(() => {
    const c = canvas.current;
    if (!ready || !c) return;
    const ctx = c.getContext('2d', { willReadFrequently: true });
    if (!ctx) return;
    const data = ctx.getImageData(0, 0, c.width, c.height).data;
    const next: Record<string, Preview> = {};
    for (const [zone, shape] of Object.entries(shapes)) {
      const spans = shapeSpans(shape, c.width, c.height);
      let n = 0;
      for (let i = 0; i < spans.length; i += 3) n += spans[i + 2]! - spans[i + 1]!;
      if (n === 0) continue;
      const step = Math.max(1, Math.ceil(n / MAX_SAMPLES));
      const ls: number[] = [];
      const as: number[] = [];
      const bs: number[] = [];
      let k = 0;
      for (let i = 0; i < spans.length; i += 3) {
        const y = spans[i]!;
        for (let x = spans[i + 1]!; x < spans[i + 2]!; x++, k++) {
          if (k % step) continue;
          const o = (y * c.width + x) * 4;
          const lab = toLab({ mode: 'rgb', r: data[o]! / 255, g: data[o + 1]! / 255, b: data[o + 2]! / 255 });
          ls.push(lab.l);
          as.push(lab.a);
          bs.push(lab.b);
        }
      }
      const med = (v: number[]) => v.sort((p, q) => p - q)[v.length >> 1]!;
      const lab = { l: med(ls), a: med(as), b: med(bs) };
      next[zone] = { lab, hex: formatHex({ mode: 'lab65', ...lab }), pixels: n };
    }
    setPreviews(next);
  }, [ready, shapes]);

  return previews;
}
