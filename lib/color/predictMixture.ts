import { kubelkaMunkReflectance } from './kubelkaMunkReflectance';
import { mixtureRatio } from './mixtureRatio';
import { modelChannelsToLab } from './modelChannelsToLab';
import type { ColorantModel, Lab, LocalCorrection, Vec3 } from './types';

// The colour a recipe should give: Duncan's mixing (mixtureRatio) per model channel, with the
// match's local correction if any (doses scaled, log(K/S) offset per channel: localCorrection),
// then the opaque-layer reflectance R∞ of Kubelka & Munk (1931) read as the channel's value and
// converted to CIELAB (D65).
export function predictMixture(model: ColorantModel, doses: Record<string, number>, correction?: LocalCorrection): Lab {
  let d = doses;
  if (correction && correction.scale !== 1) d = Object.fromEntries(Object.entries(doses).map(([k, v]) => [k, v * correction.scale]));
  const ks = mixtureRatio(model, d);
  const off = correction?.offset ?? [0, 0, 0];
  const ch = ks.map((x, c) => kubelkaMunkReflectance(x * Math.exp(off[c]!))) as Vec3;
  return modelChannelsToLab(ch);
}
