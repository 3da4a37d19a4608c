import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  roadDuty, roadRoughness, roadDisplacementPsd, roadVelocityWhiteLevel, quarterCarRandom, quarterCarWhiteVariances,
  spectralIntegral, whiteRoadDamperPower, ISO_8608_CLASSES, linearisationStart,
} from '../../../src/core/duty/index.ts';
import { gaussianMeanPower, gaussianMomentFactor } from '../../../src/core/dampers/index.ts';
import { InputRangeError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import { roadReference, SCIPY_VERSION } from './roadReference.fixtures.ts';

const TW210 = { ms: 240, mu: 36, ks: 16000, kt: 160000 };

describe('ISO 8608 road classes', () => {
  // ISO 8608:2016, Table 1 (table number from memory): geometric means of G_d(n0), 10⁻⁶ m³.
  const MEANS = { A: 16, B: 64, C: 256, D: 1024, E: 4096, F: 16384, G: 65536, H: 262144 };
  it.each(Object.entries(MEANS))('class %s has geometric mean %d·10⁻⁶ m³ [iso8608 Table 1; published]', (cls, mean) => {
    expectClose({ label: `G_d(n0) class ${cls}`, computed: roadRoughness(cls).Gd0, expected: mean * 1e-6, tol: 1e-12, why: 'exact table value' });
  });
  it('class limits run from half to twice the mean: C spans 128–512·10⁻⁶ m³ [iso8608 Table 1, from memory]', () => {
    expectClose({ label: 'C lower', computed: roadRoughness('C', 'lower').Gd0, expected: 128e-6, tol: 1e-12 });
    expectClose({ label: 'C upper', computed: roadRoughness('C', 'upper').Gd0, expected: 512e-6, tol: 1e-12 });
    expect(roadRoughness('A', 'lower').openLimit).toBe(true);
    expect(roadRoughness('H', 'upper').openLimit).toBe(true);
  });
  it('refuses an unknown class, naming the input', () => {
    expect(() => roadRoughness('Z')).toThrow(InputRangeError);
    expect(() => roadRoughness('Z')).toThrow(/roadClass/);
  });
  it('steps by a factor 4 from each class to the next', () => {
    for (let i = 1; i < ISO_8608_CLASSES.length; i++) {
      expectClose({ label: 'step', computed: roadRoughness(ISO_8608_CLASSES[i]!).Gd0 / roadRoughness(ISO_8608_CLASSES[i - 1]!).Gd0, expected: 4, tol: 1e-12 });
    }
  });
});

describe('road PSD in time (RV-A)', () => {
  // ISO 8608 spatial PSD converted to time: G_z(f) = G_d(f/V)/V; values computed (calc).
  it('class C at 20 m/s: G_z(1 Hz) = 5.12e-5 m²/Hz and white velocity level 2.021295e-3 (m/s)²/Hz [iso8608 §5 (from memory); closed form]', () => {
    const road = { Gd0: 256e-6, w: 2, V: 20 };
    expectClose({ label: 'G_z(1 Hz)', computed: roadDisplacementPsd(road, 1), expected: 5.12e-5, tol: 1e-12, why: 'closed form' });
    expectClose({ label: 'G0', computed: roadVelocityWhiteLevel(256e-6, 20), expected: 2.021295e-3, tol: 1e-6, why: '7 s.f.' });
    expectClose({ label: '(2πf)²G_z is flat', computed: (2 * Math.PI * 7) ** 2 * roadDisplacementPsd(road, 7), expected: 2.021295e-3, tol: 1e-6 });
  });
});

describe('spectral quadrature', () => {
  it('integrates 1/(1+f²) over (0, ∞) to π/2 with the tails added [closed form]', () => {
    const r = spectralIntegral((f) => 1 / (1 + f * f), 1e-3, 1e3);
    expectClose({ label: '∫ 1/(1+f²)', computed: r.value, expected: Math.PI / 2, tol: 1e-8, why: 'tail estimates exact to O(f⁻²) at the band edges' });
  });
  it('finds a narrow resonance (ζ = 0.001) between its first samples [closed form: ∫₀^∞ |iω/(k − ω² + icω)|² df = 1/(4c) for m = 1]', () => {
    // velocity mobility of a unit mass at f_n = 3 Hz; ∫_{−∞}^{∞} ω²/|k − ω² + icω|² dω = π/c, so the one-sided Hz integral is 1/(4c)
    const wn = 2 * Math.PI * 3;
    const c = 2 * 0.001 * wn;
    const g = (f: number) => { const w = 2 * Math.PI * f; return (w * w) / ((wn * wn - w * w) ** 2 + (c * w) ** 2); };
    expectClose({ label: 'narrow peak', computed: spectralIntegral(g, 1e-3, 1e4).value, expected: 1 / (4 * c), tol: 1e-6, why: 'adaptive panels, relTol 1e-9' });
  });
});

describe('quarter car on a random road', () => {
  it.each(roadReference.map((r) => [r.name, r] as const))('%s matches scipy [reference library scipy@' + SCIPY_VERSION + ']', (_n, ref) => {
    const r = roadDuty(ref.car, ref.road, { kind: 'linear', c: ref.c });
    for (const k of ['vRms', 'P', 'accRms', 'travelRms', 'tyreLoadRms'] as const) {
      expectClose({ label: `${ref.name} ${k}`, computed: r[k], expected: ref.expected[k], tol: 1e-6, why: 'both sides converged to < 1e-8; fixture printed to 10 s.f.' });
    }
  });

  it('RV-B: TW-210 corner on class A and C at 20 m/s [gobbi2001 closed forms (from memory); zuo2013; calc]', () => {
    const a = roadDuty(TW210, { Gd0: 16e-6, w: 2, V: 20 }, { kind: 'linear', c: 980 });
    expectClose({ label: 'σ_v A', computed: a.vRms, expected: 0.071808, tol: 1e-5, why: '5 s.f.' });
    expectClose({ label: 'P A', computed: a.P, expected: 5.0532, tol: 1e-4, why: '5 s.f.' });
    const c = roadDuty(TW210, { Gd0: 256e-6, w: 2, V: 20 }, { kind: 'linear', c: 980 });
    expectClose({ label: 'σ_v C', computed: c.vRms, expected: 0.287231, tol: 1e-5, why: '6 s.f.' });
    expectClose({ label: 'P C', computed: c.P, expected: 80.8518, tol: 1e-5, why: '6 s.f.' });
    expectClose({ label: 'travel C', computed: c.travelRms, expected: 0.01193, tol: 3e-4, why: '4 s.f.' });
    expectClose({ label: 'acc C', computed: c.accRms, expected: 1.41708, tol: 1e-5, why: '6 s.f.' });
  });

  it('frequency-domain integration agrees with the white-road closed forms to 0.5 % (in fact 1e-6) for any car', () => {
    fc.assert(fc.property(
      fc.double({ min: 100, max: 2000, noNaN: true }), fc.double({ min: 10, max: 300, noNaN: true }),
      fc.double({ min: 5e3, max: 2e5, noNaN: true }), fc.double({ min: 5e4, max: 2e6, noNaN: true }),
      fc.double({ min: 0.1, max: 1.2, noNaN: true }),
      (ms, mu, ks, kt, zeta) => {
        const c = 2 * zeta * Math.sqrt(ks * ms);
        const q = { ms, mu, ks, kt, c };
        const road = { Gd0: 256e-6, w: 2, V: 20 };
        const num = quarterCarRandom(q, road);
        const cf = quarterCarWhiteVariances(q, roadVelocityWhiteLevel(road.Gd0, road.V));
        for (const k of ['damperVelocity', 'travel', 'bodyAcceleration', 'tyreLoad'] as const) {
          expect(Math.abs(num[k].value / cf[k] - 1)).toBeLessThan(1e-6);
          expect(num[k].relError).toBeLessThan(5e-3);
        }
      }), { seed: 1, numRuns: 40 });
  });

  it.each([
    ['nearly rigid suspension, light damping', { ms: 240, mu: 36, ks: 5e6, kt: 160000 }, 10],
    ['damper locked solid', { ms: 240, mu: 36, ks: 16000, kt: 160000 }, 1e6],
    ['heavy truck corner on a stiff tyre', { ms: 20000, mu: 5000, ks: 5e6, kt: 1e7 }, 1e3],
  ] as const)('agrees with the closed forms at the edge of the input ranges: %s [closed form]', (_n, car, c) => {
    const r = roadDuty(car, { Gd0: 256e-6, w: 2, V: 20 }, { kind: 'linear', c });
    expect(r.closedFormDiff).toBeLessThan(1e-6);
  });

  it('checks its quadrature on the same car at w = 2 when w ≠ 2', () => {
    const r = roadDuty(TW210, { Gd0: 256e-6, w: 2.5, V: 20 }, { kind: 'linear', c: 980 });
    expect(r.closed).toBeUndefined();
    expect(r.closedFormDiff).toBeLessThan(1e-6);
  });

  it('road power on a w = 2 road does not depend on the damper, the spring or the masses', () => {
    fc.assert(fc.property(
      fc.double({ min: 100, max: 2000, noNaN: true }), fc.double({ min: 10, max: 300, noNaN: true }),
      fc.double({ min: 5e3, max: 2e5, noNaN: true }), fc.double({ min: 200, max: 2e4, noNaN: true }),
      (ms, mu, ks, c) => {
        const r = roadDuty({ ms, mu, ks, kt: 160000 }, { Gd0: 256e-6, w: 2, V: 20 }, { kind: 'linear', c });
        expect(Math.abs(r.P / whiteRoadDamperPower(160000, 256e-6, 20) - 1)).toBeLessThan(1e-6);
      }), { seed: 1, numRuns: 40 });
  });

  it('statistical linearisation of a power-law damper dissipates the same power as the white-road closed form', () => {
    fc.assert(fc.property(fc.double({ min: 0.2, max: 2, noNaN: true }), fc.double({ min: 200, max: 5000, noNaN: true }), (alpha, C) => {
      const r = roadDuty(TW210, { Gd0: 256e-6, w: 2, V: 20 }, { kind: 'power', C, alpha });
      expect(Math.abs(r.P / 80.8517992537 - 1)).toBeLessThan(1e-6);
      expect(Math.abs(r.c * r.vRms ** 2 / r.P - 1)).toBeLessThan(1e-8);
    }), { seed: 1, numRuns: 15 });
  });

  it('RV-C: C = 800 N·(s/m)^0.5, α = 0.5 at σ_v = 0.2 m/s dissipates 61.54 W [roberts2003 ch. 5 Gaussian moments; calc]', () => {
    // P = C·κ(α)·σ^(1+α) with κ(α) = E|v|^(1+α)/σ^(1+α) = 2^((1+α)/2)·Γ(1+α/2)/√π, κ(0.5) = 0.860040 (closed form)
    expectClose({ label: 'κ(0.5)', computed: gaussianMomentFactor(0.5), expected: 0.860040, tol: 1e-6, why: '6 s.f.' });
    expectClose({ label: 'P', computed: gaussianMeanPower({ kind: 'power', C: 800, alpha: 0.5 }, 0.2), expected: 61.54, tol: 1e-4, why: '4 s.f.' });
  });

  it('mean damper power is never negative, whatever the road and the car', () => {
    fc.assert(fc.property(fc.double({ min: 1e-6, max: 1e-2, noNaN: true }), fc.double({ min: 1.5, max: 3.5, noNaN: true }), fc.double({ min: 1, max: 60, noNaN: true }), (Gd0, w, V) => {
      expect(roadDuty(TW210, { Gd0, w, V }, { kind: 'linear', c: 980 }).P).toBeGreaterThanOrEqual(0);
    }), { seed: 1, numRuns: 25 });
  });

  it('refuses a waviness outside 1.5–3.5, naming w', () => {
    expect(() => roadDuty(TW210, { Gd0: 256e-6, w: 1, V: 20 }, { kind: 'linear', c: 980 })).toThrow(/'w'/);
  });
});

describe('statistical linearisation, starting point', () => {
  // c_eq = C·κ(α)·σ_v^(α−1) for F = C|v|^α sgn v under Gaussian velocity (Roberts & Spanos, Random
  // Vibration and Statistical Linearization, 2003, ch. 5, power-law damping; from memory), taken at
  // σ_v = 0.3 m/s; κ(0.5) = 0.86004 from Abramowitz & Stegun §26.2 (scipy), as in energyPerCycle.test.ts.
  it('a linear law starts at its own coefficient', () =>
    expectClose({ label: 'c0', computed: linearisationStart(800, 1), expected: 800, tol: 1e-12, why: 'κ(1) = 1 through the Γ function, to rounding' }));
  it('C = 800, α = 0.5 → 800 · 0.86004 / √0.3 = 1256.17 N·s/m', () =>
    expectClose({ label: 'c0', computed: linearisationStart(800, 0.5), expected: (800 * 0.86004) / Math.sqrt(0.3), tol: 1e-5, why: 'κ to 6 s.f.' }));
});

