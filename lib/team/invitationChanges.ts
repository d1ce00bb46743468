import 'server-only';
import { and, eq, isNull } from 'drizzle-orm';
import type { DB } from '@/db/open';
import type { Member } from '@/db/queries/members';
import { invitations } from '@/db/schema';
import { recordAudit } from '@/lib/audit';
import { newToken, sha256Hex } from '@/lib/auth/tokens';
import { ApiError } from '@/lib/http/api';
import { queueMail } from '@/lib/mail/queue';
import { invitationMail } from '@/lib/mail/templates';

const INVITE_DAYS = 7;

function pending(database: DB, teamId: string, id: string) {
  const inv = database.select().from(invitations).where(and(eq(invitations.id, id), eq(invitations.teamId, teamId))).get();
  if (!inv) throw new ApiError(404, 'not_found', 'No such invitation in your team');
  if (inv.acceptedAt) throw new ApiError(409, 'accepted', `${inv.email} has already joined; change their role or remove them instead`);
  if (inv.revokedAt) throw new ApiError(409, 'revoked', `The invitation to ${inv.email} was revoked; invite them again`);
  return inv;
}

/** The owner takes back a pending invitation: its link stops working at once. */
export function revokeInvitation(database: DB, owner: Member, id: string) {
  const inv = pending(database, owner.team.id, id);
  database.transaction((tx) => {
    tx.update(invitations).set({ revokedAt: Date.now() }).where(and(eq(invitations.id, inv.id), isNull(invitations.revokedAt))).run();
    recordAudit(tx, { teamId: owner.team.id, actorId: owner.user.id, action: 'invitation.revoked', entity: 'invitation', entityId: inv.id, data: { email: inv.email } });
  });
  return { id: inv.id, email: inv.email, role: inv.role };
}

/**
 * The owner sends a pending (or expired) invitation again: a new link with a
 * fresh week to answer; the old link stops working (only the token's hash is
 * kept, so the old one cannot be sent twice).
 */
export function resendInvitation(database: DB, owner: Member, id: string, baseUrl: string) {
  const inv = pending(database, owner.team.id, id);
  const token = newToken();
  const expiresAt = Date.now() + INVITE_DAYS * 86400_000;
  database.transaction((tx) => {
    tx.update(invitations).set({ tokenHash: sha256Hex(token), expiresAt }).where(eq(invitations.id, inv.id)).run();
    recordAudit(tx, { teamId: owner.team.id, actorId: owner.user.id, action: 'invitation.resent', entity: 'invitation', entityId: inv.id, data: { email: inv.email } });
  });
  const link = `${baseUrl}/invite/${token}`;
  const mail = invitationMail({ teamName: owner.team.name, inviterName: owner.user.name, role: inv.role, link });
  queueMail(database, { teamId: owner.team.id, to: inv.email, ...mail });
  return { id: inv.id, email: inv.email, role: inv.role, expiresAt };
}
