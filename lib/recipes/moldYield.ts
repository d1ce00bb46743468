import { ML_PER_CUP } from './units';

export type MoldForYield = { cavities: number; mlPerCavity: number };

// Yield = batch volume ÷ (plastisol per cavity × cavities + sprue allowance):
// how many full shots of the mold one batch fills, and the baits they make.
export function moldYield(batchCups: number, mold: MoldForYield, sprueAllowanceMl = 0) {
  if (!(batchCups > 0)) throw new RangeError('batch size must be more than 0 cups');
  if (!(mold.cavities >= 1) || !(mold.mlPerCavity > 0)) throw new RangeError('a mold needs at least one cavity and a volume per cavity');
  if (!(sprueAllowanceMl >= 0)) throw new RangeError('sprue allowance cannot be negative');
  const batchMl = batchCups * ML_PER_CUP;
  const mlPerShot = mold.mlPerCavity * mold.cavities + sprueAllowanceMl;
  const shots = Math.floor(batchMl / mlPerShot + 1e-9);
  return { batchMl, mlPerShot, shots, baits: shots * mold.cavities, leftoverMl: batchMl - shots * mlPerShot };
}
