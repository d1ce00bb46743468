import 'server-only';
import { and, eq } from 'drizzle-orm';
import type { DB } from '@/db/open';
import type { Member } from '@/db/queries/members';
import { getPour } from '@/db/queries/pours';
import { matches, pours, signOffs } from '@/db/schema';
import { recordAudit } from '@/lib/audit';
import { newId } from '@/lib/ids';
import { ApiError } from '@/lib/http/api';
import { queueMail } from '@/lib/mail/queue';
import { decisionMail } from '@/lib/mail/templates-production';
import { loadMatch } from '@/lib/matches/loadMatch';
import type { SignOffInput } from '@/lib/validations/production';
import { assertHasRecipe, loadPour, userById } from './recipients';
import { pourLink } from './submitPour';

// A lead's (or owner's) decision on a submitted pour, in one transaction.
// Approved: the pour becomes the match's standard, the standard it replaces
// is retired (kept, with its batches and history), and the match is approved.
// Rework: the pour is sent back with the comment and the match reopens —
// unless an earlier standard still stands, in which case the match stays
// approved on it, so its production batches keep their standard.
// The maker who submitted the pour (or, failing that, poured it) is e-mailed.
export function signOffPour(database: DB, member: Member, pourId: string, input: SignOffInput, baseUrl: string) {
  const teamId = member.team.id;
  const actorId = member.user.id;
  const done = database.transaction((tx) => {
    const pour = loadPour(tx, teamId, pourId);
    const { match } = loadMatch(tx, teamId, pour.matchId);
    if (match.status === 'archived') throw new ApiError(409, 'archived', 'This match is archived; its pours cannot be signed off');
    if (pour.status !== 'submitted') {
      throw new ApiError(409, 'not_submitted', `Pour #${pour.number} is ${pour.status}; only a pour submitted for sign-off can be decided`);
    }
    if (input.decision === 'approved') assertHasRecipe(tx, pour, 'approved');
    const now = Date.now();
    tx.insert(signOffs)
      .values({ id: newId(), teamId, matchId: match.id, pourId: pour.id, decision: input.decision, comment: input.comment, decidedBy: actorId, createdAt: now })
      .run();
    if (input.decision === 'approved') {
      const previous = match.standardPourId && match.standardPourId !== pour.id ? match.standardPourId : null;
      if (previous) {
        tx.update(pours).set({ status: 'retired' }).where(and(eq(pours.id, previous), eq(pours.matchId, match.id))).run();
      }
      tx.update(pours).set({ status: 'approved' }).where(eq(pours.id, pour.id)).run();
      tx.update(matches).set({ status: 'approved', standardPourId: pour.id, updatedAt: now }).where(eq(matches.id, match.id)).run();
      recordAudit(tx, {
        teamId, actorId, action: 'pour.approved', entity: 'pour', entityId: pour.id,
        data: { matchId: match.id, number: pour.number, comment: input.comment, submittedBy: pour.submittedBy },
      });
      recordAudit(tx, {
        teamId, actorId, action: 'standard.changed', entity: 'match', entityId: match.id,
        data: { from: match.standardPourId, to: pour.id, retired: previous },
      });
    } else {
      tx.update(pours).set({ status: 'rework' }).where(eq(pours.id, pour.id)).run();
      tx.update(matches).set({ status: match.standardPourId ? 'approved' : 'open', updatedAt: now }).where(eq(matches.id, match.id)).run();
      recordAudit(tx, {
        teamId, actorId, action: 'pour.rework', entity: 'pour', entityId: pour.id,
        data: { matchId: match.id, number: pour.number, comment: input.comment, submittedBy: pour.submittedBy },
      });
    }
    return { matchName: match.name, number: pour.number, makerId: pour.submittedBy ?? pour.createdBy, matchId: match.id };
  });

  const maker = userById(database, done.makerId);
  if (maker) {
    const mail = decisionMail({
      matchName: done.matchName,
      pourNumber: done.number,
      decision: input.decision,
      leadName: member.user.name,
      comment: input.comment,
      link: pourLink(baseUrl, done.matchId, pourId),
    });
    queueMail(database, { teamId, to: maker.email, ...mail });
  }
  return getPour(database, teamId, pourId)!;
}
