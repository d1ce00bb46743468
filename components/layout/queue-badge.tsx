'use client';

import { useSignOffQueue } from '@/components/match/signoff-queue';

// How many pours wait for a lead's or owner's sign-off, beside Matches. Loaded only for them
// (app-nav.tsx), so a maker's pages carry no queue or data-fetching code for it.
export function QueueBadge() {
  const waiting = useSignOffQueue(true).data?.length ?? 0;
  if (waiting === 0) return null;
  return (
    <span className="num ml-1.5 inline-flex min-w-6 items-center justify-center rounded-full bg-accent px-1.5 text-sm font-semibold text-white">
      {waiting}<span className="sr-only"> {waiting === 1 ? 'pour waits' : 'pours wait'} for your sign-off</span>
    </span>
  );
}
