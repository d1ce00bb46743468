import { db } from '@/db';
import { teamMailAmong } from '@/db/queries/mail';
import { requireRole } from '@/lib/auth/current';
import { env } from '@/lib/env';
import { errorResponse, json, withApi } from '@/lib/http/api';
import { rowIdOfMessageId } from '@/lib/mail/queue';

export const dynamic = 'force-dynamic';

type StandInMessage = { to: string | string[]; subject: string; text: string; html?: string | null; messageId?: string | null; at: string | number };

// Development only: what the local SMTP stand-in received for the caller's own
// team, newest first, for the team's owner. A message belongs to the team when
// the app queued it for the team (its Message-ID names the team's outgoing row):
// invitations to the team's invitees and notices to its members. Anything else
// the stand-in holds (other shops' mail) is never shown.
// Absent (404) when the app sends through a real mail server.
export const GET = withApi(async () => {
  const { MAIL_FAKE_URL: standIn, POURPROOF_DEV_TOOLS } = env();
  if (!standIn || POURPROOF_DEV_TOOLS !== '1') return errorResponse(404, 'not_found', 'No local mail stand-in: e-mail goes to a real server');
  const owner = await requireRole('owner');
  const res = await fetch(`${standIn.replace(/\/$/, '')}/messages`, { cache: 'no-store' });
  if (!res.ok) return errorResponse(502, 'mail_standin', `The mail stand-in answered ${res.status}`);
  const all = (await res.json()) as StandInMessage[];
  const rowIds = all.map((m) => rowIdOfMessageId(m.messageId)).filter((id): id is string => id !== null);
  const ours = teamMailAmong(db(), owner.team.id, rowIds);
  const messages = all.filter((m) => ours.has(rowIdOfMessageId(m.messageId) ?? ''));
  return json(messages.map((m) => ({ to: Array.isArray(m.to) ? m.to.join(', ') : m.to, subject: m.subject, text: m.text, ...(m.html ? { html: m.html } : {}), at: m.at })));
});
