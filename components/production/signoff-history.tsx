'use client';

import useSWR from 'swr';
import type { HistoryEntry } from '@/db/queries/history';
import { swrFetcher } from '@/lib/http/client';
import { When } from '@/components/ui/when';

const KIND: Record<HistoryEntry['kind'], { icon: string; word: string }> = {
  submitted: { icon: '◐', word: 'submitted for sign-off' },
  approved: { icon: '●', word: 'approved as standard' },
  rework: { icon: '↺', word: 'sent back for rework' },
};

// The match's sign-off record, newest first: who did what to which pour,
// when, and what they wrote.
export function SignOffHistory({ matchId }: { matchId: string }) {
  const { data, error } = useSWR<HistoryEntry[]>(`/api/matches/${matchId}/history`, swrFetcher);
  if (error) return <p role="alert" className="text-sm text-band-off">Could not load the sign-off history: {(error as Error).message}</p>;
  if (!data) return <p role="status" className="text-sm text-ink-soft">Loading the sign-off history…</p>;
  return (
    <div>
      <h4 className="mb-1 font-semibold">Sign-off history</h4>
      {data.length === 0 ? (
        <p className="text-sm text-ink-soft">No pour of this match has been submitted yet.</p>
      ) : (
        <ol aria-label="Sign-off history" className="divide-y divide-panel-line rounded-md border border-panel-line">
          {data.map((h, i) => (
            <li key={`${h.kind}-${h.pourId}-${h.at}-${i}`} className="p-2 text-sm">
              <p>
                <span aria-hidden className="mr-1">{KIND[h.kind].icon}</span>
                <span className="font-semibold">Pour #{h.pourNumber} {KIND[h.kind].word}</span>
                <span className="text-ink-soft"> by {h.by?.name || 'a former member'} · <When at={h.at} /></span>
              </p>
              {h.comment ? <p className="mt-0.5 whitespace-pre-line break-words pl-5">“{h.comment}”</p> : null}
              {h.retiredPourId ? <p className="pl-5 text-ink-soft">Replaced the earlier standard, which is now retired.</p> : null}
            </li>
          ))}
        </ol>
      )}
    </div>
  );
}
