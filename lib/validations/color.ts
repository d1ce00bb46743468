import { z } from 'zod';
import { neutralSchema, zoneRegionSchema } from './match';

const finite = (name: string, min: number, max: number) =>
  z.number({ error: `${name} must be a number` }).min(min, `${name} must be ≥ ${min}`).max(max, `${name} must be ≤ ${max}`);

// CIELAB (D65): L* 0..100; a*, b* bounded generously around real colours.
export const labSchema = z.object({ l: finite('l', 0, 100), a: finite('a', -200, 200), b: finite('b', -200, 200) });

export const deltaESchema = z.object({
  reference: labSchema,
  sample: labSchema,
  tolerance: z.number({ error: 'tolerance must be a number' }).gt(0, 'tolerance must be > 0').max(100, 'tolerance must be ≤ 100').optional(),
});

// Regions of /api/measure: any names (not only a match's zones), 1..16 of them.
export const measureRegionsSchema = z
  .array(zoneRegionSchema.extend({ name: z.string({ error: 'name must be text' }).trim().min(1, 'name is required').max(60, 'name must be at most 60 characters') }), {
    error: 'regions must be a JSON list of { name, shape }',
  })
  .min(1, 'give at least one region')
  .max(16, 'at most 16 regions');

export const measureNeutralSchema = neutralSchema;
