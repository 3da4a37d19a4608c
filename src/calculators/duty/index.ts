import type { CalculatorDefinition } from '../types.ts';
import { impact } from './impact.ts';
import { roadPower } from './roadPower.ts';

export const dutyCalculators: readonly CalculatorDefinition[] = [roadPower, impact];
