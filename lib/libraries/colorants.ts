import 'server-only';
import { eq } from 'drizzle-orm';
import type { DB } from '@/db/open';
import { colorantView, findColorantByName, getLiveColorant } from '@/db/queries/libraries';
import type { Member } from '@/db/queries/members';
import { type Colorant, colorants } from '@/db/schema';
import { recordAudit } from '@/lib/audit';
import { newId } from '@/lib/ids';
import { badRequest, notFoundError } from '@/lib/http/api';
import { type ColorantInput, type ColorantPatch, FLAKE_SIZE_REQUIRED } from '@/lib/validations/library';
import { moveStock } from '@/lib/stock/moveStock';
import { assertNameFree, isUniqueViolation, nameTakenError } from './nameTaken';

type Columns = Omit<Colorant, 'id' | 'teamId' | 'archivedAt' | 'createdAt'>;

const blankToNull = (s: string | null | undefined) => (s ? s : null);

// The stored columns of a complete colorant. A flake size or colour means
// nothing on a pigment or a base, so they are kept only for a flake: turning
// a flake into a pearl drops them rather than leaving a stale size behind.
export function colorantColumns(c: ColorantInput): Columns {
  const flake = c.kind === 'flake';
  return {
    name: c.name,
    kind: c.kind,
    unit: c.unit,
    costPerUnit: c.costPerUnit ?? null,
    stock: c.stock ?? null,
    lowStockAt: c.lowStockAt ?? null,
    flakeSizeIn: flake ? (c.flakeSizeIn ?? null) : null,
    flakeColor: flake ? blankToNull(c.flakeColor) : null,
    swatchL: c.swatch?.l ?? null,
    swatchA: c.swatch?.a ?? null,
    swatchB: c.swatch?.b ?? null,
    notes: blankToNull(c.notes),
  };
}

function assertFlakeSized(c: ColorantInput) {
  if (c.kind === 'flake' && (c.flakeSizeIn === null || c.flakeSizeIn === undefined)) throw badRequest(`flakeSizeIn: ${FLAKE_SIZE_REQUIRED}`);
}

const NOT_IN_LIBRARY = 'No such colorant in your library';

export function createColorant(database: DB, member: Member, input: ColorantInput) {
  assertFlakeSized(input);
  const teamId = member.team.id;
  const id = newId();
  try {
    return database.transaction((tx) => {
      assertNameFree('colorant', input.name, findColorantByName(tx, teamId, input.name));
      tx.insert(colorants).values({ id, teamId, ...colorantColumns(input), stock: null }).run();
      // Stock enters through the ledger: the opening count is its first movement.
      if (input.stock !== null && input.stock !== undefined) {
        moveStock(tx, { teamId, colorantId: id, kind: 'adjustment', amount: input.stock, note: 'opening stock', createdBy: member.user.id });
      }
      recordAudit(tx, { teamId, actorId: member.user.id, action: 'colorant.created', entity: 'colorant', entityId: id, data: { name: input.name, kind: input.kind } });
      return colorantView(getLiveColorant(tx, teamId, id)!);
    });
  } catch (err) {
    if (isUniqueViolation(err)) throw nameTakenError('colorant', input.name);
    throw err;
  }
}

export function updateColorant(database: DB, member: Member, id: string, patch: ColorantPatch) {
  const teamId = member.team.id;
  try {
    return database.transaction((tx) => {
      const row = getLiveColorant(tx, teamId, id);
      if (!row) throw notFoundError(NOT_IN_LIBRARY);
      const current = colorantView(row);
      const changes = Object.fromEntries(Object.entries(patch).filter(([, v]) => v !== undefined)) as ColorantPatch;
      const merged: ColorantInput = { ...current, ...changes };
      assertFlakeSized(merged);
      if (changes.name !== undefined) assertNameFree('colorant', changes.name, findColorantByName(tx, teamId, changes.name, id));
      const { stock: _stock, ...columns } = colorantColumns(merged);
      tx.update(colorants).set(columns).where(eq(colorants.id, id)).run();
      // A stock typed into the form is a count of the shelf: the difference
      // goes into the ledger as an adjustment; blank stops keeping stock.
      if (changes.stock === null) tx.update(colorants).set({ stock: null }).where(eq(colorants.id, id)).run();
      else if (changes.stock !== undefined && changes.stock !== current.stock) {
        moveStock(tx, { teamId, colorantId: id, kind: 'adjustment', amount: changes.stock - (current.stock ?? 0), note: 'counted and set in the library', createdBy: member.user.id });
      }
      recordAudit(tx, { teamId, actorId: member.user.id, action: 'colorant.updated', entity: 'colorant', entityId: id, data: { fields: Object.keys(changes) } });
      return colorantView(getLiveColorant(tx, teamId, id)!);
    });
  } catch (err) {
    if (isUniqueViolation(err)) throw nameTakenError('colorant', patch.name ?? '');
    throw err;
  }
}

// Archiving takes the colorant out of the library (the list and the recipe
// picker); recipe lines keep pointing at the row, so old pours still show it.
export function archiveColorant(database: DB, member: Member, id: string) {
  const teamId = member.team.id;
  database.transaction((tx) => {
    const row = getLiveColorant(tx, teamId, id);
    if (!row) throw notFoundError(NOT_IN_LIBRARY);
    tx.update(colorants).set({ archivedAt: Date.now() }).where(eq(colorants.id, id)).run();
    recordAudit(tx, { teamId, actorId: member.user.id, action: 'colorant.archived', entity: 'colorant', entityId: id, data: { name: row.name } });
  });
  return { id, archived: true as const };
}
