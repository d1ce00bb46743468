'use client';

import useSWR from 'swr';
import type { ZoneSuggestion } from '@/lib/matches/suggestionTypes';
import { swrFetcher } from '@/lib/http/client';

const fmt = (v: number) => String(Number(v.toFixed(3)));
const signed = (v: number) => `${v > 0 ? '+' : '−'}${fmt(Math.abs(v))}`;

// The suggested next adjustment per zone, from the shop's own history of
// pours and swatches (lib/color/fitColorantModel.ts, lib/color/adviseZone.ts).
export function NextPourHint({ pourId }: { pourId: string }) {
  const { data, error } = useSWR<{ number: number; zones: ZoneSuggestion[] }>(`/api/pours/${pourId}/suggestion`, swrFetcher);
  if (error || !data) return null;
  return (
    <section aria-label="Next pour" className="rounded-lg border border-panel-line bg-white p-3 text-sm">
      <h4 className="font-semibold">Next pour: what to change</h4>
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
                      {c.colorant}: {fmt(c.from)} → <strong>{fmt(c.to)} {c.unit}</strong> per cup ({signed(c.to - c.from)})
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
      <p className="mt-2 text-xs text-ink-soft">
        From a Kubelka–Munk model of how your shop's colorants colour its plastisol, learnt from every pour and swatch you logged and corrected by this match's own pours. A prediction for the next test pour, not a promise.
      </p>
    </section>
  );
}
