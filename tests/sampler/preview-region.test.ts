// The sampler's live check (components/sampler/preview-region.ts) on realistic synthetic photos
// (tests/support/photoGen.ts), decoded to RGBA as a browser canvas holds them: it warns of a
// second colour where a region crosses a laminate line, and not for shading or flake.
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { previewRegion } from '@/components/sampler/preview-region';
import { makePhoto, type PhotoSpec } from '../support/photoGen';
import { BASES, FLAKES } from '../support/photoCases';

async function preview(spec: PhotoSpec) {
  const truth = await makePhoto(spec);
  const { data, info } = await sharp(truth.file).ensureAlpha().raw().toBuffer({ resolveWithObject: true });
  return { truth, p: previewRegion(new Uint8ClampedArray(data.buffer, data.byteOffset, data.length), info.width, info.height, truth.region) };
}

const belly = { l: 92, a: -1, b: 6 };

describe('the live "reaches into another colour" check', () => {
  it('warns when the region runs 12 or 24 px over a laminate line, with the other colour and its share', async () => {
    let seed = 7100;
    for (const base of Object.values(BASES)) {
      for (const over of [12, 24]) {
        const { truth, p } = await preview({ seed: seed++, base, laminate: { other: belly, at: 130 - over, bleed: 2 }, blur: 0.6, format: 'jpeg90' });
        expect(p?.other, `${JSON.stringify(base)}, ${over} px over`).not.toBeNull();
        // The share is of the region's pixels; the blended line may add a row or two (tolerance 0.06).
        expect(Math.abs(p!.other!.share - truth.other), `share for ${over} px`).toBeLessThan(0.06);
        expect(Math.hypot(p!.other!.lab.l - belly.l, p!.other!.lab.a - belly.a, p!.other!.lab.b - belly.b)).toBeLessThan(6);
      }
    }
  }, 60_000);

  it('stays quiet inside one colour: plain, shaded ±20 %, 10 % black flake, 10 % silver flake', async () => {
    let seed = 7200;
    for (const base of Object.values(BASES)) {
      const specs: [string, PhotoSpec][] = [
        ['plain', { seed: seed++, base, blur: 0.6, format: 'jpeg90' }],
        ['shaded', { seed: seed++, base, shading: 0.2, blur: 0.6, format: 'jpeg90' }],
        ['black flake', { seed: seed++, base, flake: { colours: [FLAKES.black!.colour], coverage: 0.1, sizes: [1, 3] }, blur: 0.6, format: 'jpeg90' }],
        ['silver flake', { seed: seed++, base, flake: { colours: [FLAKES.silver!.colour], coverage: 0.1, sizes: [1, 3], sparkle: FLAKES.silver!.sparkle }, blur: 0.6, format: 'jpeg90' }],
      ];
      for (const [label, spec] of specs) {
        const { p } = await preview(spec);
        expect(p, label).not.toBeNull();
        expect(p!.other, `${label} on ${JSON.stringify(base)}`).toBeNull();
      }
    }
  }, 60_000);

  it('gives nothing for a shape that covers no pixel', () => {
    const rgba = new Uint8ClampedArray(10 * 10 * 4).fill(128);
    expect(previewRegion(rgba, 10, 10, { type: 'rect', x: 2, y: 2, w: 0.1, h: 0.1 })).toBeNull();
  });
});
