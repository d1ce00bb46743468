import 'server-only';
import { and, eq, gt, isNull } from 'drizzle-orm';
import type { DB } from '@/db/open';
import type { Member } from '@/db/queries/members';
import { type Role, invitations, memberships, teams, users } from '@/db/schema';
import { recordAudit } from '@/lib/audit';
import { hashPassword } from '@/lib/auth/password';
import { newToken, sha256Hex } from '@/lib/auth/tokens';
import { newId } from '@/lib/ids';
import { ApiError } from '@/lib/http/api';
import { queueMail } from '@/lib/mail/queue';
import { invitationMail } from '@/lib/mail/templates';

const INVITE_DAYS = 7;

export async function createInvitation(database: DB, owner: Member, input: { email: string; role: Role }, baseUrl: string) {
  const existing = database.select({ id: users.id }).from(users).where(eq(users.email, input.email)).get();
  if (existing) throw new ApiError(409, 'already_member', 'This e-mail already has a Pourproof account');
  const token = newToken();
  const id = newId();
  database.transaction((tx) => {
    tx.insert(invitations)
      .values({ id, teamId: owner.team.id, email: input.email, role: input.role, tokenHash: sha256Hex(token), invitedBy: owner.user.id, expiresAt: Date.now() + INVITE_DAYS * 86400_000 })
      .run();
    recordAudit(tx, { teamId: owner.team.id, actorId: owner.user.id, action: 'invitation.created', entity: 'invitation', entityId: id, data: { email: input.email, role: input.role } });
  });
  const link = `${baseUrl}/invite/${token}`;
  const mail = invitationMail({ teamName: owner.team.name, inviterName: owner.user.name, role: input.role, link });
  queueMail(database, { teamId: owner.team.id, to: input.email, ...mail });
  return { id, email: input.email, role: input.role, link };
}

export function findOpenInvitation(database: DB, token: string) {
  if (!/^[0-9a-f]{40}$/.test(token)) return null;
  return (
    database
      .select({ id: invitations.id, email: invitations.email, role: invitations.role, teamId: teams.id, teamName: teams.name })
      .from(invitations)
      .innerJoin(teams, eq(teams.id, invitations.teamId))
      .where(and(eq(invitations.tokenHash, sha256Hex(token)), isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, Date.now())))
      .get() ?? null
  );
}

export async function acceptInvitation(database: DB, token: string, input: { name: string; password: string }) {
  const inv = findOpenInvitation(database, token);
  if (!inv) throw new ApiError(404, 'not_found', 'This invitation is unknown, used or expired; ask the shop owner for a new one');
  const passwordHash = await hashPassword(input.password);
  const userId = newId();
  database.transaction((tx) => {
    const taken = tx.select({ id: users.id }).from(users).where(eq(users.email, inv.email)).get();
    if (taken) throw new ApiError(409, 'email_taken', 'An account with this e-mail already exists');
    tx.insert(users).values({ id: userId, email: inv.email, name: input.name, passwordHash }).run();
    tx.insert(memberships).values({ id: newId(), teamId: inv.teamId, userId, role: inv.role }).run();
    tx.update(invitations).set({ acceptedAt: Date.now() }).where(eq(invitations.id, inv.id)).run();
    recordAudit(tx, { teamId: inv.teamId, actorId: userId, action: 'invitation.accepted', entity: 'invitation', entityId: inv.id });
  });
  return { userId, email: inv.email, role: inv.role, teamId: inv.teamId };
}

export function listOpenInvitations(database: DB, teamId: string) {
  return database
    .select({ id: invitations.id, email: invitations.email, role: invitations.role, createdAt: invitations.createdAt, expiresAt: invitations.expiresAt })
    .from(invitations)
    .where(and(eq(invitations.teamId, teamId), isNull(invitations.acceptedAt), isNull(invitations.revokedAt), gt(invitations.expiresAt, Date.now())))
    .all();
}
