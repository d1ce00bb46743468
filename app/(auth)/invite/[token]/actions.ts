'use server';

import { redirect } from 'next/navigation';
import { db } from '@/db';
import { setSessionCookie } from '@/lib/auth/cookie';
import { createUserSession } from '@/lib/auth/session';
import { assertAccountCreationAllowed } from '@/lib/auth/throttle';
import { guardedAction } from '@/lib/http/action';
import { acceptInvitation } from '@/lib/team/invitations';
import { acceptInvitationSchema } from '@/lib/validations/auth';

export type AcceptState = { ok: false; message?: string; fieldErrors?: Record<string, string[]> } | null;

export async function acceptInvitationAction(token: string, _prev: AcceptState, form: FormData): Promise<AcceptState> {
  const refused = await guardedAction(null, async ({ ip }): Promise<AcceptState> => {
    if (typeof token !== 'string' || token.length > 64) return { ok: false, message: 'This invitation link is not valid' };
    const parsed = acceptInvitationSchema.safeParse({ name: form.get('name'), password: form.get('password') });
    if (!parsed.success) {
      const fieldErrors: Record<string, string[]> = {};
      for (const issue of parsed.error.issues) (fieldErrors[String(issue.path[0])] ??= []).push(issue.message);
      return { ok: false, fieldErrors };
    }
    assertAccountCreationAllowed(db(), ip);
    const accepted = await acceptInvitation(db(), token, parsed.data);
    const { token: sessionToken } = await createUserSession(db(), accepted.userId);
    await setSessionCookie(sessionToken);
    return null;
  });
  if (refused) return refused;
  redirect('/matches');
}
