import 'server-only';
import { and, eq, inArray } from 'drizzle-orm';
import type { DB } from '../open';
import { outgoingMail } from '../schema';

/** Of the given outgoing-mail ids, those the app queued on behalf of this team. */
export function teamMailAmong(database: DB, teamId: string, ids: string[]): Set<string> {
  const found = new Set<string>();
  for (let i = 0; i < ids.length; i += 500) {
    const rows = database
      .select({ id: outgoingMail.id })
      .from(outgoingMail)
      .where(and(eq(outgoingMail.teamId, teamId), inArray(outgoingMail.id, ids.slice(i, i + 500))))
      .all();
    for (const r of rows) found.add(r.id);
  }
  return found;
}
