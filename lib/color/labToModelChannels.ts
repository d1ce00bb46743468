import { converter } from 'culori';
import { MODEL_BASIS, MODEL_WHITE } from './modelBasis';
import type { Lab, Vec3 } from './types';

const toXyz = converter('xyz65');

// CIELAB (D65) → the colorant model's three channels: XYZ (culori's xyz65, CIE 15:2004) through
// the model's sensor basis (modelBasis.ts), scaled so the D65 white is 1 in each channel — a
// reflectance-like value per channel, which Kubelka–Munk mixing is then applied to.
export function labToModelChannels(lab: Lab): Vec3 {
  const c = toXyz({ mode: 'lab65', l: lab.l, a: lab.a, b: lab.b });
  const xyz = [c.x, c.y, c.z];
  return MODEL_BASIS.map((row, i) => (row[0] * xyz[0]! + row[1] * xyz[1]! + row[2] * xyz[2]!) / MODEL_WHITE[i]!) as Vec3;
}
