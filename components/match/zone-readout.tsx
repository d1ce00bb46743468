import { BandBadge } from '@/components/color/band-badge';
import type { PourView } from '@/db/queries/pours';

type Zone = PourView['zones'][number];
const signed = (v: number) => `${v >= 0 ? '+' : '−'}${Math.abs(v).toFixed(2)}`;
const pct = (v: number) => `${(v * 100).toFixed(1)} %`;

// The figures beside the stage: ΔE00 large with its band, the components and
// the direction in words, flake and glare of the trial.
export function ZoneReadout({ zone, targetFlake }: { zone: Zone; targetFlake?: number | null }) {
  const flake = zone.flake as { coverage: number } | null;
  const light = (zone.whiteBalance as { applied?: boolean } | null)?.applied ? 'light corrected from the grey card' : 'no grey card: light not corrected';
  return (
    <div className="space-y-1 text-sm">
      <p className="flex items-baseline gap-3">
        <span className="num text-4xl font-semibold" aria-label={`ΔE00 ${zone.dE00.toFixed(2)}`}>{zone.dE00.toFixed(2)}</span>
        <span className="text-ink-soft">ΔE00</span>
        <BandBadge band={zone.band} />
      </p>
      <p className="num">ΔL* {signed(zone.dL)} · ΔC* {signed(zone.dC)} · ΔH* {signed(zone.dH)}</p>
      <p className="font-medium">{zone.direction.text}</p>
      <p className="num text-ink-soft">
        Pour L* {zone.lab.l.toFixed(1)} a* {zone.lab.a.toFixed(1)} b* {zone.lab.b.toFixed(1)} · target L* {zone.target.lab.l.toFixed(1)} a* {zone.target.lab.a.toFixed(1)} b* {zone.target.lab.b.toFixed(1)}
      </p>
      <p className="num text-ink-soft">
        Flake {flake ? pct(flake.coverage) : '—'}{targetFlake === undefined || targetFlake === null ? '' : ` (target ${pct(targetFlake)})`} · glare {pct(zone.glare)} · spread {zone.spread.toFixed(1)} ΔE00
      </p>
      <p className="text-ink-soft">Photo: {light}.</p>
    </div>
  );
}
