'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import type { DoseUnit } from '@/db/schema';
import { apiFetch } from '@/lib/http/client';

type Line = { zone: string; colorantId: string; amount: number; unit: DoseUnit };
type Answer = { zones: { zone: string; recipe: { colorantId: string; colorant: string; amount: number; unit: DoseUnit }[]; predicted: { dE00: number } }[] };

// Before the first pour: a starting recipe per zone predicted from the target by the shop's
// colorant model (POST /api/matches/:id/starting-recipe), filled into the recipe lines.
export function StartingRecipeButton({ matchId, onUse }: { matchId: string; onUse: (lines: Line[]) => void }) {
  const [answer, setAnswer] = useState<Answer | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const ask = async () => {
    setBusy(true);
    setError(null);
    try {
      const a = await apiFetch<Answer>(`/api/matches/${matchId}/starting-recipe`, { method: 'POST', body: JSON.stringify({}) });
      setAnswer(a);
      onUse(a.zones.flatMap((z) => z.recipe.map((l) => ({ zone: z.zone, colorantId: l.colorantId, amount: l.amount, unit: l.unit }))));
    } catch (e) {
      setError((e as Error).message);
    } finally {
      setBusy(false);
    }
  };
  return (
    <section aria-label="Starting recipe" className="rounded-lg border border-panel-line bg-white p-3 text-sm">
      <Button type="button" variant="secondary" onClick={ask} disabled={busy}>{busy ? 'Working it out…' : 'Suggest a starting recipe'}</Button>
      {error ? <p role="alert" className="mt-2 text-band-off">{error}</p> : null}
      {answer ? (
        <ul className="mt-2 space-y-1">
          {answer.zones.map((z) => (
            <li key={z.zone}>
              <span className="font-medium capitalize">{z.zone}</span>: {z.recipe.map((l) => `${l.colorant} ${l.amount} ${l.unit}`).join(', ') || 'the base alone'} — predicted about {z.predicted.dE00.toFixed(1)} ΔE00 from the target. Filled into the recipe below; change anything.
            </li>
          ))}
        </ul>
      ) : null}
    </section>
  );
}
