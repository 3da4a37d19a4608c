import type { CalculatorDefinition } from '../types.ts';
import { harmonicDutyCalculator } from './harmonic-duty.ts';
import { impactCalculator } from './impact.ts';
import { recordedMotionCalculator } from './recorded-motion.ts';
import { roadPowerCalculator } from './road-power.ts';
import { storeyDampersCalculator } from './storey-dampers.ts';
import { structuralDampersCalculator } from './structural-dampers.ts';
import { propertyBoundsCalculator } from './property-bounds.ts';
import { testProtocolCalculator } from './test-protocol.ts';
import { randomDutyCalculator } from './random-duty.ts';

export const dutyCalculators: readonly CalculatorDefinition[] = [harmonicDutyCalculator, roadPowerCalculator, impactCalculator, structuralDampersCalculator, storeyDampersCalculator, recordedMotionCalculator, propertyBoundsCalculator, testProtocolCalculator, randomDutyCalculator];
