// Source: least-squares line and parabola vertex closed forms, Press et al., Numerical Recipes,
// 3rd ed. (2007) §15.2 (from memory; provenance: closed form).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { ComputationError } from '../../../src/core/errors.ts';
import { linearFit, quadraticPeak } from '../../../src/core/records/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('linearFit', () => {
  it('fits the textbook line through (0,1), (1,3), (2,5) exactly', () => {
    // closed form: the points lie on y = 1 + 2x (Press et al., Numerical Recipes 3rd ed. §15.2)
    const f = linearFit([0, 1, 2], [1, 3, 5]);
    expect(f.slope).toBeCloseTo(2, 14);
    expect(f.intercept).toBeCloseTo(1, 14);
    expect(f.r2).toBeCloseTo(1, 14);
  });
  it('matches the closed-form least-squares line for four points', () => {
    // closed form: x = 0..3, y = 1, 2, 2, 4 → slope = Sxy/Sxx = 4.5/5 = 0.9, intercept = 2.25 − 0.9·1.5 = 0.9
    const f = linearFit([0, 1, 2, 3], [1, 2, 2, 4]);
    expectClose({ label: 'slope', computed: f.slope, expected: 0.9, tol: 1e-14, why: 'closed form' });
    expectClose({ label: 'intercept', computed: f.intercept, expected: 0.9, tol: 1e-14, why: 'closed form' });
  });
  it('refuses a single point or equal abscissae', () => {
    expect(() => linearFit([1], [1])).toThrow(ComputationError);
    expect(() => linearFit([1, 1], [1, 2])).toThrow(ComputationError);
  });
  it('recovers any exact line whatever the weights', () => {
    fc.assert(fc.property(fc.double({ min: -100, max: 100, noNaN: true }), fc.double({ min: -100, max: 100, noNaN: true }),
      fc.array(fc.double({ min: 0.1, max: 10, noNaN: true }), { minLength: 5, maxLength: 5 }), (a, b, w) => {
        const x = [0, 1, 2.5, 3, 7];
        const f = linearFit(x, x.map((v) => a + b * v), w);
        return Math.abs(f.slope - b) < 1e-9 * (1 + Math.abs(b)) && Math.abs(f.intercept - a) < 1e-8 * (1 + Math.abs(a) + Math.abs(b));
      }), { seed: 1, numRuns: 100 });
  });
});

describe('quadraticPeak', () => {
  it('finds the vertex of an exact parabola from unevenly spaced samples', () => {
    const t = [0.9, 1.15, 1.3, 1.62, 1.8];
    const p = quadraticPeak(t, t.map((v) => 3 - 2 * (v - 1.4) ** 2), 1);
    expect(p.fitted).toBe(true);
    expect(p.t).toBeCloseTo(1.4, 12);
    expect(p.y).toBeCloseTo(3, 12);
  });
  it('finds a minimum with sign −1', () => {
    const t = [-1, -0.5, 0, 0.5, 1];
    const p = quadraticPeak(t, t.map((v) => (v - 0.1) ** 2 - 1), -1);
    expect(p.y).toBeCloseTo(-1, 12);
  });
  it('falls back to the largest sample when the curvature has the wrong sign', () => {
    const p = quadraticPeak([0, 1, 2], [0, -1, 0], 1);
    expect(p.fitted).toBe(false);
    expect(p.y).toBe(0);
  });
});
