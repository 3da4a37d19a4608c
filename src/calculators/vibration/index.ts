import type { CalculatorDefinition } from '../types.ts';
import { sdof } from './sdof.ts';
import { energyPerCycle } from './energyPerCycle.ts';
import { damperSimulation } from './damperSimulation.ts';

export const vibrationCalculators: readonly CalculatorDefinition[] = [sdof, energyPerCycle, damperSimulation];
