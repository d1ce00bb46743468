import 'server-only';
// Shared by the server and the pour form (no database code here).
import type { ColorantKind, DoseUnit } from '@/db/schema';

/** Colorant kinds the Kubelka–Munk model doses. Flake is dosed by coverage; base and additives are not colour. */
export const MODELLED_KINDS: readonly ColorantKind[] = ['pigment', 'pearl', 'glow'];

/** The smallest step each unit is dosed in at the bench (common practice): ½ drop, 1/32 tsp, 0.1 g, 0.1 mL. */
export const DOSE_STEP: Record<DoseUnit, number> = { drops: 0.5, tsp: 1 / 32, g: 0.1, ml: 0.1 };

/** The model's key of a dose: the colorant and the unit it was dosed in. */
export const doseKey = (colorantId: string, unit: string) => `${colorantId}:${unit}`;
