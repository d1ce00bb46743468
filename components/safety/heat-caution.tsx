import { SAFETY_CAUTIONS, TEMPERATURE_CAUTION, TRADE_NOTES } from '@/lib/batches/safetyCautions';

// Shown wherever the app tells someone to heat, pour or inject plastisol. The
// words come from lib/batches/safetyCautions.ts, the one place they are kept
// (with their sources), so the bench, the batch sheet and the API agree.
// Compact: the temperature caution with the rest one tap away (no hover).
export function HeatCaution({ compact = false, tradeNotes = false }: { compact?: boolean; tradeNotes?: boolean }) {
  const [lead, ...rest] = SAFETY_CAUTIONS;
  return (
    <aside role="note" aria-label="Safety caution" className="rounded-md border border-band-warn/40 bg-white p-3 text-sm">
      <p className="font-semibold"><span aria-hidden>⚠ </span>{lead}</p>
      {compact ? (
        <>
          <p className="mt-1">{TEMPERATURE_CAUTION}</p>
          <details className="mt-1">
            <summary className="flex min-h-tap cursor-pointer items-center font-medium text-accent">All safety cautions</summary>
            <CautionList items={rest.filter((c) => c !== TEMPERATURE_CAUTION)} />
          </details>
        </>
      ) : (
        <CautionList items={rest} />
      )}
      {tradeNotes ? (
        <>
          <p className="mt-2 font-semibold">At the pot</p>
          <CautionList items={TRADE_NOTES} />
        </>
      ) : null}
    </aside>
  );
}

function CautionList({ items }: { items: readonly string[] }) {
  return (
    <ul className="mt-1 list-disc space-y-0.5 pl-5">
      {items.map((c) => <li key={c}>{c}</li>)}
    </ul>
  );
}
