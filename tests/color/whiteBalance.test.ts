import { describe, expect, it } from 'vitest';
import { applyMat3, deltaE2000, invertMat3, lightnessToY, type Mat3, multiplyMat3, srgbToLab, SRGB8_TO_LINEAR, type Vec3 } from '@/lib/color';
import { ImageError, measurePhoto } from '@/lib/image';
import { encode, rawImage, type Rgb } from './synth';

// IEC 61966-2-1 §5.3 encoding (linear → 8-bit), for building synthetic scenes in linear light.
const encode8 = (v: number) => 255 * (v <= 0.0031308 ? 12.92 * v : 1.055 * v ** (1 / 2.4) - 0.055);

describe('measurePhoto: neutral patch', () => {
  // Scene in linear sRGB: a grey card (linear 0.2) beside three bait colours. The "photo" is the
  // scene with a camera white-balance error: per-channel gains applied in a camera's own RGB.
  // CAMERA is a made-up sRGB → camera-RGB mixing (broader channels than sRGB's), so the cast is
  // exactly undone neither by Bradford nor by per-channel scaling in sRGB.
  const CAMERA: Mat3 = [
    [0.8, 0.15, 0.05],
    [0.1, 0.8, 0.1],
    [0.02, 0.13, 0.85],
  ];
  const castMatrix = (gain: Vec3) => multiplyMat3(invertMat3(CAMERA), multiplyMat3([[gain[0], 0, 0], [0, gain[1], 0], [0, 0, gain[2]]], CAMERA));
  const card = 0.2;
  const baits: Rgb[] = [
    [86, 140, 92],
    [200, 110, 40],
    [60, 90, 150],
  ];
  const scene = (gain: Vec3) => {
    const m = castMatrix(gain);
    return rawImage(200, 100, (x) => {
      const idx = Math.floor(x / 50);
      const lin: Vec3 = idx === 0 ? [card, card, card] : (baits[idx - 1].map((v) => SRGB8_TO_LINEAR[v]) as Vec3);
      return applyMat3(m, lin).map(encode8) as Rgb;
    });
  };
  const regions = baits.map((_, i) => ({ name: `bait${i}`, shape: { type: 'rect' as const, x: 0.25 * (i + 1) + 0.03, y: 0.1, w: 0.19, h: 0.8 } }));
  const cardShape = { type: 'rect' as const, x: 0.03, y: 0.1, w: 0.19, h: 0.8 };
  const cardL = 116 * Math.cbrt(card) - 16; // CIE 15:2004 L* of Y = 0.2 (grey, so Y = linear value)
  const warm: Vec3 = [1.1, 1.0, 0.85];

  it.each([
    ['warm', [1.1, 1.0, 0.85]],
    ['cool', [0.9, 1.0, 1.15]],
  ] as [string, Vec3][])('a %s cast is corrected (per channel, from the card) to within ΔE00 2.0 of the uncast truth', async (_name, gain) => {
    const png = await encode(scene(gain), 200, 100, 'png');
    const before = await measurePhoto(png, regions);
    const after = await measurePhoto(png, regions, { shape: cardShape });
    expect(after.whiteBalance.applied).toBe(true);
    expect(after.whiteBalance.method).toBe('channel');
    expect(Math.abs(after.whiteBalance.neutralLab!.b)).toBeGreaterThan(4); // the card shows the cast
    const truth = baits.map((rgb) => srgbToLab(...rgb));
    expect(Math.max(...before.regions.map((r, i) => deltaE2000(r.lab, truth[i])))).toBeGreaterThan(3); // the cast matters
    after.regions.forEach((r, i) => expect(deltaE2000(r.lab, truth[i])).toBeLessThanOrEqual(2.0));
  });

  it("with the card's nominal L* an exposure error is corrected as well (JPEG q90)", async () => {
    const jpg = await encode(scene([warm[0] * 0.7, warm[1] * 0.7, warm[2] * 0.7]), 200, 100, 'jpeg', 90);
    const out = await measurePhoto(jpg, regions, { shape: cardShape, L: cardL });
    baits.forEach((rgb, i) => expect(deltaE2000(out.regions[i].lab, srgbToLab(...rgb))).toBeLessThanOrEqual(2.0));
    expect(Math.abs(lightnessToY(cardL) - card)).toBeLessThan(1e-12);
  });

  it('refuses a blown-out card', async () => {
    const png = await encode(rawImage(60, 40, (x) => (x < 30 ? [255, 255, 255] : [90, 140, 80])), 60, 40, 'png');
    const err = await measurePhoto(png, [{ name: 'back', shape: { type: 'rect', x: 0.6, y: 0.1, w: 0.3, h: 0.8 } }], {
      shape: { type: 'rect', x: 0.1, y: 0.1, w: 0.3, h: 0.8 },
    }).catch((e: unknown) => e);
    expect((err as ImageError).kind).toBe('unusable_neutral');
  });
});
