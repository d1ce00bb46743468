'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { apiFetch } from '@/lib/http/client';

// Re-send or revoke one pending invitation (owner only; the server decides).
export function InvitationActions({ id, email }: { id: string; email: string }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [said, setSaid] = useState<{ ok: boolean; text: string } | null>(null);
  async function run(kind: 'resend' | 'revoke') {
    setBusy(true);
    setSaid(null);
    try {
      if (kind === 'resend') await apiFetch(`/api/team/invitations/${id}/resend`, { method: 'POST' });
      else await apiFetch(`/api/team/invitations/${id}`, { method: 'DELETE' });
      setSaid({ ok: true, text: kind === 'resend' ? `Sent again to ${email}; the old link no longer works.` : `Invitation to ${email} revoked.` });
      router.refresh();
    } catch (e) {
      setSaid({ ok: false, text: (e as Error).message });
    } finally {
      setBusy(false);
    }
  }
  return (
    <span className="flex flex-wrap items-center gap-2">
      <Button type="button" variant="secondary" disabled={busy} onClick={() => void run('resend')} aria-label={`Send the invitation to ${email} again`}>Send again</Button>
      <Button type="button" variant="danger" disabled={busy} onClick={() => void run('revoke')} aria-label={`Revoke the invitation to ${email}`}>Revoke</Button>
      {said ? <span role={said.ok ? 'status' : 'alert'} className={said.ok ? 'text-ink-soft' : 'text-band-off'}>{said.text}</span> : null}
    </span>
  );
}
