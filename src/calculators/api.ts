/**
 * `dampbook/calculator`: the stable entry point of the calculator definition API for a team's own
 * calculators (`<handbook>/calculators/*.ts`, each `export default defineCalculator({ … })`).
 * What is exported here keeps its meaning across tool upgrades; see README "Your own handbook".
 */
export { defineCalculator, num, onlyWhen, optNum } from './types.ts';
export type { CalculatorDefinition, ChartSpec, InputDef, NumberInput, OutputDef, Result, Values, VerificationCase } from './types.ts';
export { describeLaw, lawFromValues, lawInputs, lawStudy, seriesStiffness } from './shared/damperLawInputs.ts';
export { q } from './quantityText.ts';
