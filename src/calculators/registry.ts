/**
 * Every calculator, by id. Each domain keeps its own list so parallel work does not collide;
 * this file only joins them. Add a calculator to its domain's list, not here.
 */
import { vibrationCalculators } from './vibration/index.ts';
import { dutyCalculators } from './duty/index.ts';
import { thermalCalculators } from './thermal/index.ts';
import type { CalculatorDefinition } from './types.ts';

export const calculators: readonly CalculatorDefinition[] = [...vibrationCalculators, ...dutyCalculators, ...thermalCalculators];

const byId = new Map(calculators.map((c) => [c.id, c]));
if (byId.size !== calculators.length) throw new Error('registry: duplicate calculator id');

export function getCalculator(id: string): CalculatorDefinition | undefined {
  return byId.get(id);
}

export function calculatorIds(): string[] {
  return calculators.map((c) => c.id);
}
