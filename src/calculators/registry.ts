/**
 * Every calculator, by id. Each domain keeps its own list so parallel work does not collide;
 * this file only joins them. Add a calculator to its domain's list, not here.
 */
import { vibrationCalculators } from './vibration/index.ts';
import { dutyCalculators } from './duty/index.ts';
import { thermalCalculators } from './thermal/index.ts';
import type { CalculatorDefinition } from './types.ts';

/** Domains group the calculators (pages, CLI listing); the browser loads single calculators (loaders.ts). */
export const domains = { vibration: vibrationCalculators, duty: dutyCalculators, thermal: thermalCalculators } as const;
export type Domain = keyof typeof domains;

export const calculators: readonly CalculatorDefinition[] = Object.values(domains).flat();

const byId = new Map(calculators.map((c) => [c.id, c]));
if (byId.size !== calculators.length) throw new Error('registry: duplicate calculator id');

export function getCalculator(id: string): CalculatorDefinition | undefined {
  return byId.get(id);
}

export function calculatorIds(): string[] {
  return calculators.map((c) => c.id);
}
