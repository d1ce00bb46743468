'use client';

import { useRouter } from 'next/navigation';
import { useId, useState } from 'react';
import { Button } from '@/components/ui/button';
import { inputClass } from '@/components/ui/field';

// "Log a batch" from the Batches page: choose the standard, and its match page
// opens on the batch form.
export function LogBatchPicker({ standards }: { standards: { matchId: string; name: string }[] }) {
  const router = useRouter();
  const id = useId();
  const [matchId, setMatchId] = useState(standards[0]?.matchId ?? '');
  if (standards.length === 0) return <p className="text-sm text-ink-soft">No standard to log a batch of yet: a lead approves a pour first.</p>;
  return (
    <form
      aria-label="Log a batch"
      className="flex flex-wrap items-end gap-2 rounded-lg border border-panel-line bg-white p-3"
      onSubmit={(e) => {
        e.preventDefault();
        if (matchId) router.push(`/matches/${matchId}?log=batch#batches`);
      }}
    >
      <label htmlFor={id} className="w-full text-sm font-medium sm:w-auto sm:flex-1">
        Standard to log a batch of
        <select id={id} value={matchId} onChange={(e) => setMatchId(e.target.value)} className={`${inputClass} mt-1`}>
          {standards.map((s) => <option key={s.matchId} value={s.matchId}>{s.name}</option>)}
        </select>
      </label>
      <Button type="submit">Log a batch</Button>
    </form>
  );
}
