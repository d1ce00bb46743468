'use client';

import useSWR from 'swr';
import type { MatchView } from '@/db/queries/matches';
import { swrFetcher } from '@/lib/http/client';
import { StatusBadge } from './status-badge';

function latestDeltas(m: MatchView) {
  const last = m.pours[m.pours.length - 1];
  if (!last) return '—';
  return last.zones.map((z) => `${z.name} ${z.dE00 === null ? '—' : z.dE00.toFixed(1)}`).join(' · ');
}

export function MatchesList() {
  const { data, error, isLoading } = useSWR<MatchView[]>('/api/matches', swrFetcher);
  if (error) return <p role="alert" className="text-band-off">Could not load matches: {(error as Error).message}</p>;
  if (isLoading || !data) return <p role="status" className="text-ink-soft">Loading matches…</p>;
  if (data.length === 0) return <p className="rounded-md border border-dashed border-panel-line bg-white p-4 text-ink-soft">No matches yet.</p>;
  return (
    <div className="overflow-x-auto rounded-lg border border-panel-line bg-white">
      <table className="w-full text-left text-sm" aria-label="Matches">
        <thead className="bg-panel-deep">
          <tr>
            <th className="p-3">Match</th>
            <th className="p-3">Status</th>
            <th className="p-3">Zones</th>
            <th className="p-3 text-right">Pours</th>
            <th className="p-3">Latest ΔE00 per zone</th>
            <th className="p-3 text-right">Tolerance ΔE00</th>
          </tr>
        </thead>
        <tbody>
          {data.map((m) => (
            <tr key={m.id} className="border-t border-panel-line">
              <td className="p-3 font-medium">{m.name}</td>
              <td className="p-3"><StatusBadge status={m.status} /></td>
              <td className="p-3">{m.zones.join(', ')}</td>
              <td className="p-3 text-right">{m.pours.length}</td>
              <td className="p-3">{latestDeltas(m)}</td>
              <td className="p-3 text-right">{m.tolerance.toFixed(1)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
