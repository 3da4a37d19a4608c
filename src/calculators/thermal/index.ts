import type { CalculatorDefinition } from '../types.ts';
import { bodyCoolingCalc } from './bodyCooling.ts';
import { steadyTemperatureCalc } from './steadyTemperature.ts';
import { powerRatingCalc } from './powerRating.ts';
import { warmUpCalc } from './warmUp.ts';
import { oilViscosityCalc } from './oilViscosity.ts';
import { dampingFadeCalc } from './dampingFade.ts';
import { fadeFitCalc } from './fadeFit.ts';
import { gasChargeCalc } from './gasCharge.ts';
import { thermalLifeCalc } from './thermalLife.ts';

export const thermalCalculators: readonly CalculatorDefinition[] = [
  bodyCoolingCalc, steadyTemperatureCalc, powerRatingCalc, warmUpCalc, oilViscosityCalc, dampingFadeCalc, fadeFitCalc, gasChargeCalc, thermalLifeCalc,
];
