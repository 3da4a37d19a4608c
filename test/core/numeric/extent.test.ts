/**
 * maxOf / minOf / maxAbsOf agree with Math.max / Math.min wherever those work (closed form: the
 * definition of a maximum), and work on lists far longer than a call may take arguments.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { maxAbsOf, maxOf, minOf } from '../../../src/core/numeric/extent.ts';

describe('extent of a list', () => {
  it('equals Math.max / Math.min of the same numbers (short lists, any doubles)', () => {
    fc.assert(fc.property(fc.array(fc.double({ noNaN: true }), { maxLength: 50 }), (xs) => {
      expect(maxOf(xs)).toBe(Math.max(...xs));
      expect(minOf(xs)).toBe(Math.min(...xs));
      expect(maxAbsOf(xs)).toBe(xs.length ? Math.max(...xs.map(Math.abs)) : 0);
    }), { seed: 1, numRuns: 300 });
  });

  it('orders +0 above −0 as Math.max and Math.min do', () => {
    expect(Object.is(maxOf([-0, 0]), 0)).toBe(true);
    expect(Object.is(minOf([0, -0]), -0)).toBe(true);
  });

  it('gives NaN when an element is NaN, as Math.max does', () => {
    expect(maxOf([1, NaN, 2])).toBeNaN();
    expect(minOf([NaN])).toBeNaN();
    expect(maxAbsOf([1, NaN])).toBeNaN();
  });

  it('handles 2 000 000 elements, where a spread into Math.max overflows the stack', () => {
    const xs = new Float64Array(2_000_000).map((_, i) => Math.sin(i));
    expect(() => Math.max(...xs)).toThrow(RangeError);
    expect(maxOf(xs)).toBeLessThanOrEqual(1);
    expect(maxOf(xs)).toBeGreaterThan(0.999999);
    expect(minOf(xs)).toBeLessThan(-0.999999);
    expect(maxAbsOf(xs)).toBe(Math.max(maxOf(xs), -minOf(xs)));
  });
});
