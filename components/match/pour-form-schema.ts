import { z } from 'zod';
import { parseAmount } from '@/lib/recipes/parseAmount';
import { pourSchema, recipeLineSchema } from '@/lib/validations/match';

// The pour form's fields as the maker types them; the limits are the pour route's own.
const optionalNumber = (schema: z.ZodNumber) => z.preprocess((v) => (v === '' || Number.isNaN(v) ? undefined : v), schema.optional());
// Batch size as a maker says it ("1 1/2", "¾"), through the one dose parser.
const optionalAmount = (schema: z.ZodNumber) =>
  z.preprocess((v, ctx) => {
    if (v === '' || v === undefined || v === null || Number.isNaN(v)) return undefined;
    const r = parseAmount(v as string | number);
    if (r.ok) return r.value;
    ctx.addIssue({ code: 'custom', message: r.message });
    return z.NEVER;
  }, schema.optional());
export const formSchema = z.object({
  recipe: z.array(recipeLineSchema.and(z.object({ colorantId: z.string().min(1, 'choose a colorant') }))),
  moldId: z.string().optional(),
  // The limits are the pour route's own (lib/validations/match.ts).
  batchCups: optionalAmount(pourSchema.shape.batchCups.unwrap().unwrap()),
  tempF: optionalNumber(pourSchema.shape.tempF.unwrap().unwrap()),
  notes: z.string().max(4000, 'notes must be at most 4000 characters').optional(),
  correctsPourId: z.string().optional(),
});
export type PourFormValues = z.input<typeof formSchema>;
