import { DeltaReadout } from '@/components/color/delta-readout';
import { InFrameLine, LightLine } from '@/components/color/measure-notes';
import { verdictWords } from '@/components/color/verdict-words';
import type { PourView } from '@/db/queries/pours';
import { differenceUncertainty } from '@/lib/color/differenceUncertainty';
import { formatShare } from '@/lib/format/figures';

type Zone = PourView['zones'][number];
const pct = (v: number) => formatShare(v);

// The figures beside the stage: ΔE00 large with its band, the components and
// the direction in words, the ± and the verdict it allows, the reference in frame, flake and glare
// of the trial, and how the light was handled.
export function ZoneReadout({ zone, targetFlake, targetFlakeUncertainty, targetUncertainty, tolerance }: { zone: Zone; targetFlake?: number | null; targetFlakeUncertainty?: number | null; targetUncertainty?: number | null; tolerance?: number }) {
  const flake = zone.flake as { coverage: number; coverageUncertainty?: number } | null;
  // ΔL*, ΔC*, ΔH* ± from both colours' own ± (samples measured before the ± existed have none).
  const components = zone.regionUncertainty && targetUncertainty ? differenceUncertainty(zone.target.lab, targetUncertainty, zone.lab, zone.regionUncertainty) : null;
  const verdict = tolerance === undefined ? null : verdictWords(zone.dE00, tolerance, zone.uncertainty);
  return (
    <div className="space-y-1 text-sm">
      <DeltaReadout d={zone} direction={zone.direction.text} uncertainty={zone.uncertainty} components={components} extra={verdict ? <span className="font-medium">{verdict.text}</span> : undefined} />
      <InFrameLine inFrame={zone.inFrame as never} />
      <p className="num text-ink-soft">
        Pour L* {zone.lab.l.toFixed(1)} a* {zone.lab.a.toFixed(1)} b* {zone.lab.b.toFixed(1)}{zone.regionUncertainty ? ` ± ${zone.regionUncertainty.toFixed(2)} ΔE00` : ''} · target L* {zone.target.lab.l.toFixed(1)} a* {zone.target.lab.a.toFixed(1)} b* {zone.target.lab.b.toFixed(1)}{targetUncertainty ? ` ± ${targetUncertainty.toFixed(2)} ΔE00` : ''}
      </p>
      <p className="num text-ink-soft">
        Flake {flake ? formatShare(flake.coverage, flake.coverageUncertainty) : '—'}{targetFlake === undefined || targetFlake === null ? '' : ` (target ${formatShare(targetFlake, targetFlakeUncertainty)})`} · glare {pct(zone.glare)} · spread {zone.spread.toFixed(1)} ΔE00
      </p>
      {zone.other ? <p role="alert" className="font-medium text-band-off">This region reaches into another colour: that part was left out. Draw it inside one colour.</p> : null}
      <LightLine light={zone.whiteBalance as never} />
    </div>
  );
}
