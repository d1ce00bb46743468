import { z } from 'zod';
import { DOSE_UNITS } from '@/lib/enums';
import { shapeSchema } from '@/lib/color/shapeSchema';
import { parseAmount } from '@/lib/recipes/parseAmount';

export const zoneName = z
  .string({ error: 'a zone name must be text' })
  .trim()
  .toLowerCase()
  .min(1, 'a zone name cannot be empty')
  .max(40, 'a zone name must be at most 40 characters')
  .regex(/^[a-z0-9][a-z0-9 _-]*$/, 'a zone name uses letters, digits, spaces, - or _');

export const toleranceField = z
  .number({ error: 'tolerance must be a number (ΔE00)' })
  .gt(0, 'tolerance must be more than 0')
  .max(20, 'tolerance must be at most 20 ΔE00');

export const createMatchSchema = z.object({
  name: z.string({ error: 'name is required' }).trim().min(1, 'name is required').max(120, 'name must be at most 120 characters'),
  zones: z
    .array(zoneName, { error: 'zones must be a list of names' })
    .min(1, 'a match needs at least one zone')
    .max(12, 'a match has at most 12 zones')
    .refine((zs) => new Set(zs).size === zs.length, 'zone names must be different'),
  tolerance: toleranceField.optional(),
  notes: z.string().max(4000, 'notes must be at most 4000 characters').optional().nullable(),
});

export type CreateMatchInput = z.infer<typeof createMatchSchema>;

export const idField = z.string({ error: 'must be an id' }).min(1, 'must be an id').max(64, 'is not a valid id');

export const zoneRegionSchema = z.object({ name: zoneName, shape: shapeSchema });
/** A zone of a pour or batch may also mark the same zone of a physical reference in the same photo. */
export const comparedZoneSchema = zoneRegionSchema.extend({ reference: shapeSchema.optional() });
// The zones marked on a pour's or a batch's photo, each at most once.
export const comparedZonesSchema = z
  .array(comparedZoneSchema, { error: 'zones must be a list of { name, shape, reference? }' })
  .min(1, 'mark at least one zone')
  .max(16, 'at most 16 zones')
  .refine((zs) => new Set(zs.map((z) => z.name)).size === zs.length, 'each zone may be marked once');

export const neutralSchema = z.object({
  shape: shapeSchema,
  L: z.number({ error: 'L must be a number' }).gt(0, 'L must be > 0').max(100, 'L must be ≤ 100').optional(),
});

const zoneRegions = z
  .array(zoneRegionSchema, { error: 'zones must be a list of { name, shape }' })
  .min(1, 'mark at least one zone')
  .max(16, 'at most 16 zones')
  .refine((zs) => new Set(zs.map((z) => z.name)).size === zs.length, 'each zone may be marked once');

export const targetSchema = z.object({ photoId: idField, zones: zoneRegions, neutral: neutralSchema.optional() });

// Doses are per cup of plastisol. The ceilings are sanity limits against
// typing slips (a dose of 5000 drops per cup is not a recipe).
const MAX_PER_CUP: Record<(typeof DOSE_UNITS)[number], number> = { drops: 500, tsp: 48, g: 500, ml: 236.6 };

// An amount is a number, or text as a maker types it ("1/2", "1 1/4", "¼",
// "0,5"), read by the one dose parser; anything else is refused with its reason.
export const amountField = z
  .union([z.number(), z.string()], { error: 'amount must be a number' })
  .transform((v, ctx) => {
    const r = parseAmount(v);
    if (r.ok) return r.value;
    ctx.addIssue({ code: 'custom', message: typeof v === 'number' ? 'amount must be a number' : r.message });
    return z.NEVER;
  })
  .pipe(z.number().gt(0, 'amount must be more than 0'));

export const recipeLineSchema = z
  .object({
    zone: zoneName,
    colorantId: idField,
    amount: amountField,
    unit: z.enum(DOSE_UNITS, { error: `unit must be one of ${DOSE_UNITS.join(', ')}` }),
  })
  .refine((l) => l.amount <= MAX_PER_CUP[l.unit], { message: 'amount is more than a cup of plastisol could take', path: ['amount'] });

export const pourSchema = z.object({
  photoId: idField,
  recipe: z.array(recipeLineSchema, { error: 'recipe must be a list' }).max(60, 'at most 60 recipe lines'),
  moldId: idField.optional().nullable(),
  batchCups: z.number({ error: 'the batch size must be a number of cups' }).gt(0, 'the batch size must be more than 0 cups').max(400, 'the batch size must be at most 400 cups').optional().nullable(),
  tempF: z.number({ error: 'the temperature must be a number (°F)' }).min(32, 'the temperature must be at least 32 °F').max(500, 'the temperature must be at most 500 °F').optional().nullable(),
  notes: z.string().max(4000, 'notes must be at most 4000 characters').optional().nullable(),
  correctsPourId: idField.optional().nullable(),
  zones: comparedZonesSchema,
  neutral: neutralSchema.optional(),
});

export type TargetInput = z.infer<typeof targetSchema>;
export type PourInput = z.infer<typeof pourSchema>;

export const draftPhotoSchema = z.object({ photoId: idField });

// What may change on a match after it is created (pours never change).
export const editMatchSchema = z
  .object({
    name: createMatchSchema.shape.name.optional(),
    notes: z.string().max(4000, 'notes must be at most 4000 characters').nullable().optional(),
    tolerance: toleranceField.optional(),
  })
  .refine((v) => v.name !== undefined || v.notes !== undefined || v.tolerance !== undefined, 'give a name, notes or tolerance to change');
export type EditMatchInput = z.infer<typeof editMatchSchema>;
