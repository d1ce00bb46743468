'use client';

import { CartesianGrid, Legend, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { MatchView } from '@/db/queries/matches';

// Greys and one dark blue: the chart sits away from the swatches but keeps to
// muted colours; lines also differ by dash so colour is not the only cue.
const STROKES = ['#22201c', '#1f5f8b', '#7a7368', '#4a6b52', '#8b5e3c'];
const DASHES = ['', '6 3', '2 3', '8 3 2 3', '1 2'];

export function DeltaChart({ match }: { match: MatchView }) {
  const data = match.pours.map((p) => {
    const row: Record<string, number | null> = { number: p.number };
    for (const z of p.zones) row[z.name] = z.dE00 === null ? null : Number(z.dE00.toFixed(2));
    return row;
  });
  if (data.length === 0) return null;
  return (
    <figure aria-label="ΔE00 per zone across pours" className="rounded-lg border border-panel-line bg-white p-3">
      <figcaption className="mb-2 text-sm font-semibold">ΔE00 per zone, pour by pour (dashed line: tolerance {match.tolerance.toFixed(1)})</figcaption>
      <div className="h-56 w-full">
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={data} margin={{ top: 8, right: 16, bottom: 4, left: 0 }}>
            <CartesianGrid stroke="#e8e3db" />
            <XAxis dataKey="number" tickFormatter={(n) => `#${n}`} allowDecimals={false} />
            <YAxis width={36} domain={[0, 'auto']} />
            <Tooltip formatter={(v) => `${Number(v).toFixed(2)} ΔE00`} labelFormatter={(n) => `Pour #${n}`} />
            <Legend />
            <ReferenceLine y={match.tolerance} stroke="#8b2e24" strokeDasharray="4 4" />
            {match.zones.map((z, i) => (
              <Line key={z} type="monotone" dataKey={z} stroke={STROKES[i % STROKES.length]} strokeDasharray={DASHES[i % DASHES.length]} strokeWidth={2} dot={{ r: 4 }} isAnimationActive={false} connectNulls />
            ))}
          </LineChart>
        </ResponsiveContainer>
      </div>
    </figure>
  );
}
