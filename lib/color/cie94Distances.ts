import type { Lab } from './types';

// CIE 116-1995 (CIE94): ΔE94 = sqrt(ΔL² + (ΔC / S_C)² + (ΔH / S_H)²), S_C = 1 + 0.045·C*ref,
// S_H = 1 + 0.015·C*ref, ΔH² = Δa² + Δb² − ΔC². With `every` > 1, only every n-th pixel.
export function cie94Distances(lab: Float32Array, ref: Lab, dist: Float32Array, every = 1) {
  const cRef = Math.hypot(ref.a, ref.b);
  const sc = 1 + 0.045 * cRef, sh = 1 + 0.015 * cRef;
  for (let i = 0, j = 0; i < dist.length; i += every, j += 3 * every) {
    const dl = lab[j] - ref.l, da = lab[j + 1] - ref.a, db = lab[j + 2] - ref.b;
    const dc = Math.sqrt(lab[j + 1] * lab[j + 1] + lab[j + 2] * lab[j + 2]) - cRef;
    const dh2 = Math.max(0, da * da + db * db - dc * dc);
    dist[i] = Math.sqrt(dl * dl + (dc / sc) * (dc / sc) + dh2 / (sh * sh));
  }
}
