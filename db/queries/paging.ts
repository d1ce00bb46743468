import 'server-only';
import { type SQL, and, eq, gt, lt, or } from 'drizzle-orm';
import type { SQLiteColumn } from 'drizzle-orm/sqlite-core';

/** Where the next page starts: the sort value and id of the last row of the page before. */
export type Cursor = { at: number; id: string };
export type PageRequest = { limit: number; cursor: Cursor | null };
export type PageOf<T> = { items: T[]; next: Cursor | null };

// Keyset paging (rows after the cursor in the order (at, id), descending or ascending): each
// page is one indexed range read, however deep, instead of an OFFSET that counts past the
// rows before it.
export function afterCursor(at: SQLiteColumn, id: SQLiteColumn, cursor: Cursor | null, order: 'asc' | 'desc'): SQL | undefined {
  if (!cursor) return undefined;
  const past = order === 'desc' ? lt : gt;
  return or(past(at, cursor.at), and(eq(at, cursor.at), past(id, cursor.id)));
}

// The query asks for one row past the page: its presence says there is a next page.
export function cutPage<R, T>(rows: R[], limit: number, key: (r: R) => Cursor, view: (rows: R[]) => T[]): PageOf<T> {
  const more = rows.length > limit;
  const kept = more ? rows.slice(0, limit) : rows;
  return { items: view(kept), next: more ? key(kept[kept.length - 1]!) : null };
}
