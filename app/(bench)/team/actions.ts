'use server';

import { revalidatePath } from 'next/cache';
import { db } from '@/db';
import { type ActionState, guardedAction } from '@/lib/http/action';
import { changeRole, removeMember } from '@/lib/team/members';
import { changeRoleSchema } from '@/lib/validations/auth';

export async function changeRoleAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  return guardedAction('owner', async ({ member }) => {
    const parsed = changeRoleSchema.safeParse({ userId: form.get('userId'), role: form.get('role') });
    if (!parsed.success) return { ok: false, message: parsed.error.issues[0]?.message ?? 'Invalid role' };
    changeRole(db(), member!, parsed.data.userId, parsed.data.role);
    revalidatePath('/team');
    return { ok: true, message: 'Role changed; their sessions were ended.' };
  });
}

export async function removeMemberAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  return guardedAction('owner', async ({ member }) => {
    const userId = form.get('userId');
    if (typeof userId !== 'string' || !userId || userId.length > 64) return { ok: false, message: 'No member given' };
    if (userId === member!.user.id) return { ok: false, message: 'You cannot remove yourself' };
    removeMember(db(), member!, userId);
    revalidatePath('/team');
    return { ok: true, message: 'Member removed.' };
  });
}
