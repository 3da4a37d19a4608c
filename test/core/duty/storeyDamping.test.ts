import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { lambdaAlpha } from '../../../src/core/dampers/index.ts';
import { dampedDemand, dampingCorrection, storeyDampers, storeyDamping } from '../../../src/core/duty/index.ts';
import { ComputationError, InputRangeError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const TWO_PI = 2 * Math.PI;

describe('damping correction factor η (EN 1998-1:2004 eq. 3.6)', () => {
  it.each([
    [0.05, 1], [0.1, 0.8165], [0.2, 0.6325], [0.3, 0.55], [0.02, 1.195],
  ])('ξ = %f gives η = %f [EN 1998-1:2004 §3.2.2.2 eq. (3.6), η = √(10/(5+ξ)) ≥ 0.55; published (10 %, 20 %); floor and 2 % closed form]', (xi, eta) => {
    expectClose({ label: 'η', computed: dampingCorrection(xi), expected: eta, tol: 6e-4, why: 'reference values to 4 s.f.' });
  });
  it('η falls with damping and never goes below 0.55', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (a, b) => {
      const [lo, hi] = a < b ? [a, b] : [b, a];
      expect(dampingCorrection(hi)).toBeLessThanOrEqual(dampingCorrection(lo));
      expect(dampingCorrection(hi)).toBeGreaterThanOrEqual(0.55);
    }), { seed: 1, numRuns: 200 });
  });
});

describe('dampers over several storeys by the energy method', () => {
  const base = { law: { kind: 'linear', c: 1e5 } as const, T: 0.5, m: [2e5, 2e5, 1.5e5], phi: [0.4, 0.75, 1], storeys: [{ n: 2, theta: 0.6 }, { n: 2, theta: 0.7 }, { n: 1, theta: 0.7 }], roof: 0.04 };

  it('one storey reproduces the single-storey energy method of structural-dampers for any power law [FEMA 356 §9.3 eqs. 9-36/9-37 (from memory); same method, independent code]', () => {
    fc.assert(fc.property(
      fc.double({ min: 0.2, max: 1.5, noNaN: true }), fc.double({ min: 1e-3, max: 0.2, noNaN: true }), fc.double({ min: 0.1, max: 5, noNaN: true }),
      fc.double({ min: 0, max: 1.4, noNaN: true }), fc.integer({ min: 1, max: 8 }),
      (alpha, drift, T, theta, n) => {
        const k = 5e7;
        const one = storeyDampers({ C: 2e5, alpha, n, theta, drift, T, k });
        const many = storeyDamping({ law: { kind: 'power', C: 2e5, alpha }, T, m: [k * (T / TWO_PI) ** 2], phi: [1], storeys: [{ n, theta }], roof: drift });
        expectClose({ label: 'ξ_d', computed: many.xiD, expected: one.betaSup, tol: 1e-12 });
        expectClose({ label: 'W_j', computed: many.storeys[0]!.W, expected: one.Wj, tol: 1e-12 });
        expectClose({ label: 'F_peak', computed: many.storeys[0]!.Fpeak, expected: one.Fpeak, tol: 1e-12 });
      }), { seed: 1, numRuns: 200 });
  });

  it('linear dampers: ξ_d = T Σ c cos²θ φ_r² / (4π Σ m φ²) [FEMA 356 §9.3.4 eq. 9-36 (equation number from memory); closed form]', () => {
    const phiR = [0.4, 0.35, 0.25];
    const sum = base.storeys.reduce((s, st, j) => s + st.n * 1e5 * Math.cos(st.theta) ** 2 * phiR[j]! ** 2, 0);
    const mphi2 = base.m.reduce((s, m, i) => s + m * base.phi[i]! ** 2, 0);
    expectClose({ label: 'ξ_d', computed: storeyDamping(base).xiD, expected: (base.T * sum) / (4 * Math.PI * mphi2), tol: 1e-12 });
  });

  it('power-law dampers: ξ_d = Σ λ C cos^{1+α}θ φ_r^{1+α} / (2π A^{1−α} ω^{2−α} Σ m φ²) [FEMA 356 §9.3.4 eq. 9-39 (from memory); closed form]', () => {
    fc.assert(fc.property(fc.double({ min: 0.2, max: 1.8, noNaN: true }), fc.double({ min: 0.005, max: 0.3, noNaN: true }), (alpha, A) => {
      const phiR = [0.4, 0.35, 0.25];
      const w = TWO_PI / base.T;
      const sum = base.storeys.reduce((s, st, j) => s + st.n * lambdaAlpha(alpha) * 3e5 * (Math.cos(st.theta) * phiR[j]!) ** (1 + alpha), 0);
      const mphi2 = base.m.reduce((s, m, i) => s + m * base.phi[i]! ** 2, 0);
      const r = storeyDamping({ ...base, law: { kind: 'power', C: 3e5, alpha }, roof: A });
      expectClose({ label: 'ξ_d', computed: r.xiD, expected: sum / (TWO_PI * A ** (1 - alpha) * w ** (2 - alpha) * mphi2), tol: 1e-12 });
    }), { seed: 1, numRuns: 200 });
  });

  it('the scale of the given mode shape does not matter', () => {
    const a = storeyDamping(base);
    const b = storeyDamping({ ...base, phi: base.phi.map((p) => -3.7 * p) });
    expectClose({ label: 'ξ_d', computed: b.xiD, expected: a.xiD, tol: 1e-12 });
  });

  it('a storey without dampers adds nothing; a frame without any is refused', () => {
    const r = storeyDamping({ ...base, storeys: [base.storeys[0]!, { n: 0, theta: 0 }, base.storeys[2]!] });
    expect(r.xiD).toBeLessThan(storeyDamping(base).xiD);
    expect(() => storeyDamping({ ...base, storeys: base.storeys.map((s) => ({ ...s, n: 0 })) })).toThrow(ComputationError);
    expect(() => storeyDamping({ ...base, storeys: [{ n: 1.5, theta: 0 }, ...base.storeys.slice(1)] })).toThrow(/n\[1\]/);
    expect(() => storeyDamping({ ...base, storeys: base.storeys.slice(1) })).toThrow(InputRangeError);
  });
});

