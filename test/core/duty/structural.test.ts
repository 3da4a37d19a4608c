import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { adiabaticRise, storeyDampers } from '../../../src/core/duty/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const base = { C: 1e5, alpha: 1, n: 1, theta: 0, drift: 0.02, T: 1, k: 1e7 };

describe('fluid viscous dampers in a storey', () => {
  it('EN-E: linear damper, T = 1 s, C = 10⁵ N·s/m, δ = 20 mm gives W_j = 789.568 J [fema356 §9.3 W_j = (2π²/T)Cδ² (eq. number from memory); calc]', () => {
    expectClose({ label: 'W_j', computed: storeyDampers(base).Wj, expected: 789.568, tol: 1e-6, why: '6 s.f.' });
  });
  it('supplemental damping of linear dampers equals the viscous ratio cω/(2k) [chopra2017 §3.9 ζ_eq = E_D/(4πE_So) (from memory)]', () => {
    expectClose({ label: 'β', computed: storeyDampers(base).betaSup, expected: (1e5 * 2 * Math.PI) / (2 * 1e7), tol: 1e-12, why: 'closed form' });
  });
  it('nonlinear α = 0.5 uses λ(0.5) = 3.49608 [fema274 §9.3 (from memory); calc, closed form = quadrature]', () => {
    const r = storeyDampers({ ...base, alpha: 0.5 });
    expectClose({ label: 'W_j', computed: r.Wj, expected: 3.49608 * 1e5 * Math.sqrt(2 * Math.PI) * 0.02 ** 1.5, tol: 2e-6, why: 'λ to 6 s.f.' });
  });
  it('a brace at angle θ strokes the damper by drift·cos θ', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 1.5, noNaN: true }), (theta) => {
      const r = storeyDampers({ ...base, theta });
      expectClose({ label: 'stroke', computed: r.stroke, expected: 0.02 * Math.cos(theta), tol: 1e-12 });
    }), { seed: 1, numRuns: 100 });
  });
  it('damping added by α < 1 dampers falls as the drift grows (β ∝ Δ^(α−1))', () => {
    fc.assert(fc.property(fc.double({ min: 0.1, max: 0.95, noNaN: true }), fc.double({ min: 0.001, max: 0.1, noNaN: true }), (alpha, drift) => {
      const a = storeyDampers({ ...base, alpha, drift }).betaSup;
      const b = storeyDampers({ ...base, alpha, drift: 2 * drift }).betaSup;
      expect(b).toBeLessThan(a);
      expectClose({ label: 'ratio', computed: b / a, expected: 2 ** (alpha - 1), tol: 1e-10 });
    }), { seed: 1, numRuns: 100 });
  });
  it('energy per cycle and mean power are never negative', () => {
    fc.assert(fc.property(fc.double({ min: 0.05, max: 2, noNaN: true }), fc.double({ min: 1e-4, max: 0.5, noNaN: true }), fc.double({ min: 0.05, max: 10, noNaN: true }), (alpha, drift, T) => {
      const r = storeyDampers({ ...base, alpha, drift, T });
      expect(r.Wj).toBeGreaterThanOrEqual(0);
      expect(r.Pdamper).toBeGreaterThanOrEqual(0);
    }), { seed: 1, numRuns: 100 });
  });
  it('adiabatic rise is the event energy over Σm·c_p [common practice, no source; closed form]', () => {
    expectClose({ label: 'ΔT', computed: adiabaticRise(100e3, 40 * 460 + 3 * 1500), expected: 100e3 / 22900, tol: 1e-12 });
  });
});
