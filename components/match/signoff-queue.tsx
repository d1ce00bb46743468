'use client';

import Link from 'next/link';
import useSWR from 'swr';
import { BandBadge } from '@/components/color/band-badge';
import { When } from '@/components/ui/when';
import type { QueueItem } from '@/db/queries/signOffQueue';
import type { Band } from '@/lib/color/types';
import { formatDeltaE } from '@/lib/format';
import { swrFetcher } from '@/lib/http/client';

export const QUEUE_KEY = '/api/sign-off-queue';

/** The lead's queue, refreshed every minute and on focus; SWR shares it between the nav and the list. */
export function useSignOffQueue(enabled: boolean) {
  return useSWR<QueueItem[]>(enabled ? QUEUE_KEY : null, swrFetcher, { refreshInterval: 60_000 });
}

// "Waiting for your sign-off" on the Matches page, for leads and owners.
export function SignOffQueue() {
  const { data, error } = useSignOffQueue(true);
  if (error) return <p role="alert" className="text-band-off">Could not load the pours waiting for sign-off: {(error as Error).message}</p>;
  if (!data) return null;
  return (
    <section aria-labelledby="queue-h" className="space-y-2 rounded-lg border border-panel-line bg-white p-4">
      <h2 id="queue-h" className="text-lg font-semibold">Waiting for your sign-off{data.length ? ` (${data.length})` : ''}</h2>
      {data.length === 0 ? <p className="text-sm text-ink-soft">No pour is waiting. Makers’ submissions show here, and in the count beside Matches.</p> : (
        <ul className="divide-y divide-panel-line" aria-label="Pours waiting for sign-off">
          {data.map((q) => (
            <li key={q.pourId} className="py-2">
              <Link href={`/matches/${q.matchId}?pour=${q.pourId}#signoff`} className="flex min-h-tap flex-col justify-center font-medium text-accent underline">
                {q.matchName}, pour #{q.number}
              </Link>
              <p className="text-sm text-ink-soft">
                {q.submittedBy ? `from ${q.submittedBy}` : 'submitted'}{q.submittedAt ? <>, <When at={q.submittedAt} /></> : null} · tolerance {formatDeltaE(q.tolerance)} ΔE00
              </p>
              <ul className="mt-1 flex flex-wrap gap-x-4 gap-y-1 text-sm" aria-label={`ΔE00 per zone of pour #${q.number}`}>
                {q.zones.map((z) => (
                  <li key={z.name} className="num flex items-center gap-1">
                    <span className="capitalize">{z.name}</span> {formatDeltaE(z.dE00)}{z.uncertainty !== null ? ` ± ${formatDeltaE(z.uncertainty)}` : ''} ΔE00
                    <BandBadge band={z.band as Band} className="text-xs" />
                  </li>
                ))}
              </ul>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
