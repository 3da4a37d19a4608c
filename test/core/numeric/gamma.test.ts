import { describe, it } from 'vitest';
import { gamma } from '../../../src/core/numeric/gamma.ts';
import { adaptiveSimpson } from '../../../src/core/numeric/adaptiveSimpson.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('gamma', () => {
  // Exact values: Γ(n) = (n−1)!, Γ(1/2) = √π, Γ(3/2) = √π/2 — Abramowitz & Stegun (1964) §6.1 (published identities).
  const EXACT: readonly [number, number][] = [[1, 1], [2, 1], [5, 24], [10, 362880], [0.5, Math.sqrt(Math.PI)], [1.5, Math.sqrt(Math.PI) / 2], [0.25, 3.6256099082219083]];
  for (const [x, g] of EXACT) it(`Γ(${x}) = ${g}`, () => expectClose({ label: `Γ(${x})`, computed: gamma(x), expected: g, tol: 1e-13, why: 'Lanczos g=7 is good to ~1e-15' }));
});

describe('adaptiveSimpson', () => {
  it('integrates sin over [0, π] to 2 (closed form)', () => expectClose({ label: '∫sin', computed: adaptiveSimpson(Math.sin, 0, Math.PI, 1e-13), expected: 2, tol: 1e-12 }));
  it('handles a sharp transient: ∫₀¹ 400·e^(−400t) dt = 1 − e^(−400) (closed form)', () =>
    expectClose({ label: '∫exp', computed: adaptiveSimpson((t) => 400 * Math.exp(-400 * t), 0, 1, 1e-12), expected: 1 - Math.exp(-400), tol: 1e-10 }));
});
