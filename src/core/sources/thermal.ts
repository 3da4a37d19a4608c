import type { Source } from './source.ts';

export const thermal = {
  incropera2007: { kind: 'book', citation: 'F. P. Incropera, D. P. DeWitt, T. L. Bergman and A. S. Lavine, Fundamentals of Heat and Mass Transfer, 6th ed., Wiley, 2007.' },
} as const satisfies Record<string, Source>;
