import 'server-only';
import { and, eq, isNotNull, sql } from 'drizzle-orm';
import type { DB } from '@/db/open';
import { colorants, stockMovements, type StockMovementKind } from '@/db/schema';
import { newId } from '@/lib/ids';

type Tx = Pick<DB, 'insert' | 'update'>;

export type Movement = {
  teamId: string;
  colorantId: string;
  kind: StockMovementKind;
  /** Signed, in the colorant's unit: negative takes stock out. */
  amount: number;
  batchId?: string | null;
  pourId?: string | null;
  note?: string | null;
  createdBy: string | null;
};

// One movement of the ledger and the balance it leaves, written together.
// The balance changes by an increment inside the UPDATE (never read, changed
// and written back), so two batches logged at once both move the shelf; call
// it inside the transaction that records what caused the movement.
// A draw (batch, test pour) from a colorant whose stock the shop does not keep
// (blank in the library) moves nothing and answers null; a delivery or an
// adjustment starts keeping it.
export function moveStock(tx: Tx, m: Movement): number | null {
  const draw = m.kind === 'batch' || m.kind === 'pour';
  const row = tx
    .update(colorants)
    .set({ stock: sql`coalesce(${colorants.stock}, 0) + ${m.amount}` })
    .where(and(eq(colorants.id, m.colorantId), eq(colorants.teamId, m.teamId), draw ? isNotNull(colorants.stock) : undefined))
    .returning({ stock: colorants.stock })
    .get();
  if (!row && draw) return null;
  if (!row) throw new Error(`colorant ${m.colorantId} is not in team ${m.teamId}`);
  const balance = row.stock ?? 0;
  tx.insert(stockMovements)
    .values({
      id: newId(), teamId: m.teamId, colorantId: m.colorantId, kind: m.kind, amount: m.amount, balance,
      batchId: m.batchId ?? null, pourId: m.pourId ?? null, note: m.note ?? null, createdBy: m.createdBy,
    })
    .run();
  return balance;
}
