import type { FlakeGroup, Lab, Mat3, Vec3 } from './types';
import { applyMat3 } from './applyMat3';
import { baseBehindSmear } from './baseBehindSmear';
import { invertMat3 } from './invertMat3';
import { isOneSmearedFlake } from './isOneSmearedFlake';
import { labToXyz } from './labToXyz';
import type { FlakeInput } from './measureFlake';
import type { RegionLuma } from './regionLuma';
import type { RegionPixels } from './regionPixels';

/** The base behind the smear is used when its chroma is this sure (standard error, lumaChroma's 0..1 scale: half a code). Ours. */
const SE_MAX = 0.5 / 255;

type FlakeOf = (bx: Vec3, oneColour?: boolean, luma?: FlakeInput['luma']) => { base: Lab; bx: Vec3; area: number; groups: FlakeGroup[] };

/**
 * Flake where the photo's chroma is coarsely subsampled (JPEG 4:2:0 at low quality): the base from
 * behind the smear (baseBehindSmear), then the flake measured again against it; when that finds
 * several groups that are one flake colour as the smear leaves it (isOneSmearedFlake), as that one
 * colour. Null when the base cannot be told or the groups are truly several colours: measureRegion
 * keeps what it had.
 */
export function smearedFlake(rl: RegionLuma, truly: Uint8Array, rp: RegionPixels, toXyz: Mat3, flakeOf: FlakeOf) {
  const base = baseBehindSmear({ ycc: rl.ycc, cell: rp.cell, gridW: rp.gridW, gridH: rp.gridH, base: truly });
  if (!base || base.se > SE_MAX) return null;
  const bx = applyMat3(toXyz, base.rgb);
  const read = { ...rl.luma, base: base.y, noise: base.noise };
  const luma = () => read;
  const again = flakeOf(bx, false, luma);
  if (again.groups.length <= 1) return again;
  const toRgb = invertMat3(toXyz);
  return isOneSmearedFlake(base, again.groups.map((g) => applyMat3(toRgb, labToXyz(g.lab)))) ? flakeOf(bx, true, luma) : null;
}
