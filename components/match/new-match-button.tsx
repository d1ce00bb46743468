'use client';

import dynamic from 'next/dynamic';
import { useState } from 'react';
import { Button } from '@/components/ui/button';

// The form (and its schema checks) loads when "New match" is pressed, not with the list.
const NewMatchForm = dynamic(() => import('./new-match-form').then((m) => m.NewMatchForm), {
  loading: () => <p role="status" className="text-ink-soft">Loading the form…</p>,
});

export function NewMatchButton({ defaultTolerance }: { defaultTolerance: number }) {
  const [creating, setCreating] = useState(false);
  if (!creating) return <Button onClick={() => setCreating(true)}>New match</Button>;
  return (
    <section className="rounded-lg border border-panel-line bg-white p-4">
      <div className="mb-3 flex items-center justify-between">
        <h2 className="text-lg font-semibold">New match</h2>
        <Button variant="secondary" onClick={() => setCreating(false)}>Cancel</Button>
      </div>
      <NewMatchForm defaultTolerance={defaultTolerance} />
    </section>
  );
}
