'use client';

import { useState } from 'react';
import { BandBadge } from '@/components/color/band-badge';
import { Button } from '@/components/ui/button';
import type { PourSummary } from '@/db/queries/matches';
import { bandFor } from '@/lib/color/bandFor';
import { formatDeltaE } from '@/lib/format';

const WINDOW = 24;

// Pour numbers as large buttons, latest first, each with its worst zone's ΔE00 and band.
// A long history shows its latest pours (and the selected one) until the maker asks for more.
export function PourList({ pours, selectedId, onSelect }: { pours: PourSummary[]; selectedId: string | null; onSelect: (id: string) => void }) {
  const [shown, setShown] = useState(WINDOW);
  if (pours.length === 0) return <p className="text-ink-soft">No pours yet. Pour a test bait, photograph it under the same light, and add it here.</p>;
  const latestFirst = [...pours].reverse();
  const selectedAt = latestFirst.findIndex((p) => p.id === selectedId);
  const visible = latestFirst.slice(0, Math.max(shown, selectedAt + 1));
  const hidden = latestFirst.length - visible.length;
  return (
    <div className="space-y-2">
      <ol className="flex flex-wrap gap-2" aria-label="Pours">
        {visible.map((p) => {
          const worst = Math.max(...p.zones.map((z) => z.dE00 ?? 0));
          return (
            <li key={p.id}>
              <button
                type="button"
                onClick={() => onSelect(p.id)}
                aria-current={p.id === selectedId ? 'true' : undefined}
                className={`min-h-tap rounded-md border px-3 py-1 text-left text-sm ${p.id === selectedId ? 'border-ink bg-white shadow-sm' : 'border-panel-line bg-panel'}`}
              >
                <span className="block font-semibold">#{p.number} <span className="font-normal text-ink-soft">{p.status === 'measured' ? '' : p.status}</span></span>
                <span className="num">{formatDeltaE(worst)} ΔE00 </span>
                <BandBadge band={bandFor(worst)} className="text-xs" />
              </button>
            </li>
          );
        })}
      </ol>
      {hidden > 0 ? (
        <Button variant="secondary" onClick={() => setShown(visible.length + WINDOW)}>
          Show {Math.min(hidden, WINDOW)} older {Math.min(hidden, WINDOW) === 1 ? 'pour' : 'pours'} ({hidden} not shown)
        </Button>
      ) : null}
    </div>
  );
}
