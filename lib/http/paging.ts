import 'server-only';
import type { z } from 'zod';
import { ApiError, badRequest, describeZodError, json } from './api';

import type { Cursor, PageOf, PageRequest } from '@/db/queries/paging';

export type Paged<T> = { items: T[]; nextCursor: string | null };

export const DEFAULT_PAGE = 50;

export function encodeCursor(c: Cursor): string {
  return Buffer.from(JSON.stringify([c.at, c.id])).toString('base64url');
}

export function decodeCursor(raw: string): Cursor {
  try {
    const v: unknown = JSON.parse(Buffer.from(raw, 'base64url').toString('utf8'));
    if (Array.isArray(v) && v.length === 2 && Number.isFinite(v[0]) && typeof v[1] === 'string' && v[1].length <= 64) return { at: v[0], id: v[1] };
  } catch {
    /* answered below */
  }
  throw new ApiError(400, 'invalid_query', 'cursor: not a cursor this API gave (use the nextCursor of the page before)');
}

// Reads a list route's query parameters with its schema: 400 on a bad one.
export function readQuery<T extends z.ZodType>(req: Request, schema: T): z.infer<T> {
  const params = Object.fromEntries(new URL(req.url).searchParams);
  const parsed = schema.safeParse(params);
  if (!parsed.success) throw badRequest(describeZodError(parsed.error), 'invalid_query');
  return parsed.data;
}

/** A cursor from a page's address, or null (the first page) when it is not one of ours. */
export function cursorOrNull(raw: string | string[] | undefined): Cursor | null {
  if (typeof raw !== 'string' || !raw) return null;
  try {
    return decodeCursor(raw);
  } catch {
    return null;
  }
}

/** The page asked for, or null when the caller asked for none (the route's old answer). */
export function pageOf(query: { limit?: number; cursor?: string }): PageRequest | null {
  if (query.limit === undefined && query.cursor === undefined) return null;
  return { limit: query.limit ?? DEFAULT_PAGE, cursor: query.cursor ? decodeCursor(query.cursor) : null };
}

/**
 * A list route's answer: without paging parameters the whole list as before (a plain
 * array); with `limit` or `cursor`, `{ items, nextCursor }` (null on the last page).
 */
export function listJson<T>(page: PageRequest | null, all: () => T[], paged: (p: PageRequest) => PageOf<T>) {
  if (!page) return json(all());
  const { items, next } = paged(page);
  const body: Paged<T> = { items, nextCursor: next ? encodeCursor(next) : null };
  return json(body);
}
