'use client';

import { useState } from 'react';
import useSWR from 'swr';
import { SurroundToggle, SwatchPair, type Surround } from '@/components/color/swatch-pair';
import { RegionsOnPhoto } from '@/components/match/regions-on-photo';
import type { PourView } from '@/db/queries/pours';
import type { TargetDetail } from '@/db/queries/matchDetail';
import { swrFetcher } from '@/lib/http/client';
import { formatCups, formatTemp } from '@/lib/format';
import { LightNote } from './light-note';
import { NextPourHint } from './next-pour-hint';
import { RecipeDiff } from './recipe-diff';
import { ZoneReadout } from './zone-readout';

export function PourCompare({ pourId, previousId, target, tolerance }: { pourId: string; previousId: string | null; target: TargetDetail; tolerance?: number }) {
  const { data: pour, error } = useSWR<PourView>(`/api/pours/${pourId}`, swrFetcher);
  const { data: previous } = useSWR<PourView>(previousId ? `/api/pours/${previousId}` : null, swrFetcher);
  const [surround, setSurround] = useState<Surround>('grey');
  if (error) return <p role="alert" className="text-band-off">Could not load the pour: {(error as Error).message}</p>;
  if (!pour) return <p role="status" className="text-ink-soft">Loading pour…</p>;
  const refPhoto = target.photos[0];
  return (
    <section aria-label={`Pour #${pour.number} against the target`} className="space-y-4">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 className="text-lg font-semibold">Pour #{pour.number} against the target</h3>
        <SurroundToggle value={surround} onChange={setSurround} />
      </div>
      <p className="text-sm text-ink-soft">
        Colours in CIELAB (D65 white, from sRGB); differences in CIEDE2000. Bands are rules of thumb for photo work, not a standard.
      </p>
      {pour.zones.map((z) => (
        <div key={z.name} className="grid gap-4 rounded-lg border border-panel-line bg-white p-3 md:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
          <div>
            <h4 className="mb-2 font-semibold capitalize">{z.name}</h4>
            <SwatchPair surround={surround} left={z.target.hex} right={z.hex} leftLabel="target" rightLabel={`pour #${pour.number}`} />
          </div>
          <div className="space-y-1">
            <ZoneReadout zone={z} targetFlake={target.zones.find((t) => t.name === z.name)?.flakeCoverage ?? null} targetFlakeUncertainty={target.zones.find((t) => t.name === z.name)?.flakeCoverageUncertainty ?? null} targetUncertainty={target.zones.find((t) => t.name === z.name)?.uncertainty ?? null} tolerance={tolerance} />
            <LightNote light={pour.light} />
          </div>
        </div>
      ))}
      <NextPourHint pourId={pour.id} />
      <div className="grid gap-3 md:grid-cols-2">
        {refPhoto ? <RegionsOnPhoto photoId={refPhoto.photoId} regions={refPhoto.zones} caption="Reference" /> : null}
        {pour.photoId ? <RegionsOnPhoto photoId={pour.photoId} regions={pour.zones.map((z) => ({ name: z.name, shape: z.shape as never }))} caption={`Pour #${pour.number}`} /> : null}
      </div>
      <div className="rounded-lg border border-panel-line bg-white p-3">
        <h4 className="mb-1 font-semibold">Recipe{previous ? ` (changes since pour #${previous.number})` : ''}</h4>
        <RecipeDiff current={pour.recipe} previous={previous?.recipe ?? null} />
        <p className="mt-2 text-sm text-ink-soft">
          {[pour.mold ? `Mold: ${pour.mold}` : null, pour.batchCups ? formatCups(pour.batchCups) : null, pour.tempF ? formatTemp(pour.tempF) : null, pour.notes].filter(Boolean).join(' · ')}
        </p>
      </div>
    </section>
  );
}
