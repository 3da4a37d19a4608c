/** Damper laws and what they do under harmonic and Gaussian random motion: public API. */
export { ALPHA_RANGE, DAMPER_LAW_KINDS, type DamperLaw, type DamperLawKind } from './laws.ts';
export { validateLaw } from './validateLaw.ts';
export { damperForce, lawBreakpoints } from './damperForce.ts';
export { lambdaAlpha } from './lambdaAlpha.ts';
export { bilinearEnergyPerCycle, energyPerCycle, energyPerCycleQuadrature } from './energyPerCycle.ts';
export { harmonicDuty, equivalentDampingRatio, type HarmonicDuty } from './harmonicDuty.ts';
export { gaussianMomentFactor, gaussianMeanPower } from './gaussianDuty.ts';
export { maxwellStiffness, seriesHarmonic, type MaxwellStiffness, type SeriesHarmonic } from './seriesStiffness.ts';
export { readFvPoints, type FvData } from './fvData.ts';
export { fitLinearOrigin } from './fitLinear.ts';
export { fitPowerLaw, type PowerLawFit } from './fitPowerLaw.ts';
export { fitBilinear, type BilinearFit, type FitSide } from './fitBilinear.ts';
export { fitDamperLaw, splitSides, type DamperLawFit, type FitLawKind } from './fitDamperLaw.ts';
export { gasCharge, type GasCharge, type GasChargeInput } from './gasCharge.ts';
export { gasStoredEnergy, NITROGEN_GAMMA } from './gasEnergy.ts';
