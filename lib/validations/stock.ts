import { z } from 'zod';

// A delivery onto the shelf, or a manual adjustment (a count, a spill, a
// bottle given away), in the colorant's own unit, always with a reason.
export const stockMovementSchema = z
  .object(
    {
      kind: z.enum(['delivery', 'adjustment'], { error: 'kind must be delivery or adjustment' }),
      amount: z.number({ error: 'amount must be a number' }).refine((n) => n !== 0, 'amount cannot be 0').refine((n) => Math.abs(n) <= 1e9, 'amount must be at most 1000000000'),
      note: z.string({ error: 'note must be text' }).trim().min(1, 'say what this movement is (a supplier, a recount, a spill…)').max(500, 'note must be at most 500 characters'),
    },
    { error: 'the body must be a JSON object' },
  )
  .superRefine((m, ctx) => {
    if (m.kind === 'delivery' && m.amount < 0) ctx.addIssue({ code: 'custom', path: ['amount'], message: 'a delivery adds stock: give a positive amount (use an adjustment to take stock out)' });
  });

export type StockMovementInput = z.infer<typeof stockMovementSchema>;
