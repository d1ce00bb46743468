import type { Band } from '@/lib/color/types';
import { BandBadge } from './band-badge';

type InFrame = { dE00: number; band: Band; uncertainty?: number } | null | undefined;
type Light = { applied?: boolean; cast?: number; warning?: string | null } | null | undefined;

// The comparison with the physical reference lying in the same photo (same light, no card needed).
export function InFrameLine({ inFrame }: { inFrame: InFrame }) {
  if (!inFrame) return null;
  return (
    <p className="flex flex-wrap items-baseline gap-2">
      <span className="text-ink-soft">Against the reference in frame:</span>
      <span className="num font-semibold">{inFrame.dE00.toFixed(2)}{inFrame.uncertainty ? ` ± ${inFrame.uncertainty.toFixed(2)}` : ''} ΔE00</span>
      <BandBadge band={inFrame.band} />
    </p>
  );
}

// How the light was handled: corrected from the card (and how far off grey the card was), or not,
// with the warning when the light was too far off for a trustworthy reading.
export function LightLine({ light }: { light: Light }) {
  const cast = light?.cast;
  return (
    <>
      <p className="text-ink-soft">
        Photo: {light?.applied ? `light corrected from the grey card${cast !== undefined ? ` (the card read ${cast.toFixed(1)} ΔE00 off grey)` : ''}` : 'no grey card: light not corrected'}.
      </p>
      {light?.warning ? <p role="alert" className="font-medium text-band-off">{light.warning}</p> : null}
    </>
  );
}
