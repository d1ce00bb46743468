'use client';

import { useRef, useState } from 'react';
import useSWR from 'swr';
import { Button } from '@/components/ui/button';
import { Field, inputClass } from '@/components/ui/field';
import { FormError } from '@/components/ui/form-error';
import { useFocusFirstField } from '@/components/ui/use-focus-first-field';
import { When } from '@/components/ui/when';
import type { MatchDetail } from '@/db/queries/matchDetail';
import type { MatchEdit } from '@/db/queries/matchEdits';
import { apiFetch, swrFetcher } from '@/lib/http/client';

const FIELD: Record<string, string> = { name: 'name', notes: 'notes', tolerance: 'tolerance (ΔE00)' };
const shown = (v: string | number | null) => (v === null || v === '' ? '—' : `“${v}”`);

// Edit what may change on a match — name, notes, tolerance — with the record
// of earlier edits. Pours stay as they were measured.
export function EditMatch({ match, onSaved }: { match: MatchDetail; onSaved: () => void }) {
  const [open, setOpen] = useState(false);
  const { data: edits, mutate } = useSWR<MatchEdit[]>(`/api/matches/${match.id}/edits`, swrFetcher);
  return (
    <div className={open ? 'w-full space-y-2' : 'contents'}>
      {open ? (
        <EditForm match={match} onClose={() => setOpen(false)} onSaved={() => { setOpen(false); void mutate(); onSaved(); }} />
      ) : (
        <Button variant="secondary" onClick={() => setOpen(true)} aria-label="Edit name, notes or tolerance">Edit</Button>
      )}
      {edits && edits.length ? (
        <details className="basis-full text-sm">
          <summary className="min-h-tap cursor-pointer py-2 font-medium">Changes to this match ({edits.length})</summary>
          <ol aria-label="Changes to this match" className="space-y-1">
            {edits.map((e, i) => (
              <li key={`${e.at}-${i}`}>
                {Object.entries(e.changes).map(([k, c]) => `${FIELD[k] ?? k} ${shown(c.from)} → ${shown(c.to)}`).join('; ')}
                <span className="text-ink-soft"> · {e.by ?? 'a former member'}, <When at={e.at} /></span>
              </li>
            ))}
          </ol>
        </details>
      ) : null}
    </div>
  );
}

function EditForm({ match, onClose, onSaved }: { match: MatchDetail; onClose: () => void; onSaved: () => void }) {
  const ref = useRef<HTMLFormElement>(null);
  useFocusFirstField(ref);
  const [name, setName] = useState(match.name);
  const [notes, setNotes] = useState(match.notes ?? '');
  const [tolerance, setTolerance] = useState(String(match.tolerance));
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  async function save(e: React.FormEvent) {
    e.preventDefault();
    const tol = Number(tolerance.replace(',', '.'));
    if (!name.trim()) return setError('Give the match a name.');
    if (!(tol > 0 && tol <= 20)) return setError('Tolerance is a ΔE00 above 0 and at most 20.');
    setBusy(true);
    setError(null);
    try {
      await apiFetch(`/api/matches/${match.id}`, { method: 'PATCH', body: JSON.stringify({ name: name.trim(), notes: notes.trim() || null, tolerance: tol }) });
      onSaved();
    } catch (err) {
      setError((err as Error).message);
    } finally {
      setBusy(false);
    }
  }
  return (
    <form ref={ref} onSubmit={save} aria-label="Edit match" className="grid gap-3 rounded-lg border border-panel-line bg-white p-4 sm:grid-cols-2">
      <Field label="Name"><input value={name} onChange={(e) => setName(e.target.value)} maxLength={120} className={inputClass} /></Field>
      <Field label="Tolerance (ΔE00)" hint={match.standardPourId ? 'Batches are judged against it; only a lead or the owner may change it now.' : undefined}>
        <input value={tolerance} onChange={(e) => setTolerance(e.target.value)} inputMode="decimal" className={inputClass} />
      </Field>
      <div className="sm:col-span-2">
        <Field label="Notes"><textarea rows={2} value={notes} onChange={(e) => setNotes(e.target.value)} maxLength={4000} className={`${inputClass} py-2`} /></Field>
      </div>
      <div className="sm:col-span-2"><FormError message={error} /></div>
      <div className="flex gap-2 sm:col-span-2">
        <Button type="submit" disabled={busy}>{busy ? 'Saving…' : 'Save changes'}</Button>
        <Button type="button" variant="secondary" onClick={onClose}>Cancel</Button>
      </div>
    </form>
  );
}
