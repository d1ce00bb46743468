'use client';

import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useId, useState } from 'react';
import useSWR from 'swr';
import { Button } from '@/components/ui/button';
import { inputClass } from '@/components/ui/field';
import { FormError } from '@/components/ui/form-error';
import type { PhotoMatchLink } from '@/db/queries/photos';
import { apiFetch, swrFetcher } from '@/lib/http/client';

const USE: Record<PhotoMatchLink['use'], string> = {
  draft: 'reference, not measured yet',
  target: 'reference',
  pour: 'test pour',
  batch: 'batch',
  swatch: 'swatch',
};

// Which match a photo belongs to, as a link to it.
export function PhotoMatchLine({ link }: { link: PhotoMatchLink | null }) {
  if (!link) return <p className="text-ink-soft">Not used in a match yet.</p>;
  return (
    <p>
      <Link href={`/matches/${link.id}`} className="font-medium text-accent underline">{link.name}</Link>{' '}
      <span className="text-ink-soft">({USE[link.use]})</span>
    </p>
  );
}

// Reuse a photo as the reference of an open match: it becomes that match's
// draft target, and the match page opens on it, ready to mark.
export function ReuseAsReference({ photoId, current }: { photoId: string; current: PhotoMatchLink | null }) {
  // Only the open matches, in one page: the whole list with every pour is not needed here.
  const { data } = useSWR<{ items: { id: string; name: string; status: string }[] }>('/api/matches?status=open&limit=200', swrFetcher);
  const matches = data?.items;
  const router = useRouter();
  const id = useId();
  const [matchId, setMatchId] = useState('');
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const open = (matches ?? []).filter((m) => m.status === 'open');
  if (!open.length) return null;
  async function use() {
    if (!matchId) return setError('Choose the match first.');
    setBusy(true);
    setError(null);
    try {
      await apiFetch(`/api/matches/${matchId}/draft-photo`, { method: 'POST', body: JSON.stringify({ photoId }) });
      router.push(`/matches/${matchId}#target`);
    } catch (e) {
      setError((e as Error).message);
      setBusy(false);
    }
  }
  return (
    <div className="space-y-1 pt-2">
      <label htmlFor={id} className="block text-xs font-medium text-ink-soft">Use as the reference of</label>
      <div className="flex gap-2">
        <select id={id} value={matchId} onChange={(e) => setMatchId(e.target.value)} className={inputClass}>
          <option value="">Choose an open match…</option>
          {open.filter((m) => !(current?.use === 'draft' && current.id === m.id)).map((m) => <option key={m.id} value={m.id}>{m.name}</option>)}
        </select>
        <Button type="button" variant="secondary" disabled={busy} onClick={() => void use()}>{busy ? 'Opening…' : 'Use'}</Button>
      </div>
      <FormError message={error} />
    </div>
  );
}
