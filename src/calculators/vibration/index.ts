import type { CalculatorDefinition } from '../types.ts';
import { sdofCalculator } from './sdof.ts';
import { forcedResponseCalculator } from './forced-response.ts';
import { logDecrementCalculator } from './log-decrement.ts';
import { halfPowerCalculator } from './half-power.ts';
import { ringDownCalculator } from './ring-down.ts';
import { tmdTuningCalculator } from './tmd-tuning.ts';
import { energyPerCycleCalculator } from './energy-per-cycle.ts';
import { damperSimulationCalculator } from './damper-simulation.ts';
import { fvFitCalculator } from './fv-fit.ts';

export const vibrationCalculators: readonly CalculatorDefinition[] = [
  sdofCalculator, forcedResponseCalculator, logDecrementCalculator, halfPowerCalculator, ringDownCalculator, tmdTuningCalculator, energyPerCycleCalculator, damperSimulationCalculator, fvFitCalculator,
];
