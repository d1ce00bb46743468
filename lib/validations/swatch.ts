import { z } from 'zod';
import { DOSE_UNITS } from '@/lib/enums';
import { shapeSchema } from '@/lib/color/shapeSchema';
import { idField, neutralSchema } from './match';

// A calibration swatch: a known dose per cup of one colorant in the base plastisol (0 for a
// swatch of the base alone), the photo it was measured on, and where on it.
export const swatchSchema = z.object({
  photoId: idField,
  shape: shapeSchema,
  neutral: neutralSchema.optional(),
  amount: z.number({ error: 'amount must be a number (per cup)' }).min(0, 'amount cannot be negative').max(500, 'amount is more than a cup of plastisol could take'),
  unit: z.enum(DOSE_UNITS, { error: `unit must be one of ${DOSE_UNITS.join(', ')}` }).optional(),
  notes: z.string().max(2000, 'notes must be at most 2000 characters').optional().nullable(),
});

export type SwatchInput = z.infer<typeof swatchSchema>;

// POST /api/matches/:id/starting-recipe: optionally the colorants to choose from (else every
// characterised one). An empty body is the same as {}.
export const startingRecipeSchema = z
  .object({
    colorantIds: z.array(idField, { error: 'colorantIds must be a list of colorant ids' }).min(1, 'colorantIds names at least one colorant').max(12, 'at most 12 colorants').optional(),
  })
  .optional()
  .transform((v) => v ?? {});
