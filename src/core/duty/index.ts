/** Damper duty: harmonic, random road, end-stop impacts, structural dampers, recorded motion. */
export { ISO_8608_CLASSES, ISO_8608_N0, roadRoughness, type RoadClass, type ClassValue } from './isoRoadClass.ts';
export { checkRoad, roadDisplacementPsd, roadVelocityWhiteLevel, type RoadInput } from './roadPsd.ts';
export { checkQuarterCar, quarterCarGains, quarterCarModes, quarterCarCharacteristicFrequencies, type QuarterCar, type QuarterCarGains } from './quarterCar.ts';
export { spectralIntegral, type SpectralIntegral } from './spectralIntegral.ts';
export { quarterCarRandom, quarterCarBand, damperVelocityVariance, type QuarterCarRandom } from './quarterCarRandom.ts';
export { quarterCarWhiteVariances, whiteRoadDamperPower, type QuarterCarVariances } from './quarterCarWhite.ts';
export { statisticalLinearisation, type Linearised } from './statisticalLinearisation.ts';
export { roadDuty, type RoadDamper, type RoadDuty } from './roadDuty.ts';
export { type DutySummary } from './dutySummary.ts';
export { impactEnergy, STANDARD_GRAVITY, type ImpactInput, type ImpactEnergy } from './impactEnergy.ts';
export { linearStop, type LinearStop } from './linearStop.ts';
export { storeyDampers, adiabaticRise, type StoreyDampers, type StoreyDamperResult } from './structuralDampers.ts';
export { parseRecordedMotion, type ParsedRecord, type RejectedRow } from './recordedMotionCsv.ts';
export { mapColumns, splitNameUnit, type ColumnLayout, type ColumnMap, type Role } from './recordedMotionHeader.ts';
export { findSegments, differentiate, type Segments } from './recordSegments.ts';
export { blockPower, MAX_POWER_BLOCKS, type BlockPower } from './blockPower.ts';
export { recordedMotion, type RecordedMotionResult } from './recordedMotion.ts';
export { roadDamperPower } from './roadDamperPower.ts';
