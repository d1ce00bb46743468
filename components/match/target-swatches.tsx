import type { TargetDetail } from '@/db/queries/matchDetail';
import { formatDeltaE, formatLab } from '@/lib/format';

// The target per zone on the grey stage, with its Lab (CIELAB, D65) and, with
// several reference photos, how far they disagree.
export function TargetSwatches({ target, photoCount }: { target: TargetDetail; photoCount: number }) {
  return (
    <div>
      <ul className="flex flex-wrap gap-4 rounded-md bg-stage p-4" aria-label="Target colours">
        {target.zones.map((z) => (
          <li key={z.name} className="w-36">
            <div className="h-20 rounded-sm border border-stage-rule" style={{ background: z.hex }} />
            <p className="mt-1 text-sm font-semibold text-white capitalize">{z.name}</p>
            <p className="num text-xs text-white">{formatLab(z.lab)}{z.uncertainty ? ` ± ${z.uncertainty.toFixed(2)} ΔE00` : ''}</p>
            {photoCount > 1 && z.spread !== null ? <p className="num text-xs text-white">photos differ by up to {formatDeltaE(z.spread)} ΔE00</p> : null}
          </li>
        ))}
      </ul>
      <p className="mt-1 text-xs text-ink-soft">
        CIELAB with the D65 white, measured from sRGB; flake and glare left out; ± about 95 % sure (JCGM 100:2008, k = 2). {photoCount > 1 ? `Mean of ${photoCount} reference photos.` : 'From one reference photo.'}
      </p>
    </div>
  );
}
