import 'server-only';
import type { DB } from '@/db/open';
import { auditEvents } from '@/db/schema';
import { newId } from '@/lib/ids';

type Tx = Pick<DB, 'insert'>;

export function recordAudit(
  database: Tx,
  e: { teamId: string | null; actorId: string | null; action: string; entity: string; entityId?: string | null; data?: unknown },
) {
  database
    .insert(auditEvents)
    .values({ id: newId(), teamId: e.teamId, actorId: e.actorId, action: e.action, entity: e.entity, entityId: e.entityId ?? null, data: e.data ?? null })
    .run();
}
