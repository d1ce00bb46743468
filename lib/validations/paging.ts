import { z } from 'zod';
import { MATCH_STATUSES } from '@/lib/enums';

// Paging of the list routes: optional `limit` and `cursor` query parameters (the `nextCursor`
// of the page before). Without either, a route answers as it always did (a plain array).
export const MAX_PAGE = 200;

export const pageQuerySchema = z.object({
  limit: z.coerce
    .number({ error: 'limit must be a whole number' })
    .int('limit must be a whole number')
    .min(1, 'limit must be at least 1')
    .max(MAX_PAGE, `limit must be at most ${MAX_PAGE}`)
    .optional(),
  cursor: z.string().min(1, 'cursor cannot be empty').max(200, 'cursor is not one this API gave').optional(),
});

export const matchListQuerySchema = pageQuerySchema.extend({
  status: z.enum(MATCH_STATUSES, { error: `status must be one of ${MATCH_STATUSES.join(', ')}` }).optional(),
  q: z.string().trim().max(120, 'q must be at most 120 characters').optional(),
});
