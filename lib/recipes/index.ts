export * from './units';
export { scaleRecipe, type RecipeLineInput, type ScaledLine } from './scaleRecipe';
export { moldYield, type MoldForYield } from './moldYield';
export { splitZoneCups, zoneCupsProblem, type ZoneCups } from './splitZoneCups';
export { convertDose } from './convertDose';
export { planRun, type RunPlan, type RunPlanInput, type PlanMoldInput, type PlanZoneInput, type PlannedMold, type PlannedZone } from './planRun';
export { batchDraws, type Draw, type DrawColorant, type DrawLine, type Undrawn } from './batchDraws';
export { batchCost, type BatchCost, type CostMold } from './batchCost';
export { encodeBatchPrefill, decodeBatchPrefill, type BatchPrefill } from './batchPrefill';
