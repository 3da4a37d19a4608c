import type { Source } from './source.ts';

export const duty = {
  dixon2007: { kind: 'book', citation: 'J. C. Dixon, The Shock Absorber Handbook, 2nd ed., Wiley, 2007.' },
  fema356: { kind: 'report', citation: 'FEMA 356, Prestandard and Commentary for the Seismic Rehabilitation of Buildings, Federal Emergency Management Agency, 2000.' },
  fema274: { kind: 'report', citation: 'FEMA 274, NEHRP Commentary on the Guidelines for the Seismic Rehabilitation of Buildings, Federal Emergency Management Agency, 1997.' },
} as const satisfies Record<string, Source>;
