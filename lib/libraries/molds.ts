import 'server-only';
import { eq } from 'drizzle-orm';
import type { DB } from '@/db/open';
import { findMoldByName, getLiveMold, moldView } from '@/db/queries/libraries';
import type { Member } from '@/db/queries/members';
import { molds } from '@/db/schema';
import { recordAudit } from '@/lib/audit';
import { newId } from '@/lib/ids';
import { notFoundError } from '@/lib/http/api';
import type { MoldInput, MoldPatch } from '@/lib/validations/library';
import { assertNameFree, isUniqueViolation, nameTakenError } from './nameTaken';

const NOT_IN_LIBRARY = 'No such mold in your library';

export const moldColumns = (m: MoldInput) => ({
  name: m.name,
  bodyStyle: m.bodyStyle,
  lengthIn: m.lengthIn ?? null,
  cavities: m.cavities,
  mlPerCavity: m.mlPerCavity,
  thickness: m.thickness,
});

export function createMold(database: DB, member: Member, input: MoldInput) {
  const teamId = member.team.id;
  const id = newId();
  try {
    return database.transaction((tx) => {
      assertNameFree('mold', input.name, findMoldByName(tx, teamId, input.name));
      tx.insert(molds).values({ id, teamId, ...moldColumns(input) }).run();
      recordAudit(tx, { teamId, actorId: member.user.id, action: 'mold.created', entity: 'mold', entityId: id, data: { name: input.name } });
      return moldView(getLiveMold(tx, teamId, id)!);
    });
  } catch (err) {
    if (isUniqueViolation(err)) throw nameTakenError('mold', input.name);
    throw err;
  }
}

export function updateMold(database: DB, member: Member, id: string, patch: MoldPatch) {
  const teamId = member.team.id;
  try {
    return database.transaction((tx) => {
      const row = getLiveMold(tx, teamId, id);
      if (!row) throw notFoundError(NOT_IN_LIBRARY);
      const changes = Object.fromEntries(Object.entries(patch).filter(([, v]) => v !== undefined)) as MoldPatch;
      if (changes.name !== undefined) assertNameFree('mold', changes.name, findMoldByName(tx, teamId, changes.name, id));
      tx.update(molds).set(moldColumns({ ...moldView(row), ...changes })).where(eq(molds.id, id)).run();
      recordAudit(tx, { teamId, actorId: member.user.id, action: 'mold.updated', entity: 'mold', entityId: id, data: { fields: Object.keys(changes) } });
      return moldView(getLiveMold(tx, teamId, id)!);
    });
  } catch (err) {
    if (isUniqueViolation(err)) throw nameTakenError('mold', patch.name ?? '');
    throw err;
  }
}

// Archiving takes the mold out of the library; pours and batches that used it
// keep their link and still show it.
export function archiveMold(database: DB, member: Member, id: string) {
  const teamId = member.team.id;
  database.transaction((tx) => {
    const row = getLiveMold(tx, teamId, id);
    if (!row) throw notFoundError(NOT_IN_LIBRARY);
    tx.update(molds).set({ archivedAt: Date.now() }).where(eq(molds.id, id)).run();
    recordAudit(tx, { teamId, actorId: member.user.id, action: 'mold.archived', entity: 'mold', entityId: id, data: { name: row.name } });
  });
  return { id, archived: true as const };
}
