'use server';

import { redirect } from 'next/navigation';
import { db } from '@/db';
import { setSessionCookie } from '@/lib/auth/cookie';
import { createUserSession } from '@/lib/auth/session';
import { assertAccountCreationAllowed } from '@/lib/auth/throttle';
import { type ActionState, guardedAction, invalidForm } from '@/lib/http/action';
import { acceptInvitation } from '@/lib/team/invitations';
import { acceptInvitationSchema } from '@/lib/validations/auth';

export async function acceptInvitationAction(token: string, _prev: ActionState, form: FormData): Promise<ActionState> {
  const refused = await guardedAction(null, async ({ ip }): Promise<ActionState> => {
    if (typeof token !== 'string' || token.length > 64) return { ok: false, message: 'This invitation link is not valid' };
    const parsed = acceptInvitationSchema.safeParse({ name: form.get('name'), password: form.get('password') });
    if (!parsed.success) return invalidForm(parsed.error);
    assertAccountCreationAllowed(db(), ip);
    const accepted = await acceptInvitation(db(), token, parsed.data);
    const { token: sessionToken } = await createUserSession(db(), accepted.userId);
    await setSessionCookie(sessionToken);
    return null;
  });
  if (refused) return refused;
  redirect('/matches');
}
