import type { CalculatorDefinition } from '../types.ts';
import { sdof } from './sdof.ts';
import { forcedResponseCalc } from './forced-response.ts';
import { logDecrementCalc } from './log-decrement.ts';
import { halfPowerCalc } from './half-power.ts';
import { ringDownCalc } from './ring-down.ts';
import { tmdTuningCalc } from './tmd-tuning.ts';
import { energyPerCycle } from './energyPerCycle.ts';
import { damperSimulation } from './damperSimulation.ts';
import { fvFit } from './fvFit.ts';

export const vibrationCalculators: readonly CalculatorDefinition[] = [
  sdof, forcedResponseCalc, logDecrementCalc, halfPowerCalc, ringDownCalc, tmdTuningCalc, energyPerCycle, damperSimulation, fvFit,
];
