/**
 * Double-double arithmetic: exact products and sums checked against exact integer arithmetic
 * (BigInt, a general-purpose reference), and root refinement against √2 to 30 digits
 * (√2 = 1.41421356237309504880168872420969807856…, Abramowitz & Stegun, Handbook of
 * Mathematical Functions (1964), Table 23.x constants — from memory; also any bc -l).
 */
import { describe, expect, it } from 'vitest';
import { ddAdd, ddMul, ddProduct, refineRoot } from '../../../src/core/numeric/doubleDouble.ts';

const exact = (d: readonly [number, number]) => BigInt(d[0]) + BigInt(d[1]);

describe('double-double', () => {
  it('ddProduct is exact for 27-bit-wide integers (BigInt reference)', () => {
    for (const [a, b] of [[134217729, 134217729], [2 ** 40 + 3, 2 ** 12 + 1], [987654321, 123456789]] as const) {
      expect(exact(ddProduct(a, b))).toBe(BigInt(a) * BigInt(b));
    }
  });
  it('ddAdd keeps what a double sum loses', () => {
    expect(ddAdd([1, 1e-20], [-1, 0])[0]).toBe(1e-20);
    expect(exact(ddAdd([2 ** 60, 0], [1, 0]))).toBe(2n ** 60n + 1n);
  });
  it('ddMul carries the cross terms', () => {
    const [h, l] = ddMul([1, 1e-17], [1, 1e-17]);
    expect(h).toBe(1);
    expect(l).toBeCloseTo(2e-17, 30);
  });
  it('refineRoot reaches √2 to rounding, and its error estimate is the last correction', () => {
    const c = [[-2, 0], [0, 0], [1, 0]] as const;
    // from 5 digits: the second step's correction (~1e-10) is what is reported; a third is at rounding
    const two = refineRoot(c, { re: 1.4142, im: 0 });
    expect(two.z.re).toBe(Math.SQRT2);
    expect(Math.abs(two.error.re)).toBeLessThan(1e-9);
    expect(Math.abs(refineRoot(c, { re: 1.4142, im: 0 }, 3).error.re)).toBeLessThan(1e-15);
    // from a double-precision root (the documented use) the default two steps are at rounding
    expect(Math.abs(refineRoot(c, { re: 1.4142135623730951, im: 0 }).error.re)).toBeLessThan(1e-15);
  });
});
