/**
 * Composite 8-point Gauss–Legendre: exact for polynomials up to degree 15 on each panel
 * (Abramowitz & Stegun, Handbook of Mathematical Functions, 1964, §25.4.29 and Table 25.4;
 * published), and the closed forms ∫₀^π sin x dx = 2, ∫₀¹ e^{−λx} dx = (1 − e^{−λ})/λ (closed form).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { gaussLegendre } from '../../../src/core/numeric/gaussLegendre.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('gaussLegendre', () => {
  it('integrates x^n, n ≤ 15, exactly on one panel (A&S 25.4.29: degree 2n − 1 = 15)', () => {
    fc.assert(fc.property(fc.integer({ min: 0, max: 15 }), fc.double({ min: -3, max: 3, noNaN: true }), fc.double({ min: 0.1, max: 3, noNaN: true }), (n, a, len) => {
      const b = a + len;
      const [got] = gaussLegendre((x) => [x ** n], a, b, 1);
      const exact = (b ** (n + 1) - a ** (n + 1)) / (n + 1);
      return Math.abs(got! - exact) <= 1e-12 * Math.max(1, Math.abs(b) ** (n + 1), Math.abs(a) ** (n + 1));
    }), { seed: 1, numRuns: 200 });
  });

  it('matches closed forms for smooth integrands, with the panels an oscillator step uses', () => {
    const [s] = gaussLegendre((x) => [Math.sin(x)], 0, Math.PI, 4);
    expectClose({ label: '∫₀^π sin x dx', computed: s!, expected: 2, tol: 1e-14, why: 'closed form; 8 points on π/4 panels' });
    for (const lambda of [0.5, 1, 2, 8]) {
      const [e] = gaussLegendre((x) => [Math.exp(-lambda * x)], 0, 1, Math.ceil(lambda));
      expectClose({ label: `∫₀¹ e^(−${lambda}x) dx`, computed: e!, expected: -Math.expm1(-lambda) / lambda, tol: 1e-14, why: 'closed form; at most one e-fold per panel' });
    }
  });

  it('refuses a panel count that is not a positive integer', () => {
    expect(() => gaussLegendre((x) => [x], 0, 1, 0)).toThrow(/panels/);
    expect(() => gaussLegendre((x) => [x], 0, 1, 1.5)).toThrow(/panels/);
  });
});
