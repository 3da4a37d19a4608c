/**
 * Golden-section search (Press et al., Numerical Recipes, 3rd ed., 2007, §10.2; from memory): the
 * bracket shrinks by 0.618 per step, so it finds the minimum of a unimodal function to the
 * tolerance asked. Reference minima are closed forms.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { goldenSection } from '../../../src/core/numeric/index.ts';

describe('goldenSection', () => {
  it('finds x = 1/e for x·ln x on [0.1, 1] (closed form: d/dx = ln x + 1 = 0)', () => {
    const m = goldenSection((x) => x * Math.log(x), 0.1, 1);
    expect(m.x).toBeCloseTo(1 / Math.E, 7); // a smooth minimum is located to about √ε relative
    expect(m.f).toBeCloseTo(-1 / Math.E, 14);
  });

  it('locates a kink minimum |x − 0.3| to the tolerance asked (no flat bottom to lose it in)', () => {
    expect(Math.abs(goldenSection((x) => Math.abs(x - 0.3), 0, 1, 1e-13).x - 0.3)).toBeLessThan(1e-12);
  });

  it('for any parabola with its vertex inside the bracket, returns the vertex to 1e-7', () => {
    fc.assert(fc.property(fc.double({ min: -5, max: 5, noNaN: true }), fc.double({ min: 0.1, max: 100, noNaN: true }), (x0, k) => {
      const m = goldenSection((x) => k * (x - x0) ** 2, -6, 6);
      expect(Math.abs(m.x - x0)).toBeLessThan(1e-7);
    }), { seed: 1, numRuns: 200 });
  });
});
