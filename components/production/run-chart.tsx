'use client';

import { LineChart } from '@/components/ui/line-chart';
import type { BatchView } from '@/db/queries/batches';
import { useShopTimeZone } from '@/components/ui/when';
import { formatDay } from '@/lib/format/dates';

// A run chart of one standard: ΔE00 per zone against the standard, batch
// after batch in the order they were logged, with the tolerance line.
export function RunChart({ batches, zones, tolerance, title }: { batches: BatchView[]; zones: string[]; tolerance: number; title: string }) {
  const tz = useShopTimeZone();
  if (batches.length === 0) return null;
  const worst = Math.max(tolerance, ...batches.flatMap((b) => b.zones.map((z) => z.dE00)));
  // Round ticks (0.5 or whole ΔE00 steps).
  const top = Math.ceil(worst + 0.5);
  const step = top <= 3 ? 0.5 : top <= 8 ? 1 : Math.ceil(top / 8);
  const ticks = Array.from({ length: Math.floor(top / step) + 1 }, (_, i) => i * step);
  const series = zones.map((zone) => ({ name: zone, values: batches.map((b) => b.zones.find((z) => z.name === zone)?.dE00 ?? null) }));
  return (
    <figure aria-label={`ΔE00 per zone across batches, ${title}`} className="rounded-lg border border-panel-line bg-white p-3">
      <figcaption className="mb-2 text-sm font-semibold">
        {title}: ΔE00 per zone against the standard, batch by batch (dashed line: tolerance {tolerance.toFixed(1)} ΔE00)
      </figcaption>
      <LineChart
        xLabels={batches.map((_, i) => `#${i + 1}`)}
        series={series}
        tolerance={tolerance}
        yTicks={ticks}
        pointTitle={(i) => `Batch #${i + 1} · ${formatDay(batches[i]!.createdAt, tz)} · ${batches[i]!.pass ? 'pass' : 'fail'}`}
      />
    </figure>
  );
}
