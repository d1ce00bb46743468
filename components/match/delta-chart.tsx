'use client';

import { LineChart } from '@/components/ui/line-chart';
import type { MatchView } from '@/db/queries/matches';

// ΔE00 per zone, pour by pour, against the match's tolerance.
export function DeltaChart({ match }: { match: MatchView }) {
  if (match.pours.length === 0) return null;
  const series = match.zones.map((zone) => ({
    name: zone,
    values: match.pours.map((p) => p.zones.find((z) => z.name === zone)?.dE00 ?? null),
  }));
  return (
    <figure aria-label="ΔE00 per zone across pours" className="rounded-lg border border-panel-line bg-white p-3">
      <figcaption className="mb-2 text-sm font-semibold">ΔE00 per zone, pour by pour (dashed line: tolerance {match.tolerance.toFixed(1)})</figcaption>
      <LineChart
        xLabels={match.pours.map((p) => `#${p.number}`)}
        series={series}
        tolerance={match.tolerance}
        pointTitle={(i) => `Pour #${match.pours[i]!.number}`}
        monotone
      />
    </figure>
  );
}
