'use client';

import { scaleLinear, scalePoint } from 'd3-scale';
import { curveLinear, curveMonotoneX, line } from 'd3-shape';
import { useEffect, useRef, useState } from 'react';

// Greys and one dark blue: the charts sit away from the swatches but keep to muted colours; lines
// also differ by dash so colour is never the only cue. The tolerance is a dashed rule.
const STROKES = ['#22201c', '#1f5f8b', '#7a7368', '#4a6b52', '#8b5e3c'];
const DASHES = ['', '6 3', '2 3', '8 3 2 3', '1 2'];
const M = { top: 10, right: 16, bottom: 26, left: 40 };

export type Series = { name: string; values: (number | null)[] };
type Props = {
  /** One label per point along x ("#1", "#2", …). */
  xLabels: string[];
  series: Series[];
  tolerance: number;
  /** Tick values of the y axis; d3's "nice" ticks when absent. */
  yTicks?: number[];
  /** What a point is called in its title ("Pour #3", "Batch #2 · 12 Nov · pass"). */
  pointTitle: (i: number) => string;
  monotone?: boolean;
  height?: number;
};

// A small SVG line chart, drawn by React with d3's scales and line generator (d3-scale, d3-shape)
// instead of a chart library: ΔE00 per zone across pours or batches, with the tolerance. Each point
// carries its value as a title (mouse) and the legend sits below in text; nothing is hover-only.
export function LineChart({ xLabels, series, tolerance, yTicks, pointTitle, monotone = false, height = 224 }: Props) {
  const box = useRef<HTMLDivElement>(null);
  const [width, setWidth] = useState(600);
  useEffect(() => {
    const el = box.current;
    if (!el) return;
    const measure = () => setWidth(Math.max(200, el.clientWidth));
    measure();
    const ro = new ResizeObserver(measure);
    ro.observe(el);
    return () => ro.disconnect();
  }, []);

  const finite = series.flatMap((s) => s.values.filter((v): v is number => v !== null));
  const top = yTicks?.[yTicks.length - 1] ?? Math.max(tolerance, ...finite) * 1.1;
  const y = scaleLinear().domain([0, top]).range([height - M.bottom, M.top]);
  if (!yTicks) y.nice();
  const ticks = yTicks ?? y.ticks(5);
  const x = scalePoint<number>().domain(xLabels.map((_, i) => i)).range([M.left, width - M.right]).padding(0.3);
  const path = line<[number, number]>().x((p) => x(p[0])!).y((p) => y(p[1])).curve(monotone ? curveMonotoneX : curveLinear);

  return (
    <div ref={box} className="w-full">
      <svg width={width} height={height} role="presentation" data-chart="line" className="block">
        {ticks.map((t) => (
          <g key={t}>
            <line x1={M.left} x2={width - M.right} y1={y(t)} y2={y(t)} stroke="#e8e3db" />
            <text x={M.left - 6} y={y(t)} dy="0.32em" textAnchor="end" fontSize={12} fill="#5b5750" className="num">{Number(t.toFixed(2))}</text>
          </g>
        ))}
        {xLabels.map((l, i) => (
          <text key={i} x={x(i)} y={height - M.bottom + 16} textAnchor="middle" fontSize={12} fill="#5b5750" className="num">{l}</text>
        ))}
        <line x1={M.left} x2={width - M.right} y1={y(tolerance)} y2={y(tolerance)} stroke="#8b2e24" strokeDasharray="4 4" />
        <text x={width - M.right} y={y(tolerance) - 4} textAnchor="end" fontSize={12} fill="#5b5750">tolerance</text>
        {series.map((s, k) => {
          // Gaps are bridged: a zone not measured on one pour still reads as one line.
          const pts = s.values.flatMap((v, i) => (v === null ? [] : [[i, v] as [number, number]]));
          return (
            <g key={s.name}>
              <path d={path(pts) ?? ''} fill="none" stroke={STROKES[k % STROKES.length]} strokeDasharray={DASHES[k % DASHES.length]} strokeWidth={2} />
              {pts.map(([i, v]) => (
                <circle key={i} cx={x(i)} cy={y(v)} r={4} fill="#fff" stroke={STROKES[k % STROKES.length]} strokeWidth={2}>
                  <title>{`${pointTitle(i)} · ${s.name} ${v.toFixed(2)} ΔE00`}</title>
                </circle>
              ))}
            </g>
          );
        })}
      </svg>
      <table className="sr-only">
        <thead><tr><th>Point</th>{series.map((s) => <th key={s.name}>{s.name} (ΔE00)</th>)}</tr></thead>
        <tbody>
          {xLabels.map((_, i) => <tr key={i}><th>{pointTitle(i)}</th>{series.map((s) => <td key={s.name}>{s.values[i] === null ? '—' : s.values[i]!.toFixed(2)}</td>)}</tr>)}
        </tbody>
      </table>
      <ul className="mt-1 flex flex-wrap justify-center gap-x-4 gap-y-1 text-sm" aria-label="Legend">
        {series.map((s, k) => (
          <li key={s.name} className="flex items-center gap-1">
            <svg width={24} height={8} aria-hidden><line x1={0} x2={24} y1={4} y2={4} stroke={STROKES[k % STROKES.length]} strokeDasharray={DASHES[k % DASHES.length]} strokeWidth={2} /></svg>
            {s.name}
          </li>
        ))}
      </ul>
    </div>
  );
}
