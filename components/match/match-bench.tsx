'use client';

import dynamic from 'next/dynamic';
import { useRouter, useSearchParams } from 'next/navigation';
import { useState } from 'react';
import useSWR from 'swr';
import { MatchBatches } from '@/components/production/match-batches';
import { SignOffPanel } from '@/components/production/signoff-panel';
import { NEUTRAL } from '@/components/sampler/sampler-store';
import { Button } from '@/components/ui/button';
import type { MatchDetail } from '@/db/queries/matchDetail';
import type { PourView } from '@/db/queries/pours';
import type { Shape } from '@/lib/color/types';
import { swrFetcher } from '@/lib/http/client';
import type { VolumeUnit } from '@/lib/recipes';
import { formatDeltaE } from '@/lib/format';
import { DeltaChart } from './delta-chart';
import { EditMatch } from './edit-match';
import { FocusFirstField, JumpBar } from './match-sections';
import { PourCompare } from './pour-compare';
import { PourList } from './pour-list';
import { ArchiveControl } from './archive-control';
import { StatusBadge } from './status-badge';
import { TargetSwatches } from './target-swatches';

// Loaded when they are shown, not with the page: the forms (sampler, upload, schema checks) only
// when the maker opens one.
const loading = (what: string) => function Loading() {
  return <p role="status" className="text-ink-soft">Loading {what}…</p>;
};
const PourForm = dynamic(() => import('./pour-form').then((m) => m.PourForm), { loading: loading('the pour form') });
const TargetSampling = dynamic(() => import('./target-panel').then((m) => m.TargetSampling), { loading: loading('the sampler') });

type Production = { canDecide: boolean; sprueAllowanceMl: number; volumeUnit?: VolumeUnit };

export function MatchBench({ matchId, canPour, production }: { matchId: string; canPour: boolean; production: Production }) {
  const key = `/api/matches/${matchId}`;
  const { data: match, error, mutate } = useSWR<MatchDetail>(key, swrFetcher);
  // The next pour's regions start from the previous pour's, else the reference's.
  const latestPourId = match?.pours[match.pours.length - 1]?.id;
  const { data: latestPour } = useSWR<PourView>(latestPourId ? `/api/pours/${latestPourId}` : null, swrFetcher);
  const params = useSearchParams();
  const router = useRouter();
  const [mode, setMode] = useState<'compare' | 'pour' | 'reference'>('compare');
  if (error) return <p role="alert" className="text-band-off">Could not load this match: {(error as Error).message}</p>;
  if (!match) return <p role="status" className="text-ink-soft">Loading match…</p>;

  const latest = match.pours[match.pours.length - 1];
  const selectedId = params.get('pour') ?? latest?.id ?? null;
  const selectedIndex = match.pours.findIndex((p) => p.id === selectedId);
  const previousId = selectedIndex > 0 ? match.pours[selectedIndex - 1]!.id : null;
  const editable = canPour && match.status === 'open';
  // …and the grey card where it was last marked, if any photo of the match had one.
  const lastShapes = (): Record<string, Shape> => ({
    ...Object.fromEntries((latestPour?.zones ?? match.target?.photos[0]?.zones ?? []).map((z) => [z.name, z.shape as Shape])),
    ...(match.lastNeutral ? { [NEUTRAL]: match.lastNeutral.shape } : {}),
  });
  const select = (id: string) => {
    setMode('compare');
    router.replace(`/matches/${matchId}?pour=${id}`, { scroll: false });
  };
  const selectBatch = (id: string | null) => {
    const q = new URLSearchParams(params.toString());
    if (id) q.set('batch', id);
    else q.delete('batch');
    router.replace(`/matches/${matchId}?${q.toString()}`, { scroll: false });
  };

  return (
    <div className="space-y-6">
      <header>
        <div className="flex flex-wrap items-center gap-3">
          <h1 className="text-2xl font-semibold">{match.name}</h1>
          <StatusBadge status={match.status} />
          {production.canDecide ? <ArchiveControl matchId={match.id} archived={match.status === 'archived'} onDone={() => void mutate()} /> : null}
          {canPour && match.status !== 'archived' ? <EditMatch match={match} onSaved={() => void mutate()} /> : null}
        </div>
        <p className="mt-1 text-ink-soft">
          Zones: {match.zones.join(', ')} · tolerance {formatDeltaE(match.tolerance)} ΔE00{match.notes ? ` · ${match.notes}` : ''}
        </p>
      </header>

      <JumpBar match={match} hasSelection={Boolean(selectedId)} />

      <section id="target" aria-labelledby="target-h" className="scroll-mt-16 space-y-3">
        <h2 id="target-h" className="text-lg font-semibold">Target</h2>
        {match.target ? <TargetSwatches target={match.target} photoCount={match.target.photos.length} /> : <p className="text-ink-soft">No target yet: sample every zone on a reference photo.</p>}
        {editable && (!match.target || mode === 'reference' || match.draft) ? (
          <TargetSampling match={match} onSaved={() => { setMode('compare'); void mutate(); }} onReleased={() => void mutate()} />
        ) : null}
        {editable && match.target && mode !== 'reference' && !match.draft ? (
          <Button variant="secondary" onClick={() => setMode('reference')}>Add another reference photo</Button>
        ) : null}
      </section>

      {match.target ? (
        <section id="pours" aria-labelledby="pours-h" className="scroll-mt-16 space-y-3">
          <div className="flex flex-wrap items-center justify-between gap-2">
            <h2 id="pours-h" className="text-lg font-semibold">Pours</h2>
            {canPour && match.status !== 'archived' && mode !== 'pour' ? <Button onClick={() => setMode('pour')}>New pour</Button> : null}
          </div>
          <PourList pours={match.pours} selectedId={selectedId} onSelect={select} />
          <DeltaChart match={match} />
          {mode === 'pour' ? (
            <FocusFirstField className="rounded-lg border border-panel-line bg-white p-4">
              <div className="mb-3 flex items-center justify-between">
                <h3 className="text-lg font-semibold">Pour #{(latest?.number ?? 0) + 1}</h3>
                <Button variant="secondary" onClick={() => setMode('compare')}>Cancel</Button>
              </div>
              {latestPourId && !latestPour ? <p role="status" className="text-ink-soft">Loading the last pour…</p> : null}
              {!latestPourId || latestPour ? <PourForm match={match} initialShapes={lastShapes()} previous={latestPour} onSaved={(id) => { void mutate(); select(id); }} /> : null}
            </FocusFirstField>
          ) : null}
        </section>
      ) : null}
      {match.target && mode === 'compare' && selectedId ? (
        <div id="compare" className="scroll-mt-16">
          <PourCompare key={selectedId} pourId={selectedId} previousId={previousId} target={match.target} tolerance={match.tolerance} />
        </div>
      ) : null}
      {match.target && mode === 'compare' && selectedId ? (
        <div id="signoff" className="scroll-mt-16">
          <SignOffPanel key={`signoff-${selectedId}`} match={match} pourId={selectedId} canSubmit={canPour} canDecide={production.canDecide} />
        </div>
      ) : null}

      <MatchBatches match={match} canLog={canPour} sprueAllowanceMl={production.sprueAllowanceMl} volumeUnit={production.volumeUnit} selectedId={params.get('batch')} onSelect={selectBatch} startLogging={params.get('log') === 'batch'} />
    </div>
  );
}
