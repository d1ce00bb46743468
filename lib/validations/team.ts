import { z } from 'zod';
import { isTimeZone } from '@/lib/format/dates';
import { VOLUME_UNITS } from '@/lib/recipes/units';

export const teamSettingsSchema = z.object({
  defaultTolerance: z.coerce.number({ error: 'tolerance must be a number' }).gt(0, 'tolerance must be more than 0').max(20, 'tolerance must be at most 20 ΔE00'),
  volumeUnit: z.enum(VOLUME_UNITS, { error: `unit must be one of ${VOLUME_UNITS.join(', ')}` }),
  dropsPerMl: z.coerce.number({ error: 'drops per mL must be a number' }).min(5, 'drops per mL must be at least 5').max(60, 'drops per mL must be at most 60'),
  // ISO 4217 code of the shop's currency (costs in the libraries are in it);
  // a form without the field leaves it as it is.
  currency: z.string({ error: 'currency must be a code like USD' }).trim().toUpperCase().regex(/^[A-Z]{3}$/, 'currency must be a three-letter code (ISO 4217), like USD or EUR').optional(),
  // A checkbox: present ("on") when ticked, absent otherwise.
  stockDrawsPours: z.preprocess((v) => v === 'on' || v === 'true' || v === true, z.boolean()),
  sprueAllowanceMl: z.coerce.number({ error: 'sprue allowance must be a number' }).min(0, 'sprue allowance cannot be negative').max(500, 'sprue allowance must be at most 500 mL'),
  // The shop's time zone (IANA name): dates on pages and printed sheets read in it.
  timeZone: z.string().trim().max(64).refine(isTimeZone, 'choose a time zone from the list').optional(),
});
