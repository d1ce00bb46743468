import { kubelkaMunkReflectance } from './kubelkaMunkReflectance';
import { modelChannelsToLab } from './modelChannelsToLab';
import { mixtureRatio } from './mixtureRatio';
import type { ColorantModel, Lab, Vec3 } from './types';

// The colour a recipe should give: Duncan's mixing (mixtureRatio) per linear sRGB channel, an
// optional local correction of log(K/S) per channel (from the match's own pours, see
// localCorrection), then the opaque-layer reflectance R∞ of Kubelka & Munk (1931) read as the
// channel's linear value and converted to CIELAB (D65).
export function predictMixture(model: ColorantModel, doses: Record<string, number>, correction: Vec3 = [0, 0, 0]): Lab {
  const ks = mixtureRatio(model, doses);
  const rgb = ks.map((x, c) => kubelkaMunkReflectance(x * Math.exp(correction[c]!))) as Vec3;
  return modelChannelsToLab(rgb);
}
