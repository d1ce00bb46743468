'use client';

import { useId, useState } from 'react';
import useSWR, { useSWRConfig } from 'swr';
import { Button } from '@/components/ui/button';
import { inputClass } from '@/components/ui/field';
import { FormError } from '@/components/ui/form-error';
import type { MatchDetail } from '@/db/queries/matchDetail';
import type { PourView } from '@/db/queries/pours';
import { apiFetch, swrFetcher } from '@/lib/http/client';
import { MAX_COMMENT } from '@/lib/validations/limits';
import { SignOffHistory } from './signoff-history';

type Props = { match: MatchDetail; pourId: string; canSubmit: boolean; canDecide: boolean };

// Statuses a maker may submit from; the server checks again (submitPour).
const SUBMITTABLE = new Set(['measured', 'rework']);

// Sign-off of the selected pour: a maker submits it with an optional note; a
// lead or owner approves it as the standard or sends it back with a comment.
// The buttons follow the role and the pour's status, but the server decides.
export function SignOffPanel({ match, pourId, canSubmit, canDecide }: Props) {
  const pour = match.pours.find((p) => p.id === pourId);
  const { mutate } = useSWRConfig();
  const [text, setText] = useState('');
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState<null | 'submit' | 'approved' | 'rework'>(null);
  const textId = useId();
  // The same key as the comparison above, so this costs no extra request.
  const { data: detail } = useSWR<PourView>(`/api/pours/${pourId}`, swrFetcher);
  if (!pour) return null;
  // The server refuses both too (409 no_recipe); saying so first saves a wasted press.
  const noRecipe = detail !== undefined && detail.recipe.length === 0;
  const whyId = `${textId}-why`;
  const why = noRecipe ? (
    <p id={whyId} className="text-sm font-medium text-band-off">
      ⚠ This pour has no recipe lines, so it cannot become the standard: log a new pour with the doses you mixed.
    </p>
  ) : null;

  const matchOpen = match.status === 'open' || match.status === 'approved';
  const showSubmit = canSubmit && matchOpen && SUBMITTABLE.has(pour.status);
  const showDecide = canDecide && pour.status === 'submitted' && match.status !== 'archived';

  async function send(action: 'submit' | 'approved' | 'rework') {
    setError(null);
    const comment = text.trim();
    if (action === 'rework' && !comment) return setError('Say what to change before sending the pour back.');
    setBusy(action);
    try {
      if (action === 'submit') {
        await apiFetch(`/api/pours/${pourId}/submit`, { method: 'POST', body: JSON.stringify({ note: comment || null }) });
      } else {
        await apiFetch(`/api/pours/${pourId}/sign-off`, { method: 'POST', body: JSON.stringify({ decision: action, comment: comment || null }) });
      }
      setText('');
      await Promise.all([mutate('/api/sign-off-queue'), mutate(`/api/matches/${match.id}`), mutate(`/api/pours/${pourId}`), mutate(`/api/matches/${match.id}/history`)]);
    } catch (e) {
      setError((e as Error).message);
    } finally {
      setBusy(null);
    }
  }

  return (
    <section aria-labelledby="signoff-h" className="space-y-3 rounded-lg border border-panel-line bg-white p-4">
      <h3 id="signoff-h" className="text-lg font-semibold">Sign-off of pour #{pour.number}</h3>
      <p className="text-sm" role="status">{statusLine(pour.status, match.standardPourId === pour.id)}</p>

      {showSubmit ? (
        <form aria-label="Submit for sign-off" className="space-y-2" onSubmit={(e) => { e.preventDefault(); void send('submit'); }}>
          <label htmlFor={textId} className="block text-sm font-medium">Note for the lead (optional)</label>
          <textarea id={textId} rows={2} maxLength={MAX_COMMENT} value={text} onChange={(e) => setText(e.target.value)} className={`${inputClass} py-2`} placeholder="e.g. shot under the bench lamp with the grey card" />
          <FormError message={error} />
          {why}
          <Button type="submit" disabled={busy !== null || noRecipe} aria-describedby={noRecipe ? whyId : undefined}>{busy ? 'Submitting…' : 'Submit for sign-off'}</Button>
        </form>
      ) : null}

      {showDecide ? (
        <form aria-label="Sign-off decision" className="space-y-2" onSubmit={(e) => e.preventDefault()}>
          <label htmlFor={textId} className="block text-sm font-medium">Comment</label>
          <textarea
            id={textId}
            rows={3}
            maxLength={MAX_COMMENT}
            value={text}
            onChange={(e) => setText(e.target.value)}
            aria-describedby={`${textId}-hint`}
            className={`${inputClass} py-2`}
          />
          <p id={`${textId}-hint`} className="text-sm text-ink-soft">
            Optional to approve. Required to send back: say what to change (which zone, which way, how much).
          </p>
          <FormError message={error} />
          {why}
          <div className="flex flex-wrap gap-2">
            <Button type="button" onClick={() => void send('approved')} disabled={busy !== null || noRecipe} aria-describedby={noRecipe ? whyId : undefined}>
              {busy === 'approved' ? 'Approving…' : 'Approve as standard'}
            </Button>
            <Button type="button" variant="secondary" onClick={() => void send('rework')} disabled={busy !== null}>
              {busy === 'rework' ? 'Sending back…' : 'Send back for rework'}
            </Button>
          </div>
          {match.standardPourId && match.standardPourId !== pour.id ? (
            <p className="text-sm text-ink-soft">Approving replaces the current standard; it is retired with its batches kept.</p>
          ) : null}
        </form>
      ) : null}

      <SignOffHistory matchId={match.id} />
    </section>
  );
}

function statusLine(status: string, isStandard: boolean): string {
  if (isStandard) return '● Approved: this pour is the match’s standard.';
  switch (status) {
    case 'submitted': return '◐ Waiting for a lead’s sign-off.';
    case 'rework': return '↺ Sent back for rework: see the comment below, then pour again with the change.';
    case 'approved': return '● Approved.';
    case 'retired': return '▫ Retired: this pour was the standard until a later one replaced it.';
    default: return '○ Measured, not submitted for sign-off yet.';
  }
}
