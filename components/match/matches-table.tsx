'use client';

import Link from 'next/link';
import { When } from '@/components/ui/when';
import { type ReactNode, useMemo, useState } from 'react';
import { BandBadge } from '@/components/color/band-badge';
import { inputClass } from '@/components/ui/field';
import type { MatchView } from '@/db/queries/matches';
import { MATCH_STATUSES } from '@/lib/enums';
import { bandFor } from '@/lib/color/bandFor';
import { formatDeltaE } from '@/lib/format';
import { StatusBadge } from './status-badge';

const SORT_ARIA = { asc: 'ascending', desc: 'descending' } as const;
const SORT_MARK = { asc: '▴', desc: '▾' } as const;

const latestPour = (m: MatchView) => m.pours[m.pours.length - 1];
const worstDelta = (m: MatchView) => {
  const zs = latestPour(m)?.zones.filter((z) => z.dE00 !== null) ?? [];
  return zs.length ? Math.max(...zs.map((z) => z.dE00!)) : Number.POSITIVE_INFINITY;
};

// Each column: how it sorts (none for Zones) and how its cell reads. Text sorts A→Z first,
// figures and dates highest first; a third press on a header drops the sort.
type Column = { id: string; header: string; sort?: (m: MatchView) => string | number; cell: (m: MatchView) => ReactNode; wide?: boolean };
const columns: Column[] = [
  {
    id: 'name',
    header: 'Match',
    sort: (m) => m.name.toLowerCase(),
    cell: (m) => <Link href={`/matches/${m.id}`} className="font-medium text-accent underline-offset-2 hover:underline">{m.name}</Link>,
  },
  { id: 'status', header: 'Status', sort: (m) => m.status, cell: (m) => <StatusBadge status={m.status} /> },
  { id: 'zones', header: 'Zones', cell: (m) => m.zones.join(', '), wide: true },
  { id: 'pours', header: 'Pours', sort: (m) => m.pours.length, cell: (m) => m.pours.length, wide: true },
  {
    id: 'latest',
    header: 'Latest ΔE00 per zone',
    sort: worstDelta,
    cell: (m) => {
      const pour = latestPour(m);
      if (!pour) return <span className="text-ink-soft">no pours yet</span>;
      return (
        <ul className="space-y-0.5">
          {pour.zones.map((z) => (
            <li key={z.name} className="flex flex-wrap items-baseline gap-x-2">
              <span className="w-12 text-ink-soft">{z.name}</span>
              <span className="num w-8 text-right font-semibold">{z.dE00 === null ? '—' : formatDeltaE(z.dE00)}</span>
              {z.dE00 === null ? null : <BandBadge band={bandFor(z.dE00)} className="text-xs" />}
            </li>
          ))}
        </ul>
      );
    },
  },
  { id: 'activity', header: 'Last activity', sort: (m) => m.updatedAt, cell: (m) => <When at={m.updatedAt} dayOnly />, wide: true },
  { id: 'maker', header: 'Started by', sort: (m) => m.createdBy ?? '—', cell: (m) => m.createdBy ?? '—', wide: true },
];

// At phone width the table keeps what a maker scans for — the match, its
// status and the latest ΔE00 — and leaves the rest to wider screens; the
// match's name stays pinned at the left if the table still scrolls.
function cellClass(c: Column): string {
  if (c.wide) return 'hidden md:table-cell';
  return c.id === 'name' ? 'sticky left-0 z-10 bg-inherit' : '';
}

type Sorting = { id: string; desc: boolean } | null;
const ascFirst = (c: Column, data: MatchView[]) => data.length > 0 && typeof c.sort!(data[0]!) === 'string';

// Sorting and filtering by hand (a few dozen lines instead of a table library in the browser).
export function MatchesTable({ data }: { data: MatchView[] }) {
  const [sorting, setSorting] = useState<Sorting>({ id: 'activity', desc: true });
  const [search, setSearch] = useState('');
  const [status, setStatus] = useState('');
  const rows = useMemo(() => {
    const q = search.toLowerCase();
    const kept = data.filter((m) => (!status || m.status === status) && (!q || m.name.toLowerCase().includes(q) || (m.notes ?? '').toLowerCase().includes(q)));
    const col = sorting && columns.find((c) => c.id === sorting.id);
    if (!col?.sort) return kept;
    const key = col.sort;
    const sign = sorting!.desc ? -1 : 1;
    return [...kept].sort((a, b) => {
      const x = key(a), y = key(b);
      return sign * (x < y ? -1 : x > y ? 1 : 0);
    });
  }, [data, search, status, sorting]);
  const toggle = (c: Column) => {
    const first = !ascFirst(c, data);
    if (sorting?.id !== c.id) return setSorting({ id: c.id, desc: first });
    if (sorting.desc === first) return setSorting({ id: c.id, desc: !first });
    setSorting(null);
  };
  return (
    <div>
      <div className="mb-3 flex flex-wrap gap-3">
        <label className="min-w-48 flex-1">
          <span className="sr-only">Search matches</span>
          <input type="search" placeholder="Search by name or notes" value={search} onChange={(e) => setSearch(e.target.value)} className={inputClass} />
        </label>
        <label className="w-44">
          <span className="sr-only">Status</span>
          <select value={status} onChange={(e) => setStatus(e.target.value)} className={inputClass} aria-label="Filter by status">
            <option value="">All statuses</option>
            {MATCH_STATUSES.map((s) => <option key={s} value={s}>{s.replace('_', ' ')}</option>)}
          </select>
        </label>
      </div>
      <div className="overflow-x-auto rounded-lg border border-panel-line bg-white">
        <table className="w-full text-left text-sm" aria-label="Matches">
          <thead className="bg-panel-deep [&_tr]:bg-panel-deep">
            <tr>
              {columns.map((c) => {
                const sorted = sorting?.id === c.id ? (sorting.desc ? 'desc' : 'asc') : false;
                return (
                  <th key={c.id} className={`p-0 ${cellClass(c)}`} aria-sort={sorted ? SORT_ARIA[sorted] : undefined}>
                    {c.sort ? (
                      <button type="button" onClick={() => toggle(c)} className="flex min-h-tap w-full items-center gap-1 p-3 text-left font-semibold">
                        {c.header}
                        <span aria-hidden className="text-ink-soft">{sorted ? SORT_MARK[sorted] : '↕'}</span>
                      </button>
                    ) : (
                      <span className="block p-3 font-semibold">{c.header}</span>
                    )}
                  </th>
                );
              })}
            </tr>
          </thead>
          <tbody>
            {rows.map((m) => (
              <tr key={m.id} className="border-t border-panel-line bg-white align-top">
                {columns.map((c) => <td key={c.id} className={`p-3 ${cellClass(c)}`}>{c.cell(m)}</td>)}
              </tr>
            ))}
          </tbody>
        </table>
        {rows.length === 0 ? <p className="p-4 text-ink-soft">No match fits this search.</p> : null}
      </div>
    </div>
  );
}
