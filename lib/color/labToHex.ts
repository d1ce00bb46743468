import { formatHex } from 'culori';
import type { Lab } from './types';

// CIELAB D65 → #rrggbb through culori (lab65 → sRGB, IEC 61966-2-1). Colours outside the sRGB
// gamut are clipped per channel by culori's formatter: the hex is for display, the Lab is the
// measurement.
export function labToHex(lab: Lab): string {
  return formatHex({ mode: 'lab65', l: lab.l, a: lab.a, b: lab.b });
}
