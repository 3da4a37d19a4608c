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
    }), { seed: 1, numRuns: 100 });
  });
});

describe('plain numbers: linear-time reading', () => {
  it('refuses 100 000 digits followed by a letter at once (the old pattern backtracked for ~40 s: a ring-down record of one such line froze the page)', () => {
    // `\d+\.?\d*` can split a run of digits in n ways, so a failing match tried O(n²) splits;
    // `\d+(?:\.\d*)?` cannot. Without the fix this test hits the 30 s test timeout.
    expect(isPlainNumber(`${'1'.repeat(100_000)}x`)).toBe(false);
    expect(isPlainNumber('1'.repeat(100_000))).toBe(true);
  });
});
