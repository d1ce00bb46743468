import 'server-only';
import { and, eq, ne } from 'drizzle-orm';
import type { DB } from '@/db/open';
import type { Member } from '@/db/queries/members';
import { getPour } from '@/db/queries/pours';
import { matches, pours } from '@/db/schema';
import { recordAudit } from '@/lib/audit';
import { ApiError } from '@/lib/http/api';
import { queueMail } from '@/lib/mail/queue';
import { signOffRequestedMail } from '@/lib/mail/templates-production';
import { loadMatch } from '@/lib/matches/loadMatch';
import type { SubmitInput } from '@/lib/validations/production';
import { assertHasRecipe, leadsAndOwners, loadPour } from './recipients';

const SUBMITTABLE = new Set(['measured', 'rework']);

export const pourLink = (baseUrl: string, matchId: string, pourId: string) =>
  `${baseUrl}/matches/${encodeURIComponent(matchId)}?pour=${encodeURIComponent(pourId)}`;

// A maker asks for sign-off: the pour becomes 'submitted', the match goes
// into review, and every lead and owner of the team is e-mailed the figures.
// One pour of a match is in review at a time. The checks and the writes run
// in one transaction, so two submits cannot both pass the check.
export function submitPour(database: DB, member: Member, pourId: string, input: SubmitInput, baseUrl: string) {
  const teamId = member.team.id;
  const matchName = database.transaction((tx) => {
    const pour = loadPour(tx, teamId, pourId);
    const { match } = loadMatch(tx, teamId, pour.matchId);
    if (match.status === 'archived') throw new ApiError(409, 'archived', 'This match is archived; nothing of it goes to sign-off');
    if (!SUBMITTABLE.has(pour.status)) {
      throw new ApiError(409, 'not_submittable', `Pour #${pour.number} is ${pour.status}; only a measured pour or one sent back for rework can be submitted`);
    }
    const other = tx
      .select({ number: pours.number })
      .from(pours)
      .where(and(eq(pours.matchId, match.id), eq(pours.status, 'submitted'), ne(pours.id, pour.id)))
      .get();
    if (other) throw new ApiError(409, 'in_review', `Pour #${other.number} of this match is already waiting for sign-off`);
    assertHasRecipe(tx, pour, 'submitted');
    const now = Date.now();
    tx.update(pours).set({ status: 'submitted', submittedAt: now, submittedBy: member.user.id }).where(eq(pours.id, pour.id)).run();
    tx.update(matches).set({ status: 'in_review', updatedAt: now }).where(eq(matches.id, match.id)).run();
    recordAudit(tx, {
      teamId, actorId: member.user.id, action: 'pour.submitted', entity: 'pour', entityId: pour.id,
      data: { matchId: match.id, number: pour.number, note: input.note },
    });
    return match.name;
  });

  const view = getPour(database, teamId, pourId)!;
  const tolerance = loadMatch(database, teamId, view.matchId).match.tolerance;
  const mail = signOffRequestedMail({
    matchName,
    pourNumber: view.number,
    makerName: member.user.name,
    tolerance,
    zones: view.zones.map((z) => ({ name: z.name, dE00: z.dE00, band: z.band })),
    note: input.note,
    link: pourLink(baseUrl, view.matchId, view.id),
  });
  for (const to of leadsAndOwners(database, teamId)) queueMail(database, { teamId, to: to.email, ...mail });
  return view;
}
