export * from './units';
export { scaleRecipe, type RecipeLineInput, type ScaledLine } from './scaleRecipe';
export { moldYield, type MoldForYield } from './moldYield';
export { parseAmount, type ParsedAmount } from './parseAmount';
export { convertDose } from './convertDose';
