import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  bilinearEnergyPerCycle, energyPerCycle, energyPerCycleQuadrature, equivalentDampingRatio, gaussianMeanPower, gaussianMomentFactor, harmonicDuty, lambdaAlpha,
  type DamperLaw,
} from '../../../src/core/dampers/index.ts';
import { InputRangeError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

// λ(α): FEMA 274 (1997) §9.3 / FEMA 356 (2000) eq. 9-37 give λ through the Gamma function
// (from memory); values computed from that formula with scipy.special.gamma (reference library
// scipy) and confirmed by quadrature; FEMA's table rounds to one decimal.
const LAMBDA: readonly [alpha: number, lambda: number][] = [
  [0, 4], [0.25, 3.7235], [0.5, 3.49608], [0.75, 3.30498], [1, Math.PI], [1.25, 2.9999], [1.5, 2.87554], [2, 8 / 3],
];

describe('lambdaAlpha', () => {
  for (const [a, l] of LAMBDA) {
    it(`λ(${a}) = ${l} (FEMA 274 §9.3 formula, from memory; values reference library scipy)`, () =>
      expectClose({ label: `λ(${a})`, computed: lambdaAlpha(a), expected: l, tol: 2e-5, why: 'table carries 5–6 s.f.' }));
  }
});

describe('energyPerCycle against published closed forms', () => {
  it('linear viscous: E = π c ω X² (Chopra, Dynamics of Structures 5th ed., eq. 3.8.1; published)', () => {
    expectClose({ label: 'E', computed: energyPerCycle({ kind: 'linear', c: 1500 }, 0.025, 3 * Math.PI), expected: Math.PI * 1500 * 3 * Math.PI * 0.025 ** 2, tol: 1e-14 });
  });
  it('Coulomb: F_f = 200 N, X = 10 mm → E = 8 J, c_eq = 2026.42 N·s/m (Chopra §3.10 form, from memory; value closed form)', () => {
    const d = harmonicDuty({ kind: 'coulomb', Ff: 200 }, 0.01, 4 * Math.PI);
    expectClose({ label: 'E', computed: d.E, expected: 8, tol: 1e-12 });
    expectClose({ label: 'ceq', computed: d.ceq, expected: 2026.42, tol: 3e-6, why: 'value to 6 s.f.' });
  });
  it('hysteretic: η = 0.1, k = 1e5 N/m, X = 10 mm → E = π J, c_eq = 200 N·s/m at ω = 50 rad/s (Chopra §3.10, from memory)', () => {
    const d = harmonicDuty({ kind: 'hysteretic', eta: 0.1, k: 1e5 }, 0.01, 50);
    expectClose({ label: 'E', computed: d.E, expected: Math.PI, tol: 1e-12 });
    expectClose({ label: 'ceq', computed: d.ceq, expected: 200, tol: 1e-12 });
  });
  it('mean power: linear 41.637 W, power-law α = 0.5 50.911 W (closed forms of Chopra eq. 3.8.1 and FEMA 274 §9.3, values computed)', () => {
    expectClose({ label: 'P linear', computed: harmonicDuty({ kind: 'linear', c: 1500 }, 0.025, 3 * Math.PI).P, expected: 41.637, tol: 1e-4 });
    expectClose({ label: 'P power', computed: harmonicDuty({ kind: 'power', C: 800, alpha: 0.5 }, 0.025, 3 * Math.PI).P, expected: 50.911, tol: 1e-4 });
  });
});

const lawArb: fc.Arbitrary<DamperLaw> = fc.oneof(
  fc.record({ kind: fc.constant('linear' as const), c: fc.double({ min: 1, max: 1e5, noNaN: true }) }),
  fc.record({ kind: fc.constant('power' as const), C: fc.double({ min: 1, max: 1e5, noNaN: true }), alpha: fc.double({ min: 0.05, max: 2, noNaN: true }) }),
  fc.record({ kind: fc.constant('coulomb' as const), Ff: fc.double({ min: 1, max: 1e4, noNaN: true }) }),
  fc.record({
    kind: fc.constant('bilinear' as const),
    rebound: fc.record({ c1: fc.double({ min: 10, max: 1e4, noNaN: true }), c2: fc.double({ min: 10, max: 1e4, noNaN: true }) }),
    compression: fc.record({ c1: fc.double({ min: 10, max: 1e4, noNaN: true }), c2: fc.double({ min: 10, max: 1e4, noNaN: true }) }),
    vknee: fc.double({ min: 0.01, max: 1, noNaN: true }),
  }),
  fc.record({ kind: fc.constant('hysteretic' as const), eta: fc.double({ min: 0.01, max: 1, noNaN: true }), k: fc.double({ min: 1e3, max: 1e7, noNaN: true }) }),
);

describe('bilinear energy per cycle in closed form', () => {
  const bil = (c1: number, c2: number, c1c: number, c2c: number, vknee: number) => ({ kind: 'bilinear' as const, rebound: { c1, c2 }, compression: { c1: c1c, c2: c2c }, vknee });
  it('reduces to π c ω X² with equal slopes, and to π c₂ ω X² as the knee goes to 0 (Chopra, Dynamics of Structures 5th ed., eq. 3.8.1; published)', () => {
    expectClose({ label: 'E equal slopes', computed: bilinearEnergyPerCycle(bil(1500, 1500, 1500, 1500, 0.05), 0.025, 3 * Math.PI), expected: Math.PI * 1500 * 3 * Math.PI * 0.025 ** 2, tol: 1e-14 });
    expectClose({ label: 'E knee → 0', computed: bilinearEnergyPerCycle(bil(9000, 800, 9000, 800, 1e-12), 0.025, 3 * Math.PI), expected: Math.PI * 800 * 3 * Math.PI * 0.025 ** 2, tol: 1e-9, why: 'the knee leaves c₁v_k·4X ≈ 1e-12 relative' });
  });
  it('equals the quadrature of the law to 1e-12 across knees below, near and above the peak velocity (closed form vs numerics; fixed seed)', () => {
    const slope = fc.double({ min: 0, max: 1e5, noNaN: true });
    fc.assert(fc.property(slope, slope, slope, slope, fc.double({ min: 1e-3, max: 10, noNaN: true }), fc.double({ min: 1e-4, max: 1, noNaN: true }), fc.double({ min: 0.1, max: 500, noNaN: true }),
      (c1, c2, c1c, c2c, vknee, X, w) => {
        fc.pre(c1 + c2 + c1c + c2c > 1);
        const law = bil(c1, c2, c1c, c2c, vknee);
        const a = bilinearEnergyPerCycle(law, X, w);
        const b = energyPerCycleQuadrature(law, X, w);
        return Math.abs(a - b) <= 1e-12 * Math.abs(b);
      }), { seed: 7, numRuns: 300 });
    // a knee a hair below the peak velocity (θ_k → 0): no cancellation that shows
    const law = bil(3600, 1080, 1200, 360, 0.1);
    const X = 0.1 / (4 * Math.PI) * (1 + 1e-9);
    expectClose({ label: 'E knee ≈ peak', computed: bilinearEnergyPerCycle(law, X, 4 * Math.PI), expected: energyPerCycleQuadrature(law, X, 4 * Math.PI), tol: 1e-12 });
  });
});

describe('energyPerCycle invariants', () => {
  it('closed form and quadrature agree to 1e-8 for every law (closed form vs numerics)', () => {
    fc.assert(fc.property(lawArb, fc.double({ min: 1e-4, max: 0.2, noNaN: true }), fc.double({ min: 0.5, max: 200, noNaN: true }), (law, X, w) => {
      const a = energyPerCycle(law, X, w);
      const b = energyPerCycleQuadrature(law, X, w);
      return Math.abs(a - b) <= 1e-8 * Math.abs(a);
    }), { seed: 1, numRuns: 100 });
  });
  it('answers at once for a vanishing amplitude (5e-324 m used to make the quadrature split every panel 40 times)', () => {
    // a bilinear law at X = 5e-324 m: the integrand was subnormal noise that no tolerance could meet;
    // in units of the peak force it is O(1). Exact: π·c₁·ω·X² (below the knee), which underflows to 0
    const law = { kind: 'bilinear' as const, rebound: { c1: 2e6, c2: 0 }, compression: { c1: 2e6, c2: 0 }, vknee: 1 };
    const t0 = performance.now();
    const e = energyPerCycleQuadrature(law, 5e-324, 5.4e306);
    expect(performance.now() - t0).toBeLessThan(5000); // a guard against the hang, not a speed test
    expect(e).toBeGreaterThanOrEqual(0);
    expect(e).toBeLessThan(1e-300);
    // and a small but normal amplitude keeps the linear closed form below the knee (π c₁ ω X²,
    // Chopra, Dynamics of Structures 5th ed., eq. 3.8.1)
    expect(energyPerCycleQuadrature(law, 1e-150, 1) / (Math.PI * 2e6 * 1e-300)).toBeCloseTo(1, 9);
  });
  it('dissipated energy per cycle is never negative and rises with amplitude for every passive law', () => {
    fc.assert(fc.property(lawArb, fc.double({ min: 1e-4, max: 0.1, noNaN: true }), fc.double({ min: 1, max: 100, noNaN: true }), (law, X, w) => {
      const e1 = energyPerCycle(law, X, w);
      const e2 = energyPerCycle(law, X * 1.5, w);
      return e1 >= 0 && e2 > e1;
    }), { seed: 1, numRuns: 100 });
  });
  it('the equivalent damping ratio of a linear damper equals its own ζ', () => {
    fc.assert(fc.property(fc.double({ min: 0.1, max: 1e3, noNaN: true }), fc.double({ min: 1e2, max: 1e7, noNaN: true }), fc.double({ min: 0.001, max: 2, noNaN: true }), fc.double({ min: 1e-4, max: 0.1, noNaN: true }),
      (m, k, zeta, X) => {
        const c = 2 * zeta * Math.sqrt(k * m);
        const wn = Math.sqrt(k / m);
        const E = energyPerCycle({ kind: 'linear', c }, X, wn);
        return Math.abs(equivalentDampingRatio(E, k, X) - zeta) <= 1e-12 * zeta;
      }), { seed: 1, numRuns: 100 });
  });
  it('refuses a zero amplitude naming X', () => {
    expect(() => energyPerCycle({ kind: 'linear', c: 1 }, 0, 1)).toThrow(InputRangeError);
    expect(() => energyPerCycle({ kind: 'linear', c: 1 }, 0, 1)).toThrow(/'X'/);
  });
});

describe('Gaussian duty', () => {
  // κ(α) = 2^((1+α)/2) Γ(1+α/2)/√π: absolute moments of the normal distribution,
  // Abramowitz & Stegun, Handbook of Mathematical Functions (1964) §26.2 (from memory); values reference library scipy.
  const KAPPA: readonly [number, number][] = [[0, 0.797885], [0.5, 0.86004], [1, 1], [1.5, 1.233268], [2, 1.595769]];
  for (const [a, k] of KAPPA) it(`κ(${a}) = ${k}`, () => expectClose({ label: `κ(${a})`, computed: gaussianMomentFactor(a), expected: k, tol: 1e-6, why: '6 s.f.' }));
  it('power law C = 800, α = 0.5, σ_v = 0.2 m/s → 61.54 W (values computed from the moment formula)', () =>
    expectClose({ label: 'P', computed: gaussianMeanPower({ kind: 'power', C: 800, alpha: 0.5 }, 0.2), expected: 61.54, tol: 1e-4 }));
  it('bilinear quadrature reduces to the linear closed form when both slopes match', () => {
    const lin = gaussianMeanPower({ kind: 'linear', c: 900 }, 0.3);
    const bil = gaussianMeanPower({ kind: 'bilinear', rebound: { c1: 900, c2: 900 }, compression: { c1: 900, c2: 900 }, vknee: 0.1 }, 0.3);
    expectClose({ label: 'P', computed: bil, expected: lin, tol: 1e-9, why: 'quadrature over ±9σ' });
  });
});
