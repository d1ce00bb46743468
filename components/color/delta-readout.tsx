import type { ReactNode } from 'react';
import type { Band } from '@/lib/color/types';
import { formatSigned } from '@/lib/format/figures';
import { BandBadge } from './band-badge';

export type ComponentUncertainty = { dL: number; dC: number; dH: number } | null | undefined;

// The readout beside the stage: ΔE00 large (two decimals) with its ± (about 95 %) when the
// measurement has one, its band, then ΔL*, ΔC*, ΔH* (ASTM D2244 signs), each with its ± when both
// colours were measured (differenceUncertainty), and the direction in words.
export function DeltaReadout({ d, direction, extra, uncertainty, components }: { d: { dE00: number; dL: number; dC: number; dH: number; band: Band }; direction?: string | null; extra?: ReactNode; uncertainty?: number | null; components?: ComponentUncertainty }) {
  return (
    <>
      <p className="flex flex-wrap items-baseline gap-3">
        <span className="num text-4xl font-semibold" aria-label={`ΔE00 ${d.dE00.toFixed(2)}`}>{d.dE00.toFixed(2)}</span>
        {uncertainty ? <span className="num text-xl text-ink-soft" aria-label={`plus or minus ${uncertainty.toFixed(2)}`} title="About 95 % sure the true difference lies within this">± {uncertainty.toFixed(2)}</span> : null}
        <span className="text-ink-soft">ΔE00</span>
        <BandBadge band={d.band} />
        {extra}
      </p>
      <p className="num">
        {/* Each figure stays on one line with its ±; a narrow screen breaks between them. */}
        <span className="whitespace-nowrap">ΔL* {formatSigned(d.dL, components?.dL)}</span> · <span className="whitespace-nowrap">ΔC* {formatSigned(d.dC, components?.dC)}</span> · <span className="whitespace-nowrap">ΔH* {formatSigned(d.dH, components?.dH)}</span>
      </p>
      {direction ? <p className="font-medium">{direction}</p> : null}
    </>
  );
}
