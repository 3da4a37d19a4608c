import type { CalculatorDefinition } from '../types.ts';
import { sdof } from './sdof.ts';

export const vibrationCalculators: readonly CalculatorDefinition[] = [sdof];
