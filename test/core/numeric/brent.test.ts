import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { bracketRoots, brentRoot } from '../../../src/core/numeric/index.ts';
import { ComputationError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('brentRoot', () => {
  it('refuses a bracket without a sign change', () => {
    expect(() => brentRoot((x) => x * x + 1, -1, 1)).toThrow(ComputationError);
  });
  it('refuses a function that is not finite in the bracket', () => {
    expect(() => brentRoot(() => Number.NaN, 0, 1)).toThrow(ComputationError);
  });
  it('finds √2, π/2 and the Wilkinson-like steep root to 1e-12 (closed forms)', () => {
    expectClose({ label: '√2', computed: brentRoot((x) => x * x - 2, 0, 2), expected: Math.SQRT2, tol: 1e-12, why: 'xTol 1e-12' });
    expectClose({ label: 'π/2', computed: brentRoot(Math.cos, 0, 3), expected: Math.PI / 2, tol: 1e-12, why: 'xTol 1e-12' });
    expectClose({ label: 'x^9 root', computed: brentRoot((x) => (x - 1) ** 9 + 1e-3 * (x - 1), 0, 3), expected: 1, tol: 1e-9, why: 'flat root: bisection safeguard' });
  });
  it('returns an end of the bracket when f is zero there', () => {
    expect(brentRoot((x) => x - 1, 1, 2)).toBe(1);
  });
  it('converges inside the bracket for any monotone cubic with a sign change', () => {
    fc.assert(fc.property(fc.double({ min: -50, max: 50, noNaN: true }), fc.double({ min: 0.01, max: 10, noNaN: true }), (r, a) => {
      const f = (x: number) => a * (x - r) ** 3 + (x - r);
      const x = brentRoot(f, -100, 100, { xTol: 1e-10 });
      return x >= -100 && x <= 100 && Math.abs(x - r) < 1e-8;
    }), { seed: 1, numRuns: 100 });
  });
});

describe('bracketRoots', () => {
  it('finds every root of sin on [1, 10] (π, 2π, 3π) with alternating directions', () => {
    const r = bracketRoots(Math.sin, 1, 10, 50);
    expect(r.map((c) => c.direction)).toEqual([-1, 1, -1]);
    r.forEach((c, i) => expectClose({ label: `root ${i}`, computed: c.x, expected: (i + 1) * Math.PI, tol: 1e-10, why: 'closed form' }));
  });
  it('reports no crossing when f keeps its sign', () => {
    expect(bracketRoots((x) => 1 + x * x, -3, 3)).toEqual([]);
  });
  it('refuses an empty interval', () => {
    expect(() => bracketRoots(Math.sin, 2, 1)).toThrow(ComputationError);
  });
});
