import type { ColorantModel, Vec3 } from './types';

// Two-constant Kubelka–Munk mixing (Duncan 1940): K and S of a mixture are the concentration-
// weighted sums of its components' K and S, per channel. The base plastisol is a component of
// fixed amount whose scattering is the unit, so with doses d_i per cup
//   (K/S)_mix = (k₀ + Σ d_i k_i) / (1 + Σ d_i s_i).
// A colorant the model does not know is ignored (the caller checks coverage first).
export function mixtureRatio(model: ColorantModel, doses: Record<string, number>): Vec3 {
  const out: Vec3 = [0, 0, 0];
  for (let c = 0; c < 3; c++) {
    let k = model.base[c]!;
    let s = 1;
    for (const [key, d] of Object.entries(doses)) {
      const co = model.colorants[key];
      if (!co || !(d > 0)) continue;
      k += d * co.k[c]!;
      s += d * co.s[c]!;
    }
    out[c] = k / s;
  }
  return out;
}
