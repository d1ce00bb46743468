import { z } from 'zod';
import { comparedZonesSchema, idField, neutralSchema, zoneName } from './match';

import { MAX_BAITS, MAX_BATCH_CUPS, MAX_COMMENT } from './limits';

// Sign-off and production batches (issue #6); the ceilings live in ./limits.
export { MAX_BAITS, MAX_BATCH_CUPS, MAX_COMMENT };

const comment = (name: string) =>
  z
    .string({ error: `${name} must be text` })
    .trim()
    .max(MAX_COMMENT, `${name} must be at most ${MAX_COMMENT} characters`);

// The body of a submit may be empty: `{}`, `null` or no body at all.
export const submitSchema = z
  .object({ note: comment('note').optional().nullable() }, { error: 'the body must be a JSON object' })
  .nullish()
  .transform((b) => ({ note: b?.note || null }));

export const SIGN_OFF_DECISIONS = ['approved', 'rework'] as const;

export const signOffSchema = z
  .object(
    {
      decision: z.enum(SIGN_OFF_DECISIONS, { error: `decision must be one of ${SIGN_OFF_DECISIONS.join(', ')}` }),
      comment: comment('comment').optional().nullable(),
    },
    { error: 'the body must be a JSON object' },
  )
  .superRefine((b, ctx) => {
    if (b.decision === 'rework' && !b.comment) {
      ctx.addIssue({ code: 'custom', path: ['comment'], message: 'say what to change' });
    }
  })
  .transform((b) => ({ decision: b.decision, comment: b.comment || null }));

const count = (name: string) =>
  z
    .number({ error: `${name} must be a number` })
    .int(`${name} must be a whole number`)
    .min(0, `${name} cannot be negative`)
    .max(MAX_BAITS, `${name} must be at most ${MAX_BAITS}`);

export const MAX_SHOTS = 10_000;

// A run plan as stored with a batch: which molds, how many shots of each.
export const planSchema = z
  .array(
    z.object(
      {
        moldId: idField,
        shots: z.number({ error: 'plan[].shots must be a number' }).int('plan[].shots must be a whole number').min(0, 'plan[].shots cannot be negative').max(MAX_SHOTS, `plan[].shots must be at most ${MAX_SHOTS}`),
      },
      { error: 'plan must be a list of { moldId, shots }' },
    ),
    { error: 'plan must be a list of { moldId, shots }' },
  )
  .min(1, 'a plan names at least one mold')
  .max(20, 'a plan has at most 20 molds')
  .refine((p) => new Set(p.map((l) => l.moldId)).size === p.length, 'each mold may appear once in a plan');

export const batchSchema = z.object(
  {
    photoId: idField,
    zones: comparedZonesSchema,
    neutral: neutralSchema.optional(),
    cups: z
      .number({ error: 'cups must be a number' })
      .gt(0, 'cups must be more than 0')
      .max(MAX_BATCH_CUPS, `cups must be at most ${MAX_BATCH_CUPS}`),
    moldId: idField.optional().nullable(),
    baits: count('baits').optional().nullable(),
    baitsExpected: count('baitsExpected').optional().nullable(),
    notes: z.string({ error: 'notes must be text' }).max(4000, 'notes must be at most 4000 characters').optional().nullable(),
    // Issue #13: the cups of each zone's colour (default: the batch split
    // evenly), the run plan poured, and the base the plastisol is drawn from.
    zoneCups: z
      .array(
        z.object({ zone: zoneName, cups: z.number({ error: 'zoneCups[].cups must be a number' }).gt(0, 'zoneCups[].cups must be more than 0').max(MAX_BATCH_CUPS) }, { error: 'zoneCups must be a list of { zone, cups }' }),
        { error: 'zoneCups must be a list of { zone, cups }' },
      )
      .max(16, 'at most 16 zones')
      .optional()
      .nullable(),
    plan: planSchema.optional().nullable(),
    baseColorantId: idField.optional().nullable(),
  },
  { error: 'the body must be a JSON object' },
);

export type SubmitInput = z.infer<typeof submitSchema>;
export type SignOffInput = z.infer<typeof signOffSchema>;
export type BatchInput = z.infer<typeof batchSchema>;
