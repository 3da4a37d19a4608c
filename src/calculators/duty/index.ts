import type { CalculatorDefinition } from '../types.ts';

export const dutyCalculators: readonly CalculatorDefinition[] = [];
