'use client';

import Link from 'next/link';
import { useState } from 'react';
import { DeltaReadout } from '@/components/color/delta-readout';
import { LightNote } from '@/components/match/light-note';
import { formatLab, formatShare } from '@/lib/format';
import { InFrameLine, LightLine } from '@/components/color/measure-notes';
import { verdictWords } from '@/components/color/verdict-words';
import { SurroundToggle, SwatchPair, type Surround } from '@/components/color/swatch-pair';
import { RegionsOnPhoto } from '@/components/match/regions-on-photo';
import type { BatchView } from '@/db/queries/batches';
import type { Shape } from '@/lib/color/types';
import { PassBadge } from './pass-badge';
import { price } from './sheet-production';
import { useShopTimeZone } from '@/components/ui/when';
import { formatWhen } from '@/lib/format/dates';

const lab = formatLab;

// One production batch against its standard: pass or fail, then per zone the
// standard and the batch side by side on the stage, with the figures beside.
export function BatchResult({ batch, onClose }: { batch: BatchView; onClose?: () => void }) {
  const tz = useShopTimeZone();
  const [surround, setSurround] = useState<Surround>('grey');
  const over = batch.zones.filter((z) => !z.withinTolerance).map((z) => z.name);
  return (
    <section aria-label="Batch result" className="space-y-3 rounded-lg border border-panel-line bg-white p-4">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <div className="flex flex-wrap items-center gap-3">
          <h3 className="text-lg font-semibold">Batch of <span className="num">{batch.cups} cups</span></h3>
          <PassBadge pass={batch.pass} size="lg" />
        </div>
        {onClose ? <button type="button" onClick={onClose} className="min-h-tap rounded-md border border-panel-line bg-white px-3 text-sm font-medium">Close</button> : null}
      </div>
      <p className="text-sm">
        {batch.pass
          ? `Every zone is within the tolerance of ${batch.tolerance.toFixed(1)} ΔE00 against standard pour #${batch.standardPourNumber}.`
          : `Over the tolerance of ${batch.tolerance.toFixed(1)} ΔE00 against standard pour #${batch.standardPourNumber}: ${over.join(', ')}. The leads have been e-mailed.`}
      </p>
      <p className="num text-sm text-ink-soft">
        {[formatWhen(batch.createdAt, tz), batch.createdBy ? `logged by ${batch.createdBy}` : null, batch.mold,
          batch.baits !== null ? `${batch.baits} baits` : null, batch.baitsExpected !== null ? `${batch.baitsExpected} expected` : null, batch.notes]
          .filter(Boolean).join(' · ')}
      </p>
      <BatchNumbers batch={batch} />
      <div className="flex flex-wrap items-center justify-between gap-2">
        <Link href={`/batches/${batch.id}/sheet`} className="inline-flex min-h-tap items-center rounded-md border border-panel-line bg-white px-4 font-medium">
          Batch sheet
        </Link>
        <SurroundToggle value={surround} onChange={setSurround} />
      </div>
      {batch.zones.map((z) => (
        <div key={z.name} className="grid gap-4 rounded-lg border border-panel-line p-3 md:grid-cols-2">
          <div>
            <h4 className="mb-2 font-semibold capitalize">{z.name}</h4>
            <SwatchPair surround={surround} left={z.standard?.hex ?? '#777777'} right={z.hex} leftLabel={`standard #${batch.standardPourNumber}`} rightLabel="batch" />
          </div>
          <div className="space-y-1 text-sm">
            <DeltaReadout d={z} direction={z.direction?.text} uncertainty={z.uncertainty} components={z.dLUncertainty !== null && z.dCUncertainty !== null && z.dHUncertainty !== null ? { dL: z.dLUncertainty, dC: z.dCUncertainty, dH: z.dHUncertainty } : null} extra={<span className="font-medium">{verdictWords(z.dE00, batch.tolerance, z.uncertainty).text}</span>} />
            <InFrameLine inFrame={z.inFrame as never} />
            <p className="num text-ink-soft">Batch {lab(z.lab)}{plusMinus(z.regionUncertainty)}{z.standard ? ` · standard ${lab(z.standard.lab)}${plusMinus(z.standard.uncertainty)}` : ''}</p>
            <FlakeLine flake={z.flake as Flake | null} standard={z.standard?.flake ?? null} />
            <LightLine light={z.whiteBalance as never} />
            <LightNote light={batch.light} />
          </div>
        </div>
      ))}
      <p className="text-xs text-ink-soft">
        CIELAB with the D65 white, from sRGB; differences in CIEDE2000. Bands are rules of thumb for photo work, not a standard.
      </p>
      {batch.photoId ? (
        <div className="max-w-xl">
          <RegionsOnPhoto photoId={batch.photoId} regions={batch.zones.map((z) => ({ name: z.name, shape: z.shape as Shape }))} caption="Batch photo" />
        </div>
      ) : null}
    </section>
  );
}

type Flake = { coverage: number; coverageUncertainty?: number };
const plusMinus = (u: number | null | undefined) => (u ? ` ± ${u.toFixed(2)} ΔE00` : '');

// The batch's flake coverage with its ± beside the standard's.
function FlakeLine({ flake, standard }: { flake: Flake | null; standard: Flake | null }) {
  if (!flake) return null;
  return (
    <p className="num text-ink-soft">
      Flake {formatShare(flake.coverage, flake.coverageUncertainty)}{standard ? ` · standard ${formatShare(standard.coverage, standard.coverageUncertainty)}` : ''}
    </p>
  );
}

// Cost per bait, each side's cups and what the batch took from stock (issue #13).
function BatchNumbers({ batch }: { batch: BatchView }) {
  const c = batch.cost;
  const atLeast = c.complete ? '' : 'at least ';
  return (
    <div className="space-y-1 text-sm">
      <p className="num">
        {batch.zoneCups.length > 1 ? `${batch.zoneCups.map((z) => `${z.zone} ${Number(z.cups.toFixed(2))} cups`).join(' + ')} · ` : ''}
        Cost {atLeast}{price(c.total, c.currency)}{c.perBait !== null ? `, ${atLeast}${price(c.perBait, c.currency)} per bait` : ''}
        {c.molds.length ? ` · ${c.molds.map((m) => `${price(m.perBait, c.currency)} a bait in ${m.name}`).join(' · ')}` : ''}
      </p>
      {c.missing.length ? <p>No cost in the library for {c.missing.join(', ')}: left out of the figures.</p> : null}
      {batch.belowZero.length ? <p role="status" className="font-medium"><span aria-hidden>▲ </span>Logged, but stock went below zero for {batch.belowZero.join(', ')}: count the shelf and record a delivery.</p> : null}
    </div>
  );
}
