'use server';

import { revalidatePath } from 'next/cache';
import { db } from '@/db';
import { requireRole } from '@/lib/auth/current';
import { ApiError } from '@/lib/http/api';
import { changeRole, removeMember } from '@/lib/team/members';
import { changeRoleSchema } from '@/lib/validations/auth';

export type TeamActionState = { ok: boolean; message?: string } | null;

export async function changeRoleAction(_prev: TeamActionState, form: FormData): Promise<TeamActionState> {
  const owner = await requireRole('owner');
  const parsed = changeRoleSchema.safeParse({ userId: form.get('userId'), role: form.get('role') });
  if (!parsed.success) return { ok: false, message: parsed.error.issues[0]?.message ?? 'Invalid role' };
  try {
    changeRole(db(), owner, parsed.data.userId, parsed.data.role);
  } catch (err) {
    if (err instanceof ApiError) return { ok: false, message: err.message };
    throw err;
  }
  revalidatePath('/team');
  return { ok: true, message: 'Role changed; their sessions were ended.' };
}

export async function removeMemberAction(_prev: TeamActionState, form: FormData): Promise<TeamActionState> {
  const owner = await requireRole('owner');
  const userId = form.get('userId');
  if (typeof userId !== 'string' || !userId || userId.length > 64) return { ok: false, message: 'No member given' };
  if (userId === owner.user.id) return { ok: false, message: 'You cannot remove yourself' };
  try {
    removeMember(db(), owner, userId);
  } catch (err) {
    if (err instanceof ApiError) return { ok: false, message: err.message };
    throw err;
  }
  revalidatePath('/team');
  return { ok: true, message: 'Member removed.' };
}
