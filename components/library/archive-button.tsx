'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { apiFetch } from '@/lib/http/client';

// Archive with a confirm in place (no browser dialog: it works the same with
// gloves on a phone and in tests). The entry leaves the library; pours and
// batches that used it keep showing it.
export function ArchiveButton({ path, name, what, onArchived }: { path: string; name: string; what: 'colorant' | 'mold'; onArchived: () => void | Promise<void> }) {
  const [asking, setAsking] = useState(false);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  if (!asking) {
    return (
      <Button type="button" variant="danger" onClick={() => setAsking(true)} aria-label={`Archive ${name}`}>
        Archive
      </Button>
    );
  }
  const archive = async () => {
    setBusy(true);
    setError(null);
    try {
      await apiFetch(path, { method: 'DELETE' });
      await onArchived();
    } catch (e) {
      setError((e as Error).message);
      setBusy(false);
    }
  };
  return (
    <div role="group" aria-label={`Archive ${name}?`} className="grid gap-2 rounded-md border border-band-off/40 bg-white p-2">
      <p className="text-sm">
        Archive “{name}”? It leaves the {what} list; pours{what === 'mold' ? ' and batches' : ''} that used it keep showing it.
      </p>
      <div className="flex flex-wrap gap-2">
        <Button type="button" variant="danger" onClick={archive} disabled={busy}>{busy ? 'Archiving…' : 'Yes, archive'}</Button>
        <Button type="button" variant="secondary" onClick={() => setAsking(false)} disabled={busy}>Keep it</Button>
      </div>
      {error ? <p role="alert" className="text-sm text-band-off">{error}</p> : null}
    </div>
  );
}
