import { DeltaReadout } from '@/components/color/delta-readout';
import type { PourView } from '@/db/queries/pours';

type Zone = PourView['zones'][number];
const pct = (v: number) => `${(v * 100).toFixed(1)} %`;

// The figures beside the stage: ΔE00 large with its band, the components and
// the direction in words, flake and glare of the trial.
export function ZoneReadout({ zone, targetFlake }: { zone: Zone; targetFlake?: number | null }) {
  const flake = zone.flake as { coverage: number } | null;
  const light = (zone.whiteBalance as { applied?: boolean } | null)?.applied ? 'light corrected from the grey card' : 'no grey card: light not corrected';
  return (
    <div className="space-y-1 text-sm">
      <DeltaReadout d={zone} direction={zone.direction.text} />
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
