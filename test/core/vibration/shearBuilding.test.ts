import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputRangeError } from '../../../src/core/errors.ts';
import { modalFactors, shearBuildingMode } from '../../../src/core/vibration/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import { SCIPY_VERSION, shearBuildingReference } from './shearBuildingReference.fixtures.ts';

describe('fundamental mode of a shear building', () => {
  it('two storeys m₁ = 2m, k₁ = 2k: ω₁² = k/(2m), φ₁ = [½, 1] [Chopra, Dynamics of Structures, 5th ed., Example 10.4 (example number from memory; checked by hand from det(K − ω²M) = 0); closed form]', () => {
    const r = shearBuildingMode([2e5, 1e5], [1e8, 5e7]);
    expectClose({ label: 'ω₁²', computed: r.omega2, expected: 5e7 / 2e5, tol: 1e-13, why: 'bisection to round-off' });
    expectClose({ label: 'φ₁ at floor 1', computed: r.phi[0]!, expected: 0.5, tol: 1e-12, why: 'inverse iteration converged' });
    expect(r.phi[1]).toBe(1);
  });

  it('uniform N storeys: ω₁ = 2√(k/m)·sin(π/(2(2N+1))), φ_j ∝ sin(jπ/(2N+1)) for N = 1…40 [closed form of the uniform shear building, fixed base and free top (derived; Chopra 5th ed. ch. 12–16 treats the general case, from memory)]', () => {
    for (let N = 1; N <= 40; N++) {
      const r = shearBuildingMode(Array(N).fill(3e4), Array(N).fill(4e7));
      const a = Math.PI / (2 * N + 1);
      expectClose({ label: `ω₁, N = ${N}`, computed: Math.sqrt(r.omega2), expected: 2 * Math.sqrt(4e7 / 3e4) * Math.sin(a / 2), tol: 1e-12, why: 'round-off' });
      r.phi.forEach((p, j) => expectClose({ label: `φ_${j + 1}, N = ${N}`, computed: p, expected: Math.sin((j + 1) * a) / Math.sin(N * a), tol: 1e-9, why: 'inverse iteration at a shift 1e-9 below ω₁²' }));
    }
  });

  it.each(shearBuildingReference)(`$name: T₁ and φ₁ as scipy.linalg.eigh [reference library scipy@${SCIPY_VERSION}]`, (c) => {
    const r = shearBuildingMode(c.m, c.k);
    expectClose({ label: 'T₁', computed: r.T, expected: c.expected.T, tol: 1e-10, why: 'fixture to 12 s.f.; both to round-off' });
    r.phi.forEach((p, j) => expectClose({ label: `φ_${j + 1}`, computed: p, expected: c.expected.phi[j]!, tol: 1e-9, why: 'fixture to 12 s.f.' }));
  });

  it('the mode satisfies K φ = ω² M φ at every floor, all φ positive and rising to the roof', () => {
    const arb = fc.integer({ min: 1, max: 25 }).chain((n) => fc.tuple(
      fc.array(fc.double({ min: 1e3, max: 1e6, noNaN: true }), { minLength: n, maxLength: n }),
      fc.array(fc.double({ min: 1e5, max: 1e10, noNaN: true }), { minLength: n, maxLength: n }),
    ));
    fc.assert(fc.property(arb, ([m, k]) => {
      const { omega2, phi } = shearBuildingMode(m, k);
      const n = m.length;
      let scale = 0;
      for (let i = 0; i < n; i++) scale = Math.max(scale, k[i]! * phi[i]!, omega2 * m[i]! * phi[i]!);
      for (let i = 0; i < n; i++) {
        const below = i > 0 ? phi[i - 1]! : 0;
        const above = i + 1 < n ? k[i + 1]! * (phi[i + 1]! - phi[i]!) : 0;
        const residual = k[i]! * (phi[i]! - below) - above - omega2 * m[i]! * phi[i]!;
        expect(Math.abs(residual)).toBeLessThan(1e-7 * scale);
        expect(phi[i]!).toBeGreaterThan(below);
      }
    }), { seed: 1, numRuns: 200 });
  });

  it('refuses a bad mass, stiffness or length, naming it', () => {
    expect(() => shearBuildingMode([1, 0], [1, 1])).toThrow(/m\[2\]/);
    expect(() => shearBuildingMode([1, 1], [1, -1])).toThrow(/k\[2\]/);
    expect(() => shearBuildingMode([1, 1], [1])).toThrow(InputRangeError);
    expect(() => shearBuildingMode([], [])).toThrow(InputRangeError);
  });
});

describe('participation factor and effective modal mass', () => {
  it('Chopra Example 10.4 frame: Γ₁ = 4/3 with φ roof = 1, effective mass 8/9 of the total [Chopra 5th ed. §13.2 Γ_n = L_n/M_n (from memory); closed form]', () => {
    const f = modalFactors([2, 1], [0.5, 1]);
    expectClose({ label: 'Γ', computed: f.gamma, expected: 4 / 3, tol: 1e-15 });
    expectClose({ label: 'M*/M', computed: f.massFraction, expected: 8 / 9, tol: 1e-15 });
  });
  it('Γ·φ is independent of the scale of φ and the effective mass fraction lies in (0, 1]', () => {
    fc.assert(fc.property(fc.array(fc.double({ min: 0.01, max: 10, noNaN: true }), { minLength: 1, maxLength: 12 }), fc.double({ min: 0.1, max: 100, noNaN: true }), (phi, s) => {
      const m = phi.map((_, i) => 1000 * (i + 1));
      const a = modalFactors(m, phi);
      const b = modalFactors(m, phi.map((p) => p * s));
      expectClose({ label: 'Γφ_roof', computed: b.gamma * phi[phi.length - 1]! * s, expected: a.gamma * phi[phi.length - 1]!, tol: 1e-12 });
      expect(a.massFraction).toBeGreaterThan(0);
      expect(a.massFraction).toBeLessThanOrEqual(1 + 1e-12);
    }), { seed: 1, numRuns: 200 });
  });
});
