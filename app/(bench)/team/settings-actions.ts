'use server';

import { eq } from 'drizzle-orm';
import { revalidatePath } from 'next/cache';
import { db } from '@/db';
import { teams } from '@/db/schema';
import { recordAudit } from '@/lib/audit';
import { type ActionState, guardedAction, invalidForm } from '@/lib/http/action';
import { teamSettingsSchema } from '@/lib/validations/team';

export async function saveTeamSettings(_prev: ActionState, form: FormData): Promise<ActionState> {
  return guardedAction('owner', async ({ member }) => {
    const owner = member!;
    const parsed = teamSettingsSchema.safeParse(Object.fromEntries(form));
    if (!parsed.success) return invalidForm(parsed.error);
    db().transaction((tx) => {
      tx.update(teams).set(parsed.data).where(eq(teams.id, owner.team.id)).run();
      recordAudit(tx, { teamId: owner.team.id, actorId: owner.user.id, action: 'team.settings_changed', entity: 'team', entityId: owner.team.id, data: parsed.data });
    });
    revalidatePath('/team');
    return { ok: true, message: 'Settings saved.' };
  });
}
