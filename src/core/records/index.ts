/** Reading and conditioning recorded signals (test-rig and logger exports). */
export { parseNumericCsv, parseNumberField, type Delimiter, type NumericTable, type ParseOptions } from './parseNumericCsv.ts';
export { readTimeSeries, type TimeSeries } from './readTimeSeries.ts';
export { linearFit, type LinearFit } from './linearFit.ts';
export { quadraticPeak, type QuadraticPeak } from './quadraticPeak.ts';
