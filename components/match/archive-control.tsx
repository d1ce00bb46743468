'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { apiFetch } from '@/lib/http/client';

// Leads and owners retire a match (and its standard) or bring it back.
export function ArchiveControl({ matchId, archived, onDone }: { matchId: string; archived: boolean; onDone: () => void }) {
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  async function go() {
    if (!archived && !confirm('Archive this match? Its standard is retired: no more pours, sign-offs or batches. Everything stays readable.')) return;
    setBusy(true);
    setError(null);
    try {
      await apiFetch(`/api/matches/${matchId}/${archived ? 'reopen' : 'archive'}`, { method: 'POST' });
      onDone();
    } catch (e) {
      setError((e as Error).message);
    } finally {
      setBusy(false);
    }
  }
  return (
    <span className="inline-flex flex-wrap items-center gap-2">
      <Button variant="secondary" onClick={go} disabled={busy}>{archived ? 'Reopen match' : 'Archive match'}</Button>
      {error ? <span role="alert" className="text-sm text-band-off">{error}</span> : null}
    </span>
  );
}
