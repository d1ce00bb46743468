import { converter } from 'culori';
import { MODEL_BASIS_INVERSE, MODEL_WHITE } from './modelBasis';
import type { Lab, Vec3 } from './types';

const toLab = converter('lab65');

// The colorant model's channels → CIELAB (D65): the inverse of labToModelChannels.
export function modelChannelsToLab(ch: Vec3): Lab {
  const v = ch.map((x, i) => x * MODEL_WHITE[i]!);
  const [x, y, z] = MODEL_BASIS_INVERSE.map((row) => row[0] * v[0]! + row[1] * v[1]! + row[2] * v[2]!);
  const lab = toLab({ mode: 'xyz65', x: x!, y: y!, z: z! });
  return { l: lab.l, a: lab.a, b: lab.b };
}
