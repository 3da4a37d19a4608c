/** Time simulation of oscillators with nonlinear dampers, with an energy audit: public API. */
export { effectiveLoad, validateModel, type Excitation, type SdofModel } from './model.ts';
export { timeDomainLaw, POWER_LAW_LINEAR_FRACTION, POWER_LAW_RATE_CAP, type TimeDomainLaw } from './timeDomainLaw.ts';
export { stickRelease } from './stickRelease.ts';
export { RunRecorder, type SimulationHistory } from './recorder.ts';
export { simulateSdof, type SimulationOptions, type SimulationResult } from './simulateSdof.ts';
export { seriesLaw, type SeriesLaw } from './seriesLaw.ts';
