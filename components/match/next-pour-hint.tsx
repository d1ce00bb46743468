'use client';

import useSWR from 'swr';
import { Button } from '@/components/ui/button';
import type { PourSuggestion } from '@/lib/matches/suggestionTypes';
import { swrFetcher } from '@/lib/http/client';

const fmt = (v: number) => String(Number(v.toFixed(3)));
const signed = (v: number) => `${v > 0 ? '+' : '−'}${fmt(Math.abs(v))}`;

// The suggested next doses per zone, from the shop's colorant model (lib/color/fitColorantModel.ts)
// corrected by this match's own pours (lib/color/adviseZone.ts). With `onUse`, a button fills
// the pour form's recipe lines with them; the maker can still change anything.
export function NextPourHint({ pourId, onUse }: { pourId: string; onUse?: (advice: PourSuggestion) => void }) {
  const { data, error } = useSWR<PourSuggestion>(`/api/pours/${pourId}/suggestion`, swrFetcher);
  if (error || !data) return null;
  const usable = data.zones.some((z) => z.status === 'suggested');
  return (
    <section aria-label="Next pour" className="rounded-lg border border-panel-line bg-white p-3 text-sm">
      <h4 className="font-semibold">Next pour after #{data.number}: what to change</h4>
      <ul className="mt-2 space-y-2">
        {data.zones.map((z) => (
          <li key={z.zone}>
            <span className="font-medium capitalize">{z.zone}</span>
            {z.status === 'within_tolerance' ? <span className="text-ink-soft"> — within tolerance ({z.dE00.toFixed(1)} ΔE00); keep this recipe.</span> : null}
            {z.status === 'no_history' ? <span className="text-ink-soft"> — {z.reason}</span> : null}
            {z.status === 'suggested' ? (
              <>
                <ul className="num mt-1 list-disc pl-5">
                  {z.changes.map((c) => (
                    <li key={c.colorantId + c.unit}>
                      {c.colorant}: {c.from === 0 ? 'add' : fmt(c.from)} → <strong>{c.to === 0 ? 'leave out' : `${fmt(c.to)} ${c.unit}`}</strong> per cup ({signed(c.to - c.from)})
                    </li>
                  ))}
                </ul>
                {z.predicted ? <p className="text-ink-soft">Expected about {z.predicted.dE00.toFixed(1)} ΔE00 from the target (now {z.dE00.toFixed(1)}).</p> : null}
                {z.reason ? <p className="text-ink-soft">{z.reason}</p> : null}
                {z.learntFrom ? <p className="text-xs text-ink-soft">{z.learntFrom}</p> : null}
              </>
            ) : null}
          </li>
        ))}
      </ul>
      {onUse && usable ? (
        <Button type="button" variant="secondary" className="mt-2" onClick={() => onUse(data)}>Use these doses</Button>
      ) : null}
      <p className="mt-2 text-xs text-ink-soft">
        From a Kubelka–Munk model of how your shop&apos;s colorants colour its plastisol, learnt from every pour and swatch you logged and corrected by this match&apos;s own pours. A prediction for the next test pour, not a promise.
      </p>
    </section>
  );
}
