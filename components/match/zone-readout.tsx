import { DeltaReadout } from '@/components/color/delta-readout';
import { InFrameLine, LightLine } from '@/components/color/measure-notes';
import { verdictWords } from '@/components/color/verdict-words';
import type { PourView } from '@/db/queries/pours';

type Zone = PourView['zones'][number];
const pct = (v: number) => `${(v * 100).toFixed(1)} %`;

// The figures beside the stage: ΔE00 large with its band, the components and
// the direction in words, the ± and the verdict it allows, the reference in frame, flake and glare
// of the trial, and how the light was handled.
export function ZoneReadout({ zone, targetFlake, targetUncertainty, tolerance }: { zone: Zone; targetFlake?: number | null; targetUncertainty?: number | null; tolerance?: number }) {
  const flake = zone.flake as { coverage: number } | null;
  const verdict = tolerance === undefined ? null : verdictWords(zone.dE00, tolerance, zone.uncertainty);
  return (
    <div className="space-y-1 text-sm">
      <DeltaReadout d={zone} direction={zone.direction.text} uncertainty={zone.uncertainty} extra={verdict ? <span className="font-medium">{verdict.text}</span> : undefined} />
      <InFrameLine inFrame={zone.inFrame as never} />
      <p className="num text-ink-soft">
        Pour L* {zone.lab.l.toFixed(1)} a* {zone.lab.a.toFixed(1)} b* {zone.lab.b.toFixed(1)}{zone.regionUncertainty ? ` ± ${zone.regionUncertainty.toFixed(2)} ΔE00` : ''} · target L* {zone.target.lab.l.toFixed(1)} a* {zone.target.lab.a.toFixed(1)} b* {zone.target.lab.b.toFixed(1)}{targetUncertainty ? ` ± ${targetUncertainty.toFixed(2)} ΔE00` : ''}
      </p>
      <p className="num text-ink-soft">
        Flake {flake ? pct(flake.coverage) : '—'}{targetFlake === undefined || targetFlake === null ? '' : ` (target ${pct(targetFlake)})`} · glare {pct(zone.glare)} · spread {zone.spread.toFixed(1)} ΔE00
      </p>
      {zone.other ? <p role="alert" className="font-medium text-band-off">This region reaches into another colour: that part was left out. Draw it inside one colour.</p> : null}
      <LightLine light={zone.whiteBalance as never} />
    </div>
  );
}
