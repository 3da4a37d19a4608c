// Source: the rules of complex arithmetic, Abramowitz & Stegun, Handbook of Mathematical Functions
// (1964) §3.7 (from memory; provenance: closed form); properties are identities of the field.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { abs, add, arg, complex, div, mul, scale, sub } from '../../../src/core/complex/index.ts';
import { ComputationError } from '../../../src/core/errors.ts';

const finite = fc.double({ min: -1e6, max: 1e6, noNaN: true });
const nonZero = fc.tuple(finite, finite).filter(([a, b]) => Math.hypot(a, b) > 1e-3);

describe('complex arithmetic', () => {
  it('multiplies by the textbook rule (1+2i)(3−i) = 5+5i', () => {
    // closed form: (a+bi)(c+di) = (ac−bd) + (ad+bc)i
    expect(mul(complex(1, 2), complex(3, -1))).toEqual({ re: 5, im: 5 });
  });
  it('divides (5+5i)/(3−i) back to 1+2i', () => {
    const q = div(complex(5, 5), complex(3, -1));
    expect(q.re).toBeCloseTo(1, 14);
    expect(q.im).toBeCloseTo(2, 14);
  });
  it('refuses division by zero with a ComputationError', () => {
    expect(() => div(complex(1), complex(0, 0))).toThrow(ComputationError);
  });
  it('gives modulus 5 and argument atan2(4, 3) for 3+4i', () => {
    expect(abs(complex(3, 4))).toBe(5);
    expect(arg(complex(3, 4))).toBe(Math.atan2(4, 3));
  });
  it('division undoes multiplication for any non-zero divisor', () => {
    fc.assert(fc.property(finite, finite, nonZero, (a, b, [c, d]) => {
      const z = div(mul(complex(a, b), complex(c, d)), complex(c, d));
      return Math.abs(z.re - a) <= 1e-9 * (1 + Math.abs(a)) && Math.abs(z.im - b) <= 1e-9 * (1 + Math.abs(b));
    }), { seed: 1, numRuns: 100 });
  });
  it('the modulus of a product is the product of the moduli', () => {
    fc.assert(fc.property(finite, finite, finite, finite, (a, b, c, d) =>
      Math.abs(abs(mul(complex(a, b), complex(c, d))) - abs(complex(a, b)) * abs(complex(c, d))) <= 1e-12 * (1 + abs(complex(a, b)) * abs(complex(c, d)))), { seed: 1, numRuns: 100 });
  });
  it('adds, subtracts and scales component-wise', () => {
    expect(add(complex(1, 2), complex(3, 4))).toEqual({ re: 4, im: 6 });
    expect(sub(complex(1, 2), complex(3, 4))).toEqual({ re: -2, im: -2 });
    expect(scale(complex(1, -2), 3)).toEqual({ re: 3, im: -6 });
  });
});
