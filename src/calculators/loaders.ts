/**
 * The browser's way to a calculator: one lazy import per calculator, so a page downloads only the
 * definitions it shows (a whole domain costs ~25 KB gzip; one calculator a few KB). Must list
 * exactly the registry's calculators: test/calculators/loaders.test.ts checks it.
 */
import { loadTeamDefinitions } from './teamSlot.ts';
import type { CalculatorDefinition } from './types.ts';

export const calculatorLoaders: Readonly<Record<string, () => Promise<CalculatorDefinition>>> = {
  sdof: () => import('./vibration/sdof.ts').then((m) => m.sdof),
  'forced-response': () => import('./vibration/forced-response.ts').then((m) => m.forcedResponseCalc),
  'log-decrement': () => import('./vibration/log-decrement.ts').then((m) => m.logDecrementCalc),
  'half-power': () => import('./vibration/half-power.ts').then((m) => m.halfPowerCalc),
  'ring-down': () => import('./vibration/ring-down.ts').then((m) => m.ringDownCalc),
  'tmd-tuning': () => import('./vibration/tmd-tuning.ts').then((m) => m.tmdTuningCalc),
  'energy-per-cycle': () => import('./vibration/energyPerCycle.ts').then((m) => m.energyPerCycle),
  'damper-simulation': () => import('./vibration/damperSimulation.ts').then((m) => m.damperSimulation),
  'fv-fit': () => import('./vibration/fvFit.ts').then((m) => m.fvFit),
  'harmonic-duty': () => import('./duty/harmonicDutyCalc.ts').then((m) => m.harmonicDutyCalc),
  'road-power': () => import('./duty/roadPower.ts').then((m) => m.roadPower),
  impact: () => import('./duty/impact.ts').then((m) => m.impact),
  'storey-dampers': () => import('./duty/storeyDampersCalc.ts').then((m) => m.storeyDampers),
  'structural-dampers': () => import('./duty/structuralDampersCalc.ts').then((m) => m.structuralDampers),
  'recorded-motion': () => import('./duty/recordedMotionCalc.ts').then((m) => m.recordedMotionCalc),
  'property-bounds': () => import('./duty/propertyBoundsCalc.ts').then((m) => m.propertyBoundsCalc),
  'test-protocol': () => import('./duty/testProtocolCalc.ts').then((m) => m.testProtocolCalc),
  'random-duty': () => import('./duty/randomDutyCalc.ts').then((m) => m.randomDutyCalc),
  'body-cooling': () => import('./thermal/bodyCooling.ts').then((m) => m.bodyCoolingCalc),
  'steady-temperature': () => import('./thermal/steadyTemperature.ts').then((m) => m.steadyTemperatureCalc),
  'power-rating': () => import('./thermal/powerRating.ts').then((m) => m.powerRatingCalc),
  'warm-up': () => import('./thermal/warmUp.ts').then((m) => m.warmUpCalc),
  'oil-viscosity': () => import('./thermal/oilViscosity.ts').then((m) => m.oilViscosityCalc),
  'damping-fade': () => import('./thermal/dampingFade.ts').then((m) => m.dampingFadeCalc),
  'fade-fit': () => import('./thermal/fadeFit.ts').then((m) => m.fadeFitCalc),
  'gas-charge': () => import('./thermal/gasCharge.ts').then((m) => m.gasChargeCalc),
  'thermal-life': () => import('./thermal/thermalLife.ts').then((m) => m.thermalLifeCalc),
};

/** A built-in's own chunk, else the handbook's team calculators (one lazy chunk; none in the demo). */
export async function loadCalculator(id: string): Promise<CalculatorDefinition | undefined> {
  if (Object.hasOwn(calculatorLoaders, id)) return calculatorLoaders[id]!();
  return (await loadTeamDefinitions()).find((d) => d.id === id);
}
