import type { PourView } from '@/db/queries/pours';
import { doseAmount, formatDose } from '@/lib/format';

type Line = PourView['recipe'][number];
const key = (l: Line) => `${l.zone}|${l.colorantId}|${l.unit}`;

// What changed in the recipe since the previous pour, per cup of plastisol.
export function RecipeDiff({ current, previous }: { current: Line[]; previous: Line[] | null }) {
  if (current.length === 0 && !previous?.length) return <p className="text-sm text-ink-soft">No recipe recorded for this pour.</p>;
  const prev = new Map((previous ?? []).map((l) => [key(l), l]));
  const seen = new Set<string>();
  const rows = current.map((l) => {
    seen.add(key(l));
    const before = prev.get(key(l));
    return { l, before: before?.amount ?? null };
  });
  const removed = (previous ?? []).filter((l) => !seen.has(key(l)));
  const change = (now: number, before: number | null, unit: Line['unit']) => {
    if (before === null) return previous ? 'new' : '';
    const d = now - before;
    return Math.abs(d) < 1e-9 ? 'same' : `${d > 0 ? '+' : '−'}${doseAmount(Math.abs(d), unit)}`;
  };
  return (
    <table className="w-full text-left text-sm" aria-label="Recipe per cup">
      <thead>
        <tr className="text-ink-soft"><th className="py-1">Zone</th><th>Colorant</th><th className="text-right">Per cup</th><th className="text-right">{previous ? 'vs previous' : ''}</th></tr>
      </thead>
      <tbody>
        {rows.map(({ l, before }) => (
          <tr key={key(l)} className="border-t border-panel-line">
            <td className="py-1">{l.zone}</td>
            <td className="break-words">{l.colorant}</td>
            <td className="num text-right">{formatDose(l.amount, l.unit)}</td>
            <td className="num text-right">{change(l.amount, before, l.unit)}</td>
          </tr>
        ))}
        {removed.map((l) => (
          <tr key={`x-${key(l)}`} className="border-t border-panel-line text-ink-soft">
            <td className="py-1">{l.zone}</td>
            <td><s>{l.colorant}</s></td>
            <td className="num text-right">{formatDose(0, l.unit)}</td>
            <td className="text-right">removed</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
