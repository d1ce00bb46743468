import { z } from 'zod';
import { COLORANT_KINDS, DOSE_UNITS, THICKNESS } from '@/lib/enums';

// The colorant and mold libraries: one schema per entity serves the forms on
// /colorants and /molds and the route handlers. Optional fields take null to
// clear them (PATCH) and are treated the same as absent on create.

const libraryName = (what: string) =>
  z
    .string({ error: 'name is required' })
    .trim()
    .min(1, 'name is required')
    .max(80, `name must be at most 80 characters (a short name the ${what} is known by at the bench)`);

// A blank number is "required" (forms send null for an empty input), anything
// else that is not a number "must be a number".
const num = (label: string) =>
  z.number({ error: (iss) => (iss.input === undefined || iss.input === null ? `${label} is required` : `${label} must be a number`) });

export const FLAKE_SIZE_MIN_IN = 0.005;
export const FLAKE_SIZE_MAX_IN = 0.25;

export const labSchema = z.object(
  {
    l: num('L*').min(0, 'L* must be between 0 and 100').max(100, 'L* must be between 0 and 100'),
    a: num('a*').min(-128, 'a* must be between −128 and 127').max(127, 'a* must be between −128 and 127'),
    b: num('b*').min(-128, 'b* must be between −128 and 127').max(127, 'b* must be between −128 and 127'),
  },
  { error: 'swatch must be a Lab value { l, a, b }' },
);

const OBJECT = { error: 'the body must be a JSON object' };

export const colorantFields = z.object({
  name: libraryName('colorant'),
  kind: z.enum(COLORANT_KINDS, { error: `kind must be one of ${COLORANT_KINDS.join(', ')}` }),
  unit: z.enum(DOSE_UNITS, { error: `unit must be one of ${DOSE_UNITS.join(', ')}` }),
  costPerUnit: num('cost per unit').min(0, 'cost per unit cannot be negative').max(100000, 'cost per unit must be at most 100000').nullish(),
  stock: num('stock').min(0, 'stock cannot be negative').max(1e9, 'stock must be at most 1000000000').nullish(),
  lowStockAt: num('low-stock mark').min(0, 'low-stock mark cannot be negative').max(1e9, 'low-stock mark must be at most 1000000000').nullish(),
  flakeSizeIn: num('flake size')
    .min(FLAKE_SIZE_MIN_IN, `flake size must be at least ${FLAKE_SIZE_MIN_IN} in`)
    .max(FLAKE_SIZE_MAX_IN, `flake size must be at most ${FLAKE_SIZE_MAX_IN} in`)
    .nullish(),
  flakeColor: z.string({ error: 'flake colour must be text' }).trim().max(40, 'flake colour must be at most 40 characters').nullish(),
  swatch: labSchema.nullish(),
  notes: z.string({ error: 'notes must be text' }).trim().max(2000, 'notes must be at most 2000 characters').nullish(),
}, OBJECT);

export const FLAKE_SIZE_REQUIRED = `a flake needs its size in inches (${FLAKE_SIZE_MIN_IN} to ${FLAKE_SIZE_MAX_IN})`;

export const colorantSchema = colorantFields.superRefine((c, ctx) => {
  if (c.kind === 'flake' && (c.flakeSizeIn === undefined || c.flakeSizeIn === null)) {
    ctx.addIssue({ code: 'custom', path: ['flakeSizeIn'], message: FLAKE_SIZE_REQUIRED });
  }
});

const NOTHING_TO_CHANGE = 'the body names no field to change';
const hasAField = (o: object) => Object.values(o).some((v) => v !== undefined);

// A partial edit; whether a flake keeps its size is checked against the stored
// row (lib/libraries), since the size may already be there.
export const colorantPatchSchema = colorantFields.partial().refine(hasAField, NOTHING_TO_CHANGE);

export const moldFields = z.object({
  name: libraryName('mold'),
  bodyStyle: z
    .string({ error: 'body style is required' })
    .trim()
    .min(1, 'body style is required (stick worm, craw, swimbait…)')
    .max(40, 'body style must be at most 40 characters'),
  lengthIn: num('length').min(0.5, 'length must be at least 0.5 in').max(24, 'length must be at most 24 in').nullish(),
  cavities: num('cavities').int('cavities must be a whole number').min(1, 'cavities must be at least 1').max(50, 'cavities must be at most 50'),
  mlPerCavity: num('plastisol per cavity').min(0.1, 'plastisol per cavity must be at least 0.1 mL').max(500, 'plastisol per cavity must be at most 500 mL'),
  thickness: z.enum(THICKNESS, { error: `thickness must be one of ${THICKNESS.join(', ')}` }),
}, OBJECT);

export const moldSchema = moldFields;
export const moldPatchSchema = moldFields.partial().refine(hasAField, NOTHING_TO_CHANGE);

export type ColorantInput = z.output<typeof colorantSchema>;
export type ColorantPatch = z.output<typeof colorantPatchSchema>;
export type MoldInput = z.output<typeof moldSchema>;
export type MoldPatch = z.output<typeof moldPatchSchema>;
