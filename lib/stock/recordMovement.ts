import 'server-only';
import type { DB } from '@/db/open';
import { getLiveColorant } from '@/db/queries/libraries';
import type { Member } from '@/db/queries/members';
import { recordAudit } from '@/lib/audit';
import { notFoundError } from '@/lib/http/api';
import type { StockMovementInput } from '@/lib/validations/stock';
import { moveStock } from './moveStock';

// A delivery or manual adjustment of one colorant of the member's team.
export function recordMovement(database: DB, member: Member, colorantId: string, input: StockMovementInput) {
  const teamId = member.team.id;
  return database.transaction((tx) => {
    const row = getLiveColorant(tx, teamId, colorantId);
    if (!row) throw notFoundError('No such colorant in your library');
    const balance = moveStock(tx, { teamId, colorantId, kind: input.kind, amount: input.amount, note: input.note, createdBy: member.user.id });
    recordAudit(tx, { teamId, actorId: member.user.id, action: `stock.${input.kind}`, entity: 'colorant', entityId: colorantId, data: { amount: input.amount, note: input.note } });
    return { colorantId, kind: input.kind, amount: input.amount, balance, note: input.note };
  });
}
