'use client';

import dynamic from 'next/dynamic';
import { useState } from 'react';
import useSWR from 'swr';
import { Button } from '@/components/ui/button';
import type { MatchView } from '@/db/queries/matches';
import { swrFetcher } from '@/lib/http/client';
import { MatchesTable } from './matches-table';

// The form (and its schema checks) loads when "New match" is pressed, not with the list.
const NewMatchForm = dynamic(() => import('./new-match-form').then((m) => m.NewMatchForm), {
  loading: () => <p role="status" className="text-ink-soft">Loading the form…</p>,
});

export function MatchesList({ canCreate, defaultTolerance }: { canCreate: boolean; defaultTolerance: number }) {
  const { data, error, isLoading } = useSWR<MatchView[]>('/api/matches', swrFetcher);
  const [creating, setCreating] = useState(false);
  return (
    <div className="space-y-4">
      {canCreate && creating ? (
        <section className="rounded-lg border border-panel-line bg-white p-4">
          <div className="mb-3 flex items-center justify-between">
            <h2 className="text-lg font-semibold">New match</h2>
            <Button variant="secondary" onClick={() => setCreating(false)}>Cancel</Button>
          </div>
          <NewMatchForm defaultTolerance={defaultTolerance} />
        </section>
      ) : null}
      {canCreate && !creating ? <Button onClick={() => setCreating(true)}>New match</Button> : null}
      {error ? <p role="alert" className="text-band-off">Could not load matches: {(error as Error).message}</p> : null}
      {isLoading || (!data && !error) ? <p role="status" className="text-ink-soft">Loading matches…</p> : null}
      {data && data.length === 0 ? <p className="rounded-md border border-dashed border-panel-line bg-white p-4 text-ink-soft">No matches yet. Start one from a reference photo of the colour you need.</p> : null}
      {data && data.length > 0 ? <MatchesTable data={data} /> : null}
    </div>
  );
}
