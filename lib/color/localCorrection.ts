import { kubelkaMunkRatio } from './kubelkaMunkRatio';
import { labToModelChannels } from './labToModelChannels';
import { mixtureRatio } from './mixtureRatio';
import type { ColorantModel, DoseObservation, Vec3 } from './types';

/** Weight of a pour relative to the one after it: the latest pour counts most. */
const DECAY = 0.5;
/** No local correction larger than a factor e^±1.5 on K/S. */
const LIMIT = 1.5;

// The match's own pours correct the shop-wide model where this match is: per channel, the
// offset of log(K/S) between what its pours measured and what the model says for their doses,
// the latest pour weighted most (DECAY per pour back). A constant offset in log K/S is a secant
// (Broyden 1965) correction of order zero: it makes the model pass through the latest pour and
// keeps its slopes, which the shop's history pins down better than two or three pours can.
export function localCorrection(model: ColorantModel, pours: DoseObservation[]): Vec3 {
  const out: Vec3 = [0, 0, 0];
  if (pours.length === 0) return out;
  let total = 0;
  pours.forEach((p, i) => {
    const w = Math.pow(DECAY, pours.length - 1 - i);
    const rgb = labToModelChannels(p.lab);
    const ks = mixtureRatio(model, p.doses);
    for (let c = 0; c < 3; c++) out[c] += w * Math.log(kubelkaMunkRatio(rgb[c]!) / Math.max(1e-7, ks[c]!));
    total += w;
  });
  return out.map((v) => Math.max(-LIMIT, Math.min(LIMIT, v / total))) as Vec3;
}
