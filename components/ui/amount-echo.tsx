import type { DoseUnit } from '@/db/schema';
import { formatDose } from '@/lib/format';
import { parseAmount } from '@/lib/recipes/parseAmount';

// Under a dose box: what the typed text reads as ("reads as 0.5 tsp (½ tsp)"),
// so "1/2" is seen to be a half before it is saved. Quiet while the box is
// empty or already reads as itself; errors are the form's to show.
export function AmountEcho({ id, value, unit, label }: { id: string; value: unknown; unit?: DoseUnit; label?: string }) {
  if (value === undefined || value === null || value === '' || typeof value === 'number') return <span id={id} className="sr-only" />;
  const r = parseAmount(String(value));
  const text = !r.ok ? null : unit ? formatDose(r.value, unit) : `${r.value}${label ? ` ${label}` : ''}`;
  const same = r.ok && String(value).trim() === String(r.value);
  return (
    <span id={id} className={`block text-xs ${same || !text ? 'sr-only' : 'text-ink-soft'}`} aria-live="polite">
      {text ? `reads as ${text}` : ''}
    </span>
  );
}
