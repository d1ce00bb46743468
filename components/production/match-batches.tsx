'use client';

import dynamic from 'next/dynamic';
import { useSearchParams } from 'next/navigation';
import { useEffect, useRef, useState } from 'react';
import useSWR from 'swr';
import { Button } from '@/components/ui/button';
import type { BatchView } from '@/db/queries/batches';
import type { MatchDetail } from '@/db/queries/matchDetail';
import { formatDeltaE, formatVolume } from '@/lib/format';
import { swrFetcher } from '@/lib/http/client';
import { decodeBatchPrefill, type VolumeUnit } from '@/lib/recipes';
import { BatchResult } from './batch-result';
import { PassBadge } from './pass-badge';
import { RunChart } from './run-chart';
import { When } from '@/components/ui/when';
import { FocusFirstField } from '@/components/match/match-sections';

// The form (sampler, upload, schema checks) loads when it is opened, not with the page.
const BatchForm = dynamic(() => import('./batch-form').then((m) => m.BatchForm), { loading: () => <p role="status" className="text-ink-soft">Loading the batch form…</p> });

type Props = {
  match: MatchDetail;
  canLog: boolean;
  sprueAllowanceMl: number;
  volumeUnit?: VolumeUnit;
  selectedId: string | null;
  onSelect: (batchId: string | null) => void;
  startLogging?: boolean;
};

// Production of a match's standard: log a batch, see it pass or fail, the
// run chart of each standard the match has had, and every batch logged.
export function MatchBatches({ match, canLog, sprueAllowanceMl, volumeUnit, selectedId, onSelect, startLogging }: Props) {
  const searchParams = useSearchParams();
  const key = `/api/matches/${match.id}/batches`;
  const { data: batches, error, mutate } = useSWR<BatchView[]>(key, swrFetcher);
  // The form opens at once when the maker arrives from a run plan's "Log as
  // batch" (pre-filled) or from "Log a batch" on the Standards or Batches page.
  const [prefill] = useState(() => decodeBatchPrefill(searchParams));
  const [logging, setLogging] = useState((prefill !== null || Boolean(startLogging)) && canLog && match.status !== 'archived');
  const section = useRef<HTMLElement>(null);
  const form = useRef<HTMLDivElement>(null);
  useEffect(() => {
    if (prefill) form.current?.scrollIntoView({ block: 'start' });
  }, [prefill]);
  const scrolled = useRef(false);
  const selected = batches?.find((b) => b.id === selectedId) ?? null;

  // Arriving from a failed-batch e-mail (?batch=…), or to log one: bring the section into view once.
  useEffect(() => {
    if ((selected || logging) && !scrolled.current) {
      scrolled.current = true;
      section.current?.scrollIntoView({ block: 'start' });
    }
  }, [selected, logging]);

  if (!match.standardPourId) return null;
  const standardIds = [...new Set([match.standardPourId, ...(batches ?? []).map((b) => b.standardPourId).reverse()])];

  return (
    <section ref={section} id="batches" aria-labelledby="batches-h" className="scroll-mt-16 space-y-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id="batches-h" className="text-lg font-semibold">Production batches</h2>
        {canLog && match.status !== 'archived' && !logging ? <Button onClick={() => setLogging(true)}>Log a batch</Button> : null}
      </div>
      <p className="text-sm text-ink-soft">
        Each batch is checked against the standard (pour #{match.pours.find((p) => p.id === match.standardPourId)?.number}) within {match.tolerance.toFixed(1)} ΔE00 in every zone.
      </p>
      {logging ? (
        <div ref={form} className="scroll-mt-4">
        <FocusFirstField className="rounded-lg border border-panel-line bg-white p-4">
          <div className="mb-3 flex items-center justify-between gap-2">
            <h3 className="text-lg font-semibold">Log a batch</h3>
            <Button variant="secondary" onClick={() => setLogging(false)}>Cancel</Button>
          </div>
          <BatchForm
            matchId={match.id}
            standardPourId={match.standardPourId}
            sprueAllowanceMl={sprueAllowanceMl}
            volumeUnit={volumeUnit}
            prefill={prefill}
            onLogged={(b) => {
              setLogging(false);
              void mutate((list) => [...(list ?? []), b], { revalidate: true });
              onSelect(b.id);
            }}
          />
        </FocusFirstField>
        </div>
      ) : null}
      {error ? <p role="alert" className="text-band-off">Could not load the batches: {(error as Error).message}</p> : null}
      {!batches && !error ? <p role="status" className="text-ink-soft">Loading batches…</p> : null}
      {selected ? <BatchResult batch={selected} onClose={() => onSelect(null)} /> : null}
      {selectedId && batches && !selected ? <p role="alert" className="text-band-off">That batch is not one of this match’s.</p> : null}
      {batches && batches.length === 0 ? <p className="text-ink-soft">No batches logged against the standard yet.</p> : null}
      {batches && batches.length > 0 ? (
        <>
          {standardIds.map((sid) => {
            const run = batches.filter((b) => b.standardPourId === sid);
            if (run.length === 0) return null;
            const n = run[0]!.standardPourNumber;
            return <RunChart key={sid} batches={run} zones={match.zones} tolerance={match.tolerance} title={`Standard pour #${n}${sid === match.standardPourId ? '' : ' (retired)'}`} />;
          })}
          <ol aria-label="Batches" className="space-y-2">
            {[...batches].reverse().map((b) => (
              <li key={b.id}>
                <button
                  type="button"
                  onClick={() => onSelect(b.id)}
                  aria-current={b.id === selectedId ? 'true' : undefined}
                  className={`flex min-h-tap w-full flex-wrap items-center gap-x-4 gap-y-1 rounded-md border px-3 py-2 text-left text-sm ${b.id === selectedId ? 'border-ink bg-white shadow-sm' : 'border-panel-line bg-panel'}`}
                >
                  <PassBadge pass={b.pass} />
                  <span className="num"><When at={b.createdAt} /></span>
                  <span className="num">{formatVolume(b.cups, volumeUnit)}{b.mold ? ` · ${b.mold}` : ''}</span>
                  <span className="num">{b.zones.map((z) => `${z.name} ${formatDeltaE(z.dE00)} ΔE00`).join(' · ')}</span>
                </button>
              </li>
            ))}
          </ol>
        </>
      ) : null}
    </section>
  );
}
