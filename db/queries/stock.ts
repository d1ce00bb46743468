import 'server-only';
import { and, desc, eq, inArray, sql } from 'drizzle-orm';
import type { DB } from '../open';
import { colorants, stockMovements, users } from '../schema';

type Reader = Pick<DB, 'select'>;

// The last movements of one colorant of the team, newest first.
export function listMovements(database: Reader, teamId: string, colorantId: string, limit = 20) {
  return database
    .select({
      id: stockMovements.id, kind: stockMovements.kind, amount: stockMovements.amount, balance: stockMovements.balance,
      batchId: stockMovements.batchId, pourId: stockMovements.pourId, note: stockMovements.note, by: users.name, createdAt: stockMovements.createdAt,
    })
    .from(stockMovements)
    .leftJoin(users, eq(users.id, stockMovements.createdBy))
    .where(and(eq(stockMovements.teamId, teamId), eq(stockMovements.colorantId, colorantId)))
    .orderBy(desc(stockMovements.createdAt), desc(sql`"stock_movements"."rowid"`))
    .limit(limit)
    .all();
}

export type MovementView = ReturnType<typeof listMovements>[number];

// Every movement a batch made, with the colorant's name and unit.
export function batchMovements(database: Reader, teamId: string, batchIds: string[]) {
  if (batchIds.length === 0) return [];
  return database
    .select({ batchId: stockMovements.batchId, colorantId: stockMovements.colorantId, name: colorants.name, unit: colorants.unit, amount: stockMovements.amount, balance: stockMovements.balance })
    .from(stockMovements)
    .innerJoin(colorants, eq(colorants.id, stockMovements.colorantId))
    .where(and(eq(stockMovements.teamId, teamId), inArray(stockMovements.batchId, batchIds)))
    .all();
}

// One colorant's stock (archived ones too: their ledger stays readable).
export function getStock(database: Reader, teamId: string, colorantId: string) {
  const c = database
    .select({ id: colorants.id, name: colorants.name, unit: colorants.unit, stock: colorants.stock, lowStockAt: colorants.lowStockAt })
    .from(colorants)
    .where(and(eq(colorants.id, colorantId), eq(colorants.teamId, teamId)))
    .get();
  if (!c) return null;
  return { ...c, low: c.stock !== null && c.lowStockAt !== null && c.stock < c.lowStockAt };
}
