import type { Mat3, Vec3 } from './types';
import { invertMat3 } from './invertMat3';
import { multiplyMat3 } from './multiplyMat3';

// Bradford cone-response matrix M_BFD (K. M. Lam, thesis, University of Bradford, 1985), as
// published in ICC.1:2010 Annex E.3 (linearised Bradford) and on B. Lindbloom's "Chromatic
// Adaptation" page (brucelindbloom.com).
export const BRADFORD: Mat3 = [
  [0.8951, 0.2664, -0.1614],
  [-0.7502, 1.7135, 0.0367],
  [0.0389, -0.0685, 1.0296],
];
export const BRADFORD_INVERSE: Mat3 = invertMat3(BRADFORD);

// Von Kries-type adaptation in Bradford cone space (ICC.1:2010 Annex E.3):
// M = M_BFD⁻¹ · diag(ρ_d/ρ_s, γ_d/γ_s, β_d/β_s) · M_BFD, with ρ, γ, β the cone responses
// M_BFD · white. Whites are XYZ; their scale matters (a brighter destination also scales Y).
export function bradfordMatrix(srcWhite: Vec3, dstWhite: Vec3): Mat3 {
  const cone = (w: Vec3) => BRADFORD.map((row) => row[0] * w[0] + row[1] * w[1] + row[2] * w[2]);
  const s = cone(srcWhite);
  const d = cone(dstWhite);
  const scale: Mat3 = [
    [d[0] / s[0], 0, 0],
    [0, d[1] / s[1], 0],
    [0, 0, d[2] / s[2]],
  ];
  return multiplyMat3(BRADFORD_INVERSE, multiplyMat3(scale, BRADFORD));
}
