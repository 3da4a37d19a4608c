import type { CalculatorDefinition } from '../types.ts';

export const thermalCalculators: readonly CalculatorDefinition[] = [];
