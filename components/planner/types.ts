import type { DoseUnit } from '@/lib/enums';
import type { VolumeUnit } from '@/lib/recipes';

// What the run planner is handed by its page: the shop's standards, molds and settings.
export type PlannerStandard = { matchId: string; name: string; moldId: string | null; zones: { name: string }[]; recipe: { zone: string; colorantId: string; colorant: string; amount: number; unit: DoseUnit }[] };
export type PlannerMold = { id: string; name: string; cavities: number; mlPerCavity: number };
export type PlannerSettings = { volumeUnit: VolumeUnit; dropsPerMl: number; sprueAllowanceMl: number; currency: string };
