import 'server-only';
import { eq } from 'drizzle-orm';
import type { DB } from '@/db/open';
import type { Member } from '@/db/queries/members';
import { memberships, teams, users } from '@/db/schema';
import { recordAudit } from '@/lib/audit';
import { hashPassword } from '@/lib/auth/password';
import { newId } from '@/lib/ids';
import { ApiError } from '@/lib/http/api';
import type { SignUpInput } from '@/lib/validations/auth';

// Creates a shop (team) with its owner.
export async function signUp(database: DB, input: SignUpInput): Promise<Member> {
  const taken = database.select({ id: users.id }).from(users).where(eq(users.email, input.email)).get();
  if (taken) throw new ApiError(409, 'email_taken', 'An account with this e-mail already exists');
  const passwordHash = await hashPassword(input.password);
  const userId = newId();
  const teamId = newId();
  try {
    database.transaction((tx) => {
      tx.insert(teams).values({ id: teamId, name: input.teamName }).run();
      tx.insert(users).values({ id: userId, email: input.email, name: input.name, passwordHash }).run();
      tx.insert(memberships).values({ id: newId(), teamId, userId, role: 'owner' }).run();
      recordAudit(tx, { teamId, actorId: userId, action: 'team.created', entity: 'team', entityId: teamId });
    });
  } catch (err) {
    if (String(err).includes('UNIQUE constraint failed: users.email')) {
      throw new ApiError(409, 'email_taken', 'An account with this e-mail already exists');
    }
    throw err;
  }
  return { user: { id: userId, email: input.email, name: input.name }, team: { id: teamId, name: input.teamName }, role: 'owner' };
}
