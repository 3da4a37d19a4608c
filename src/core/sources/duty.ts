import type { Source } from './source.ts';

export const duty = {
  dixon2007: { kind: 'book', citation: 'J. C. Dixon, The Shock Absorber Handbook, 2nd ed., Wiley, 2007.' },
} as const satisfies Record<string, Source>;
