import type { CalculatorDefinition } from '../types.ts';
import { harmonicDutyCalc } from './harmonicDutyCalc.ts';
import { impact } from './impact.ts';
import { recordedMotionCalc } from './recordedMotionCalc.ts';
import { roadPower } from './roadPower.ts';
import { storeyDampers } from './storeyDampersCalc.ts';
import { structuralDampers } from './structuralDampersCalc.ts';
import { propertyBoundsCalc } from './propertyBoundsCalc.ts';
import { testProtocolCalc } from './testProtocolCalc.ts';
import { randomDutyCalc } from './randomDutyCalc.ts';

export const dutyCalculators: readonly CalculatorDefinition[] = [harmonicDutyCalc, roadPower, impact, structuralDampers, storeyDampers, recordedMotionCalc, propertyBoundsCalc, testProtocolCalc, randomDutyCalc];
