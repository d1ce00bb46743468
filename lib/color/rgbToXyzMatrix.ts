import type { Mat3, Vec3 } from './types';
import { invertMat3 } from './invertMat3';
import { D65 } from './whitePoints';

type Xy = [number, number];

// Linear-RGB → XYZ matrix from primary and white chromaticities: SMPTE RP 177-1993, §3.3
// (columns are the primaries' XYZ, scaled so that RGB = 1,1,1 gives the white).
export function rgbToXyzMatrix(red: Xy, green: Xy, blue: Xy, white: Vec3): Mat3 {
  const col = ([x, y]: Xy): Vec3 => [x / y, 1, (1 - x - y) / y];
  const r = col(red);
  const g = col(green);
  const b = col(blue);
  const inv = invertMat3([
    [r[0], g[0], b[0]],
    [r[1], g[1], b[1]],
    [r[2], g[2], b[2]],
  ]);
  const s = [0, 1, 2].map((i) => inv[i][0] * white[0] + inv[i][1] * white[1] + inv[i][2] * white[2]);
  return [
    [s[0] * r[0], s[1] * g[0], s[2] * b[0]],
    [s[0] * r[1], s[1] * g[1], s[2] * b[1]],
    [s[0] * r[2], s[1] * g[2], s[2] * b[2]],
  ];
}

// sRGB primaries (ITU-R BT.709) and D65 white: IEC 61966-2-1:1999, §5.1, Table 1.
// Rounded to four decimals this is the matrix printed in IEC 61966-2-1 §5.2 (equation 7).
export const SRGB_TO_XYZ: Mat3 = rgbToXyzMatrix([0.64, 0.33], [0.3, 0.6], [0.15, 0.06], D65);
