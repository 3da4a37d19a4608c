/** Vibration of damped oscillators: public API of the domain. */
export { naturalFrequency } from './naturalFrequency.ts';
export { criticalDamping } from './criticalDamping.ts';
export { dampingRatio } from './dampingRatio.ts';
export { dampedFrequency } from './dampedFrequency.ts';
export { logDecrementFromZeta, zetaFromLogDecrement } from './logDecrement.ts';
export { qualityFactor } from './qualityFactor.ts';
export { dampingRegime, CRITICAL_BAND, type DampingRegime } from './regime.ts';
export { freeResponse, type FreeOscillator, type State } from './freeResponse.ts';
export { energyHistory, responseWindow, type EnergyHistory } from './energyHistory.ts';
