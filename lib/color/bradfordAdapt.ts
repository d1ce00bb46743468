import type { Vec3 } from './types';
import { applyMat3 } from './applyMat3';
import { bradfordMatrix } from './bradfordMatrix';

// Bradford chromatic adaptation of one XYZ colour from srcWhite to dstWhite (ICC.1:2010 Annex
// E.3; see bradfordMatrix.ts).
export function bradfordAdapt(xyz: Vec3, srcWhite: Vec3, dstWhite: Vec3): Vec3 {
  return applyMat3(bradfordMatrix(srcWhite, dstWhite), xyz);
}
