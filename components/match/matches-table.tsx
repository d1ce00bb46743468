import {
  type ColumnDef,
  type SortingState,
  type TableOptionsResolved,
  createTable,
  flexRender,
  getCoreRowModel,
  getSortedRowModel,
} from '@tanstack/react-table';
import Link from 'next/link';
import { When } from '@/components/ui/when';
import { BandBadge } from '@/components/color/band-badge';
import type { MatchView } from '@/db/queries/matches';
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

const columns: ColumnDef<MatchView>[] = [
  {
    accessorKey: 'name',
    header: 'Match',
    cell: ({ row }) => <Link href={`/matches/${row.original.id}`} className="font-medium text-accent underline-offset-2 hover:underline">{row.original.name}</Link>,
  },
  { accessorKey: 'status', header: 'Status', cell: ({ getValue }) => <StatusBadge status={getValue<string>()} /> },
  { id: 'zones', header: 'Zones', accessorFn: (m) => m.zones.join(', '), enableSorting: false, meta: { wide: true } },
  { id: 'pours', header: 'Pours', accessorFn: (m) => m.pours.length, meta: { num: true, wide: true } },
  {
    id: 'latest',
    header: 'Latest ΔE00 per zone',
    accessorFn: worstDelta,
    cell: ({ row }) => {
      const pour = latestPour(row.original);
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
  { id: 'activity', header: 'Last activity', accessorFn: (m) => m.updatedAt, cell: ({ getValue }) => <When at={getValue<number>()} dayOnly />, meta: { wide: true } },
  { id: 'maker', header: 'Started by', accessorFn: (m) => m.createdBy ?? '—', meta: { wide: true } },
];

// At phone width the table keeps what a maker scans for — the match, its
// status and the latest ΔE00 — and leaves the rest to wider screens; the
// match's name stays pinned at the left if the table still scrolls.
function cellClass(id: string, meta: unknown): string {
  if ((meta as { wide?: boolean } | undefined)?.wide) return 'hidden md:table-cell';
  return id === 'name' ? 'sticky left-0 z-10 bg-inherit' : '';
}

// The columns a maker may sort by, read from the column definitions themselves.
const SORTABLE = new Set(columns.filter((c) => c.enableSorting !== false).map((c) => c.id ?? (c as { accessorKey?: string }).accessorKey));
export const DEFAULT_SORT: SortingState = [{ id: 'activity', desc: true }];

/** The sort in the address: `name` (A→Z), `-latest` (highest first); nothing is newest activity first. */
export function parseSort(value: string | undefined): SortingState {
  if (value === 'none') return [];
  const id = value?.replace(/^-/, '');
  if (!id || !SORTABLE.has(id)) return DEFAULT_SORT;
  return [{ id, desc: value!.startsWith('-') }];
}

export function sortParam(sorting: SortingState): string | null {
  const s = sorting[0];
  if (!s) return 'none';
  if (s.id === DEFAULT_SORT[0]!.id && s.desc === DEFAULT_SORT[0]!.desc) return null;
  return `${s.desc ? '-' : ''}${s.id}`;
}

// TanStack Table's core, run here on the server: the table reaches the phone as HTML, with no
// table code to download. Sorting a column is a link (the sort rides in the address), so it
// works before any script has loaded, and Back undoes it.
function serverTable(data: MatchView[], sorting: SortingState) {
  const options: TableOptionsResolved<MatchView> = {
    data,
    columns,
    state: {},
    onStateChange: () => {},
    renderFallbackValue: null,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
  };
  const table = createTable(options);
  table.setOptions((prev) => ({ ...prev, state: { ...table.initialState, sorting } }));
  return table;
}

// The loaded matches, sorted by the column a maker picks; `hrefFor` gives the address of a sort.
export function MatchesTable({ data, sorting, hrefFor }: { data: MatchView[]; sorting: SortingState; hrefFor: (sorting: SortingState) => string }) {
  const table = serverTable(data, sorting);
  return (
    <div className="overflow-x-auto rounded-lg border border-panel-line bg-white">
      <table className="w-full text-left text-sm" aria-label="Matches">
        <thead className="bg-panel-deep [&_tr]:bg-panel-deep">
          {table.getHeaderGroups().map((hg) => (
            <tr key={hg.id}>
              {hg.headers.map((h) => {
                const sorted = h.column.getIsSorted();
                const next = h.column.getNextSortingOrder();
                const nextSorting: SortingState = next ? [{ id: h.column.id, desc: next === 'desc' }] : [];
                return (
                  <th key={h.id} className={`p-0 ${cellClass(h.column.id, h.column.columnDef.meta)}`} aria-sort={sorted ? SORT_ARIA[sorted] : undefined}>
                    {h.column.getCanSort() ? (
                      <Link href={hrefFor(nextSorting)} scroll={false} replace className="flex min-h-tap w-full items-center gap-1 p-3 text-left font-semibold">
                        {flexRender(h.column.columnDef.header, h.getContext())}
                        <span aria-hidden className="text-ink-soft">{sorted ? SORT_MARK[sorted] : '↕'}</span>
                      </Link>
                    ) : (
                      <span className="block p-3 font-semibold">{flexRender(h.column.columnDef.header, h.getContext())}</span>
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-t border-panel-line bg-white align-top">
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className={`p-3 ${cellClass(cell.column.id, cell.column.columnDef.meta)}`}>{flexRender(cell.column.columnDef.cell, cell.getContext())}</td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      {table.getRowModel().rows.length === 0 ? <p className="p-4 text-ink-soft">No match fits this search.</p> : null}
    </div>
  );
}
