/** Tolerance envelopes and sweeps over any calculator definition (pure; see envelope.ts). */
export { envelope, methodText, type End, type EnvelopeResult, type OutputBounds, type PointFailure } from './envelope.ts';
export { checkVariations, variableInput, type CheckedVariation, type Variation } from './variations.ts';
export { parseTolerance, percentEnds, MAX_TOLERANCE_TEXT, type Tolerance } from './tolerance.ts';
export { corners, interiorPoints, INTERIOR_SAMPLES, MAX_VARIED } from './points.ts';
export { sweep, sweepChart, SWEEP_POINTS, type Sweep } from './sweep.ts';
