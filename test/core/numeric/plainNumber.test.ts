/**
 * The one reader of plain decimal number text (CSV cells, typed fields, CLI values). What counts
 * as a plain number is common practice, no source: digits, optional point, sign and exponent.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isPlainNumber } from '../../../src/core/numeric/plainNumber.ts';

describe('isPlainNumber', () => {
  it.each(['12', '-0.5', '+.25', '1.', '1.2e3', '7E-4', ' 42 '])('accepts %j', (t) => expect(isPlainNumber(t)).toBe(true));
  it.each(['', 'Infinity', 'NaN', '0x10', '1,5', '1e', '--1', '1 000', '12 kg', '.'])('refuses %j', (t) => expect(isPlainNumber(t)).toBe(false));
  it('accepts what Number() prints for any finite double, and Number() reads it back exactly', () => {
    fc.assert(fc.property(fc.double({ noNaN: true, noDefaultInfinity: true }), (x) => {
      const t = String(x);
      return isPlainNumber(t) && Object.is(Number(t), x === 0 ? Number(t) : x);
    }));
  });
});
