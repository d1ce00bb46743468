import { describe, expect, it } from 'vitest';
// colorjs.io ships the Bradford CAT and the CSS Color 4 D50↔D65 matrices: an independent source.
import { adapt as colorjsAdapt } from 'colorjs.io/src/CATs.js';
import {
  applyMat3,
  BRADFORD,
  BRADFORD_INVERSE,
  bradfordAdapt,
  bradfordMatrix,
  castAmbiguity,
  correctWhiteBalance,
  invertMat3,
  labToXyz,
  D50,
  D50_CIE15,
  D65,
  D65_CIE15,
  ILLUMINANT_A,
  multiplyMat3,
  SRGB_TO_XYZ,
  type Mat3,
  type Vec3,
  xyzToLab,
} from '@/lib/color';

const close = (a: number[][], b: number[][], tol: number) => {
  for (let r = 0; r < 3; r++) for (let c = 0; c < 3; c++) expect(Math.abs(a[r][c] - b[r][c])).toBeLessThan(tol);
};
const closeVec = (a: number[], b: number[], tol: number) => a.forEach((v, i) => expect(Math.abs(v - b[i])).toBeLessThan(tol));

describe('Bradford', () => {
  it('has the published M_BFD (ICC.1:2010 Annex E.3; Lindbloom, "Chromatic Adaptation")', () => {
    close(
      BRADFORD,
      [
        [0.8951, 0.2664, -0.1614],
        [-0.7502, 1.7135, 0.0367],
        [0.0389, -0.0685, 1.0296],
      ],
      1e-12,
    );
    // Inverse as printed by Lindbloom to 7 decimals.
    close(
      BRADFORD_INVERSE,
      [
        [0.9869929, -0.1470543, 0.1599627],
        [0.4323053, 0.5183603, 0.0492912],
        [-0.0085287, 0.0400428, 0.9684867],
      ],
      5e-8,
    );
  });

  it('D50 → D65 matches Lindbloom\'s printed Bradford matrix (his whites, 7 decimals)', () => {
    // Lindbloom, "Chromatic Adaptation" page: D50 → D65 Bradford, with D50 = (0.96422, 1, 0.82521)
    // and D65 = (0.95047, 1, 1.08883) — the CIE 15:2004 Table T.3 whites.
    close(
      bradfordMatrix(D50_CIE15, D65_CIE15),
      [
        [0.9555766, -0.0230393, 0.0631636],
        [-0.0282895, 1.0099416, 0.0210077],
        [0.0122982, -0.020483, 1.3299098],
      ],
      5e-7,
    );
  });

  it('D50 ↔ D65 matches colorjs.io (CSS Color 4 whites from chromaticities) within 1e-12', () => {
    close(bradfordMatrix(D50, D65), colorjsAdapt(D50, D65, 'Bradford') as Mat3, 1e-12);
    close(bradfordMatrix(D65, D50), colorjsAdapt(D65, D50, 'Bradford') as Mat3, 1e-12);
  });

  it('adapting a known white to D65 gives D65', () => {
    closeVec(bradfordAdapt(ILLUMINANT_A, ILLUMINANT_A, D65), D65, 1e-12);
    closeVec(bradfordAdapt(D50, D50, D65), D65, 1e-12);
    // A colour adapted there and back is itself.
    const x: Vec3 = [0.3, 0.25, 0.1];
    closeVec(bradfordAdapt(bradfordAdapt(x, ILLUMINANT_A, D65), D65, ILLUMINANT_A), x, 1e-12);
  });
});

describe('correctWhiteBalance', () => {
  const grey = 0.2; // linear sRGB of a mid-grey card
  const cast: Vec3 = [grey * 1.25, grey, grey * 0.7];

  it('turns the cast card neutral, keeping its luminance without a nominal L*', () => {
    const wb = correctWhiteBalance(cast);
    expect(wb.method).toBe('bradford');
    const card = xyzToLab(applyMat3(wb.toXyz, cast));
    const castLab = xyzToLab(applyMat3(SRGB_TO_XYZ, cast));
    expect(Math.abs(card.a)).toBeLessThan(1e-9);
    expect(Math.abs(card.b)).toBeLessThan(1e-9);
    expect(Math.abs(card.l - castLab.l)).toBeLessThan(1e-9);
  });

  it('with a nominal L* the card reads exactly (L*, 0, 0)', () => {
    const wb = correctWhiteBalance(cast, 50);
    const card = xyzToLab(applyMat3(wb.toXyz, cast));
    closeVec([card.l, card.a, card.b], [50, 0, 0], 1e-9);
  });

  it('leaves an already neutral D65 photo alone', () => {
    const wb = correctWhiteBalance([grey, grey, grey]);
    close(wb.toXyz, SRGB_TO_XYZ, 1e-12);
    close(multiplyMat3(wb.adaptation, SRGB_TO_XYZ), wb.toXyz, 1e-15);
  });

  it('refuses a patch that is black in a channel', () => {
    expect(() => correctWhiteBalance([0.2, 0.2, 0])).toThrow(RangeError);
  });
});

describe("correctWhiteBalance 'channel' (a per-channel scale of the photo's linear RGB)", () => {
  const scene: Vec3[] = [[0.2, 0.2, 0.2], [0.6, 0.15, 0.02], [0.05, 0.3, 0.1], [0.1, 0.1, 0.5]];
  const gain: Vec3 = [2.2, 1, 0.28]; // a strong warm camera gain error, channels of linear sRGB

  it('undoes a camera gain error exactly on every colour, not only on the card', () => {
    const photo = scene.map((v) => v.map((c, k) => c * gain[k] * 0.45) as Vec3);
    const wb = correctWhiteBalance(photo[0], 116 * Math.cbrt(0.2) - 16, SRGB_TO_XYZ, 'channel');
    expect(wb.method).toBe('channel');
    scene.forEach((v, i) => closeVec(applyMat3(wb.toXyz, photo[i]), applyMat3(SRGB_TO_XYZ, v), 1e-12));
  });

  it("and Bradford's correction of the same card leaves saturated colours off: castAmbiguity measures by how much", () => {
    const photo = scene.map((v) => v.map((c, k) => c * gain[k]) as Vec3);
    const ch = correctWhiteBalance(photo[0], undefined, SRGB_TO_XYZ, 'channel');
    const bf = correctWhiteBalance(photo[0], undefined, SRGB_TO_XYZ, 'bradford');
    const otherFromFirst = multiplyMat3(bf.toXyz, invertMat3(ch.toXyz));
    // The card itself reads the same under both.
    expect(castAmbiguity(xyzToLab(applyMat3(ch.toXyz, photo[0])), otherFromFirst).dE00).toBeLessThan(1e-9);
    for (const v of photo.slice(1)) {
      const first = xyzToLab(applyMat3(ch.toXyz, v));
      const { lab, dE00 } = castAmbiguity(first, otherFromFirst);
      closeVec([lab.l, lab.a, lab.b], Object.values(xyzToLab(applyMat3(bf.toXyz, v))), 1e-9);
      expect(dE00).toBeGreaterThan(1);
    }
  });
});

describe('labToXyz', () => {
  it('inverts xyzToLab (CIE 15:2004 §8.2.1) on both branches to 1e-12', () => {
    for (const xyz of [[0.3, 0.25, 0.1], [0.004, 0.003, 0.006], [0.95, 1, 1.09], [0.5, 0.2, 0.001]] as Vec3[]) {
      closeVec(labToXyz(xyzToLab(xyz)), xyz, 1e-12);
    }
  });
});
