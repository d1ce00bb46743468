'use client';

import { useRouter } from 'next/navigation';
import { useEffect, useRef, useState } from 'react';
import { inputClass } from '@/components/ui/field';
import { MATCH_STATUSES } from '@/lib/enums';

// The search and status filter of the Matches list. The server filters (in SQL) and renders
// the table; this only writes the filter into the address, the search once typing pauses.
// Without script the same fields submit as a plain GET form.
export function MatchesFilters({ q, status, sort }: { q: string; status: string; sort: string | null }) {
  const router = useRouter();
  const [search, setSearch] = useState(q);
  const [state, setState] = useState(status);
  const first = useRef(true);
  useEffect(() => {
    if (first.current) {
      first.current = false;
      return;
    }
    // Only a change of the fields moves the address; the sort is read from it as it stands
    // then (a header may have been pressed meanwhile), and a new filter starts from one page.
    const t = setTimeout(() => {
      const params = new URLSearchParams(window.location.search);
      params.delete('shown');
      if (search.trim()) params.set('q', search.trim());
      else params.delete('q');
      if (state) params.set('status', state);
      else params.delete('status');
      const qs = params.toString();
      router.replace(qs ? `/matches?${qs}` : '/matches', { scroll: false });
    }, 250);
    return () => clearTimeout(t);
  }, [search, state, router]);
  return (
    <form action="/matches" method="get" className="mb-3 flex flex-wrap gap-3" onSubmit={(e) => e.preventDefault()}>
      <label className="min-w-48 flex-1">
        <span className="sr-only">Search matches</span>
        <input type="search" name="q" placeholder="Search by name or notes" value={search} onChange={(e) => setSearch(e.target.value)} className={inputClass} />
      </label>
      <label className="w-44">
        <span className="sr-only">Status</span>
        <select name="status" value={state} onChange={(e) => setState(e.target.value)} className={inputClass} aria-label="Filter by status">
          <option value="">All statuses</option>
          {MATCH_STATUSES.map((s) => <option key={s} value={s}>{s.replace('_', ' ')}</option>)}
        </select>
      </label>
      {sort ? <input type="hidden" name="sort" value={sort} /> : null}
    </form>
  );
}
