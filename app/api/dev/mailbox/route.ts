import { requireMember } from '@/lib/auth/current';
import { env } from '@/lib/env';
import { errorResponse, json, withApi } from '@/lib/http/api';

export const dynamic = 'force-dynamic';

// Development only: what the local SMTP stand-in received, newest first.
// Absent (404) when the app sends through a real mail server.
export const GET = withApi(async () => {
  const { MAIL_FAKE_URL: standIn, POURPROOF_DEV_TOOLS } = env();
  if (!standIn || POURPROOF_DEV_TOOLS !== '1') return errorResponse(404, 'not_found', 'No local mail stand-in: e-mail goes to a real server');
  await requireMember();
  const res = await fetch(`${standIn.replace(/\/$/, '')}/messages`, { cache: 'no-store' });
  if (!res.ok) return errorResponse(502, 'mail_standin', `The mail stand-in answered ${res.status}`);
  const messages = (await res.json()) as { to: string | string[]; subject: string; text: string; html?: string | null; at: string | number }[];
  return json(messages.map((m) => ({ to: Array.isArray(m.to) ? m.to.join(', ') : m.to, subject: m.subject, text: m.text, ...(m.html ? { html: m.html } : {}), at: m.at })));
});
