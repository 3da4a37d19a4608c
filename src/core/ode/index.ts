/** Ordinary differential equations: Runge–Kutta tableaux as data and the integrators using them. */
export type { EmbeddedTableau } from './tableau.ts';
export type { OdeStats, OdeSystem } from './system.ts';
export { DORMAND_PRINCE_54 } from './dormandPrince.ts';
export { rkStep, stepWork, type StepWork } from './rkStep.ts';
export { errorNorm } from './errorNorm.ts';
export { denseOutput, denseCoefficients, evalDense } from './denseOutput.ts';
export { initialStep } from './initialStep.ts';
export { integrateAdaptive, type AcceptedStep, type AdaptiveOptions, type AdaptiveSolution } from './integrate.ts';
export { integrateFixed } from './integrateFixed.ts';