describe('roof demand reduced by η at the damping it produces', () => {
  it('constant added damping: u = η(ξ₀ + ξ_d)·u₅ [EN 1998-1 eq. (3.6); published η(10 %) = 0.8165]', () => {
    const r = dampedDemand(0.1, 0.05, () => 0.05);
    expectClose({ label: 'roof', computed: r.roof, expected: 0.1 * Math.sqrt(10 / 15), tol: 1e-11 });
    expectClose({ label: 'ξ', computed: r.xiTotal, expected: 0.1, tol: 1e-15 });
  });
  it('α < 1: the roof displacement found is a fixed point u = η(ξ₀ + ξ_d(u))·u₅ and lies between 0.55·u₅ and η(ξ₀)·u₅', () => {
    const base = { law: { kind: 'power', C: 2e5, alpha: 0.4 } as const, T: 0.6, m: [1.4e5, 1.4e5, 1e5], phi: [0.38, 0.75, 1], storeys: [{ n: 4, theta: 0.6 }, { n: 4, theta: 0.7 }, { n: 2, theta: 0.7 }] };
    fc.assert(fc.property(fc.double({ min: 1e-3, max: 0.5, noNaN: true }), fc.double({ min: 0, max: 0.1, noNaN: true }), fc.double({ min: 1e3, max: 1e7, noNaN: true }), (u5, xi0, C) => {
      const xiD = (u: number) => storeyDamping({ ...base, law: { ...base.law, C }, roof: u }).xiD;
      const r = dampedDemand(u5, xi0, xiD);
      expectClose({ label: 'fixed point', computed: r.roof, expected: dampingCorrection(Math.min(1, xi0 + xiD(r.roof))) * u5, tol: 1e-10 });
      expect(r.roof).toBeGreaterThanOrEqual(0.55 * u5 * (1 - 1e-12));
      expect(r.roof).toBeLessThanOrEqual(dampingCorrection(xi0) * u5 * (1 + 1e-12));
    }), { seed: 1, numRuns: 200 });
  });
});
