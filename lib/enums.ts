// The words of the data model as constants, with no database code, so the
// schema (db/schema.ts) and the browser's components share them without the
// browser ever loading drizzle or the table definitions.

export const ROLES = ['owner', 'lead', 'maker', 'viewer'] as const;
export type Role = (typeof ROLES)[number];
export const MATCH_STATUSES = ['open', 'in_review', 'approved', 'archived'] as const;
export type MatchStatus = (typeof MATCH_STATUSES)[number];
export const POUR_STATUSES = ['measured', 'submitted', 'approved', 'rework', 'retired'] as const;
export type PourStatus = (typeof POUR_STATUSES)[number];
export const COLORANT_KINDS = ['base', 'pigment', 'pearl', 'flake', 'glow', 'additive'] as const;
export type ColorantKind = (typeof COLORANT_KINDS)[number];
export const DOSE_UNITS = ['drops', 'tsp', 'g', 'ml'] as const;
export type DoseUnit = (typeof DOSE_UNITS)[number];
export const PHOTO_KINDS = ['reference', 'pour', 'batch', 'swatch'] as const;
export type PhotoKind = (typeof PHOTO_KINDS)[number];
export const THICKNESS = ['thin', 'standard', 'thick'] as const;
export const SAMPLE_PURPOSES = ['target', 'pour', 'batch', 'swatch'] as const;
export const STOCK_MOVEMENT_KINDS = ['batch', 'pour', 'adjustment', 'delivery'] as const;
export type StockMovementKind = (typeof STOCK_MOVEMENT_KINDS)[number];
