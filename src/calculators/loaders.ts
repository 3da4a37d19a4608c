/**
 * The browser's way to a calculator: one lazy import per calculator, so a page downloads only the
 * definitions it shows (a whole domain costs ~25 KB gzip; one calculator a few KB). Must list
 * exactly the registry's calculators: test/calculators/loaders.test.ts checks it.
 */
import { loadTeamDefinitions } from './teamSlot.ts';
import type { CalculatorDefinition } from './types.ts';

export const calculatorLoaders: Readonly<Record<string, () => Promise<CalculatorDefinition>>> = {
  sdof: () => import('./vibration/sdof.ts').then((m) => m.sdofCalculator),
  'forced-response': () => import('./vibration/forced-response.ts').then((m) => m.forcedResponseCalculator),
  'log-decrement': () => import('./vibration/log-decrement.ts').then((m) => m.logDecrementCalculator),
  'half-power': () => import('./vibration/half-power.ts').then((m) => m.halfPowerCalculator),
  'ring-down': () => import('./vibration/ring-down.ts').then((m) => m.ringDownCalculator),
  'tmd-tuning': () => import('./vibration/tmd-tuning.ts').then((m) => m.tmdTuningCalculator),
  'energy-per-cycle': () => import('./vibration/energy-per-cycle.ts').then((m) => m.energyPerCycleCalculator),
  'damper-simulation': () => import('./vibration/damper-simulation.ts').then((m) => m.damperSimulationCalculator),
  'fv-fit': () => import('./vibration/fv-fit.ts').then((m) => m.fvFitCalculator),
  'harmonic-duty': () => import('./duty/harmonic-duty.ts').then((m) => m.harmonicDutyCalculator),
  'road-power': () => import('./duty/road-power.ts').then((m) => m.roadPowerCalculator),
  impact: () => import('./duty/impact.ts').then((m) => m.impactCalculator),
  'storey-dampers': () => import('./duty/storey-dampers.ts').then((m) => m.storeyDampersCalculator),
  'structural-dampers': () => import('./duty/structural-dampers.ts').then((m) => m.structuralDampersCalculator),
  'recorded-motion': () => import('./duty/recorded-motion.ts').then((m) => m.recordedMotionCalculator),
  'property-bounds': () => import('./duty/property-bounds.ts').then((m) => m.propertyBoundsCalculator),
  'test-protocol': () => import('./duty/test-protocol.ts').then((m) => m.testProtocolCalculator),
  'random-duty': () => import('./duty/random-duty.ts').then((m) => m.randomDutyCalculator),
  'body-cooling': () => import('./thermal/body-cooling.ts').then((m) => m.bodyCoolingCalculator),
  'steady-temperature': () => import('./thermal/steady-temperature.ts').then((m) => m.steadyTemperatureCalculator),
  'power-rating': () => import('./thermal/power-rating.ts').then((m) => m.powerRatingCalculator),
  'warm-up': () => import('./thermal/warm-up.ts').then((m) => m.warmUpCalculator),
  'oil-viscosity': () => import('./thermal/oil-viscosity.ts').then((m) => m.oilViscosityCalculator),
  'damping-fade': () => import('./thermal/damping-fade.ts').then((m) => m.dampingFadeCalculator),
  'fade-fit': () => import('./thermal/fade-fit.ts').then((m) => m.fadeFitCalculator),
  'gas-charge': () => import('./thermal/gas-charge.ts').then((m) => m.gasChargeCalculator),
  'thermal-life': () => import('./thermal/thermal-life.ts').then((m) => m.thermalLifeCalculator),
};

/** A built-in's own chunk, else the handbook's team calculators (one lazy chunk; none in the demo). */
export async function loadCalculator(id: string): Promise<CalculatorDefinition | undefined> {
  if (Object.hasOwn(calculatorLoaders, id)) return calculatorLoaders[id]!();
  return (await loadTeamDefinitions()).find((d) => d.id === id);
}
