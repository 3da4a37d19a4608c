import type { CalculatorDefinition } from '../types.ts';
import { bodyCoolingCalculator } from './body-cooling.ts';
import { steadyTemperatureCalculator } from './steady-temperature.ts';
import { powerRatingCalculator } from './power-rating.ts';
import { warmUpCalculator } from './warm-up.ts';
import { oilViscosityCalculator } from './oil-viscosity.ts';
import { dampingFadeCalculator } from './damping-fade.ts';
import { fadeFitCalculator } from './fade-fit.ts';
import { gasChargeCalculator } from './gas-charge.ts';
import { thermalLifeCalculator } from './thermal-life.ts';

export const thermalCalculators: readonly CalculatorDefinition[] = [
  bodyCoolingCalculator, steadyTemperatureCalculator, powerRatingCalculator, warmUpCalculator, oilViscosityCalculator, dampingFadeCalculator, fadeFitCalculator, gasChargeCalculator, thermalLifeCalculator,
];
