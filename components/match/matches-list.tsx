'use client';

import dynamic from 'next/dynamic';
import { useEffect, useState } from 'react';
import useSWRInfinite from 'swr/infinite';
import { Button } from '@/components/ui/button';
import type { MatchView } from '@/db/queries/matches';
import { swrFetcher } from '@/lib/http/client';
import { MatchesFilters, MatchesTable } from './matches-table';

// The form (and its schema checks) loads when "New match" is pressed, not with the list.
const NewMatchForm = dynamic(() => import('./new-match-form').then((m) => m.NewMatchForm), {
  loading: () => <p role="status" className="text-ink-soft">Loading the form…</p>,
});

type Page = { items: MatchView[]; nextCursor: string | null };
const PAGE = 50;

// The key of page `i`: the server filters and pages (GET /api/matches?limit&cursor&status&q).
function pageKey(status: string, q: string) {
  return (i: number, previous: Page | null) => {
    if (previous && !previous.nextCursor) return null;
    const params = new URLSearchParams({ limit: String(PAGE) });
    if (status) params.set('status', status);
    if (q) params.set('q', q);
    if (i > 0 && previous?.nextCursor) params.set('cursor', previous.nextCursor);
    return `/api/matches?${params.toString()}`;
  };
}

export function MatchesList({ canCreate, defaultTolerance }: { canCreate: boolean; defaultTolerance: number }) {
  const [search, setSearch] = useState('');
  const [q, setQ] = useState('');
  const [status, setStatus] = useState('');
  // The search goes to the server once typing pauses.
  useEffect(() => {
    const t = setTimeout(() => setQ(search.trim()), 250);
    return () => clearTimeout(t);
  }, [search]);
  const { data: pages, error, isLoading, size, setSize, isValidating } = useSWRInfinite<Page>(pageKey(status, q), swrFetcher);
  const data = pages?.flatMap((p) => p.items);
  const more = Boolean(pages?.[pages.length - 1]?.nextCursor);
  const filtered = Boolean(status || q);
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
      {data && data.length === 0 && !filtered ? <p className="rounded-md border border-dashed border-panel-line bg-white p-4 text-ink-soft">No matches yet. Start one from a reference photo of the colour you need.</p> : null}
      {data && (data.length > 0 || filtered) ? (
        <div>
          <MatchesFilters search={search} onSearch={setSearch} status={status} onStatus={setStatus} />
          <MatchesTable data={data} />
          {more ? (
            <div className="mt-3">
              <Button variant="secondary" disabled={isValidating} onClick={() => void setSize(size + 1)}>
                {isValidating ? 'Loading…' : `Show ${PAGE} more`}
              </Button>
            </div>
          ) : null}
        </div>
      ) : null}
    </div>
  );
}
