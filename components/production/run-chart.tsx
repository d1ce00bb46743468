'use client';

import { CartesianGrid, Legend, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { BatchView } from '@/db/queries/batches';
import { useShopTimeZone } from '@/components/ui/when';
import { formatDay } from '@/lib/format/dates';

// The same muted strokes and dashes as the pour chart (delta-chart.tsx), so
// colour is never the only cue; the tolerance is a dashed rule.
const STROKES = ['#22201c', '#1f5f8b', '#7a7368', '#4a6b52', '#8b5e3c'];
const DASHES = ['', '6 3', '2 3', '8 3 2 3', '1 2'];

// A run chart of one standard: ΔE00 per zone against the standard, batch
// after batch in the order they were logged, with the tolerance line.
export function RunChart({ batches, zones, tolerance, title }: { batches: BatchView[]; zones: string[]; tolerance: number; title: string }) {
  const tz = useShopTimeZone();
  if (batches.length === 0) return null;
  const data = batches.map((b, i) => {
    const row: Record<string, number | string | null> = { run: i + 1, day: formatDay(b.createdAt, tz), pass: b.pass ? 'pass' : 'fail' };
    for (const z of b.zones) row[z.name] = Number(z.dE00.toFixed(2));
    return row;
  });
  const worst = Math.max(tolerance, ...batches.flatMap((b) => b.zones.map((z) => z.dE00)));
  // Round ticks (0.5 or whole ΔE00 steps) rather than recharts' fifths of the range.
  const top = Math.ceil(worst + 0.5);
  const step = top <= 3 ? 0.5 : top <= 8 ? 1 : Math.ceil(top / 8);
  const ticks = Array.from({ length: Math.floor(top / step) + 1 }, (_, i) => i * step);
  return (
    <figure aria-label={`ΔE00 per zone across batches, ${title}`} className="rounded-lg border border-panel-line bg-white p-3">
      <figcaption className="mb-2 text-sm font-semibold">
        {title}: ΔE00 per zone against the standard, batch by batch (dashed line: tolerance {tolerance.toFixed(1)} ΔE00)
      </figcaption>
      <div className="h-56 w-full">
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={data} margin={{ top: 8, right: 16, bottom: 4, left: 0 }}>
            <CartesianGrid stroke="#e8e3db" />
            <XAxis dataKey="run" tickFormatter={(n) => `#${n}`} allowDecimals={false} />
            <YAxis width={40} domain={[0, ticks[ticks.length - 1]!]} ticks={ticks} tickFormatter={(v) => Number(v).toFixed(1)} />
            <Tooltip
              formatter={(v, name) => [`${Number(v).toFixed(2)} ΔE00`, String(name)]}
              labelFormatter={(n, payload) => {
                const row = payload?.[0]?.payload as { day?: string; pass?: string } | undefined;
                return `Batch #${n}${row ? ` · ${row.day} · ${row.pass}` : ''}`;
              }}
            />
            <Legend />
            <ReferenceLine y={tolerance} stroke="#8b2e24" strokeDasharray="4 4" label={{ value: 'tolerance', position: 'insideTopRight', fontSize: 12, fill: '#5b5750' }} />
            {zones.map((z, i) => (
              <Line key={z} type="linear" dataKey={z} stroke={STROKES[i % STROKES.length]} strokeDasharray={DASHES[i % DASHES.length]} strokeWidth={2} dot={{ r: 4 }} isAnimationActive={false} connectNulls />
            ))}
          </LineChart>
        </ResponsiveContainer>
      </div>
    </figure>
  );
}
