/**
 * Force–velocity fits recover exact synthetic laws (closed form: data generated from the law
 * itself, so the least-squares solution is the law and R² = 1) and stay close under noise.
 * Noise model for the properties: independent uniform force errors of ±1 % of the largest force
 * (a dyno's load cell and peak picking, common practice, no source), seeded. The noisy bounds are
 * about 1.4–3× the worst error seen in 400 seeded trials of the same model (empirical bounds, not
 * confidence intervals); the least-squares property holds for any data.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { damperForce, fitBilinear, fitDamperLaw, fitLinearOrigin, fitPowerLaw, readFvPoints, type DamperLaw } from '../../../src/core/dampers/index.ts';
import { ComputationError, InputRangeError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const speeds = (lo: number, hi: number, n: number) => Array.from({ length: n }, (_, i) => lo + ((hi - lo) * i) / (n - 1));
const both = (a: number[]) => [...a.map((x) => -x).reverse(), ...a];
const sse = (law: DamperLaw, v: readonly number[], F: readonly number[]) => v.reduce((s, vi, i) => s + (F[i]! - damperForce(law, vi)) ** 2, 0);

/** Park–Miller style LCG so the noise is the same on every machine. */
function lcg(seed: number) {
  let s = seed % 2147483647 || 1;
  return () => { s = (s * 16807) % 2147483647; return s / 2147483647; };
}

describe('exact synthetic laws are recovered (closed form)', () => {
  it('power law F = 40 000·v^0.5 at 0.05–0.8 m/s → C = 40 000, α = 0.5, R² = 1 to 1e-6', () => {
    const a = speeds(0.05, 0.8, 16);
    const fit = fitDamperLaw(a, a.map((x) => 40_000 * Math.sqrt(x)), 'power');
    if (fit.law.kind !== 'power') throw new Error('kind');
    expectClose({ label: 'C', computed: fit.law.C, expected: 40_000, tol: 1e-6, why: 'exact data; the golden-section search stops at 1e-13 in α' });
    expectClose({ label: 'alpha', computed: fit.law.alpha, expected: 0.5, tol: 1e-6 });
    expectClose({ label: '1 − R²', computed: 1 - fit.r2, expected: 0, tol: 1e-6 });
  });

  it('power law in both directions, α = 0.35 (fluid viscous damper range): both sides and the main fit agree', () => {
    const v = both(speeds(0.02, 0.5, 12));
    const fit = fitDamperLaw(v, v.map((x) => Math.sign(x) * 2.5e5 * Math.abs(x) ** 0.35), 'power');
    for (const law of [fit.law, fit.rebound!, fit.compression!]) {
      if (law.kind !== 'power') throw new Error('kind');
      expectClose({ label: 'C', computed: law.C, expected: 2.5e5, tol: 1e-6 });
      expectClose({ label: 'alpha', computed: law.alpha, expected: 0.35, tol: 1e-6 });
    }
  });

  it('linear F = 980·v (TW-210 damper rate) in both directions → c = 980, R² = 1, zero residuals', () => {
    const v = both(speeds(0.05, 1, 20));
    const fit = fitDamperLaw(v, v.map((x) => 980 * x), 'linear');
    expect(fit.law).toEqual({ kind: 'linear', c: expect.closeTo(980, 1e-9) as unknown as number });
    expectClose({ label: '1 − R²', computed: 1 - fit.r2, expected: 0, tol: 1e-12 });
    expect(fit.rmsError).toBeLessThan(1e-9);
  });

  it('linear with rebound 2.5× compression: main c is the mean (equal velocity sets), sides exact', () => {
    const v = both(speeds(0.05, 1, 10));
    const fit = fitDamperLaw(v, v.map((x) => (x > 0 ? 1400 : 560) * x), 'linear');
    expect(fit.law.kind === 'linear' && fit.law.c).toBeCloseTo(980, 9);
    expect(fit.rebound).toEqual({ kind: 'linear', c: expect.closeTo(1400, 9) as unknown as number });
    expect(fit.compression).toEqual({ kind: 'linear', c: expect.closeTo(560, 9) as unknown as number });
  });

  it('bilinear with a knee at 0.1 m/s between points, rebound 2500/1100, compression 1000/440 → all five to 1e-6', () => {
    const v = both(speeds(0.02, 0.8, 21).map((x) => x + 0.0037)); // the knee falls between two speeds
    const law: DamperLaw = { kind: 'bilinear', vknee: 0.1, rebound: { c1: 2500, c2: 1100 }, compression: { c1: 1000, c2: 440 } };
    const fit = fitDamperLaw(v, v.map((x) => damperForce(law, x)), 'bilinear');
    if (fit.law.kind !== 'bilinear') throw new Error('kind');
    expectClose({ label: 'vknee', computed: fit.law.vknee, expected: 0.1, tol: 1e-6, why: 'exact data: the summed SSE is zero only at the knee' });
    expectClose({ label: 'c1', computed: fit.law.rebound.c1, expected: 2500, tol: 1e-6 });
    expectClose({ label: 'c2', computed: fit.law.rebound.c2, expected: 1100, tol: 1e-6 });
    expectClose({ label: 'c1c', computed: fit.law.compression.c1, expected: 1000, tol: 1e-6 });
    expectClose({ label: 'c2c', computed: fit.law.compression.c2, expected: 440, tol: 1e-6 });
    expectClose({ label: '1 − R²', computed: 1 - fit.r2, expected: 0, tol: 1e-6 });
  });

  it('bilinear rebound only: compression is absent, not invented', () => {
    const a = speeds(0.03, 0.6, 12);
    const law: DamperLaw = { kind: 'bilinear', vknee: 0.12, rebound: { c1: 3000, c2: 900 }, compression: { c1: 3000, c2: 900 } };
    const fit = fitDamperLaw(a, a.map((x) => damperForce(law, x)), 'bilinear');
    expect(fit.compression).toBeUndefined();
    expect(fit.law.kind === 'bilinear' && fit.law.vknee).toBeCloseTo(0.12, 7);
  });

  it('the building blocks: c = Σav/Σa², the knee-free power law and the single-side bilinear fit', () => {
    expect(fitLinearOrigin([1, 2], [3, 5])).toBeCloseTo(13 / 5, 14); // closed form (1·3 + 2·5)/(1 + 4)
    expect(fitPowerLaw([1, 2, 4], [3, 6, 12]).alpha).toBeCloseTo(1, 8);
    expect(fitBilinear([{ a: [0.05, 0.1, 0.2, 0.4], y: [100, 200, 300, 500] }]).slopes[0]!.c2).toBeCloseTo(1000, 6);
  });
});

describe('noisy data (seeded properties)', () => {
  const noisy = (law: DamperLaw, v: number[], seed: number, level: number) => {
    const rnd = lcg(seed);
    const Fmax = Math.max(...v.map((x) => Math.abs(damperForce(law, x))));
    return v.map((x) => damperForce(law, x) + (2 * rnd() - 1) * level * Fmax);
  };

  it('least squares: no fitted law leaves a larger residual sum than the law the data came from', () => {
    fc.assert(fc.property(
      fc.integer({ min: 1, max: 1e6 }), fc.double({ min: 0.3, max: 1.5, noNaN: true }), fc.double({ min: 300, max: 5000, noNaN: true }),
      (seed, alpha, C) => {
        const v = both(speeds(0.03, 0.9, 15));
        const truth: DamperLaw = { kind: 'power', C, alpha };
        const F = noisy(truth, v, seed, 0.02);
        const fit = fitDamperLaw(v, F, 'power');
        expect(sse(fit.law, v, F)).toBeLessThanOrEqual(sse(truth, v, F) * (1 + 1e-9));
      }), { seed: 1, numRuns: 200 });
  });

  it('power law with ±1 % noise, 30 points over 0.05–0.8 m/s: α within 0.02, force at 0.5 m/s within 1 %', () => {
    fc.assert(fc.property(fc.integer({ min: 1, max: 1e6 }), fc.double({ min: 0.3, max: 1.2, noNaN: true }), (seed, alpha) => {
      const v = both(speeds(0.05, 0.8, 15));
      const truth: DamperLaw = { kind: 'power', C: 2000, alpha };
      const fit = fitDamperLaw(v, noisy(truth, v, seed, 0.01), 'power');
      if (fit.law.kind !== 'power') throw new Error('kind');
      expect(Math.abs(fit.law.alpha - alpha)).toBeLessThan(0.02);
      expectClose({ label: 'F(0.5)', computed: damperForce(fit.law, 0.5), expected: damperForce(truth, 0.5), tol: 0.01 });
    }), { seed: 1, numRuns: 200 });
  });

  it('bilinear with ±1 % noise, 2 × 25 points, knee 0.1–0.25 m/s: knee within 15 %, low slopes within 10 %, high within 3 % / 6 %', () => {
    fc.assert(fc.property(fc.integer({ min: 1, max: 1e6 }), fc.double({ min: 0.1, max: 0.25, noNaN: true }), (seed, vknee) => {
      const v = both(speeds(0.02, 1, 25));
      const truth: DamperLaw = { kind: 'bilinear', vknee, rebound: { c1: 3500, c2: 900 }, compression: { c1: 1400, c2: 360 } };
      const fit = fitDamperLaw(v, noisy(truth, v, seed, 0.01), 'bilinear');
      if (fit.law.kind !== 'bilinear') throw new Error('kind');
      expectClose({ label: 'vknee', computed: fit.law.vknee, expected: vknee, tol: 0.15, why: 'few slow points carry little force against ±1 % of the largest' });
      expectClose({ label: 'c1', computed: fit.law.rebound.c1, expected: 3500, tol: 0.1 });
      expectClose({ label: 'c2', computed: fit.law.rebound.c2, expected: 900, tol: 0.03 });
      expectClose({ label: 'c1c', computed: fit.law.compression.c1, expected: 1400, tol: 0.1 });
      expectClose({ label: 'c2c', computed: fit.law.compression.c2, expected: 360, tol: 0.06 });
    }), { seed: 1, numRuns: 100 });
  });

  it('linear with ±1 % noise: c within 0.5 %', () => {
    fc.assert(fc.property(fc.integer({ min: 1, max: 1e6 }), (seed) => {
      const v = both(speeds(0.05, 1, 20));
      const fit = fitDamperLaw(v, noisy({ kind: 'linear', c: 980 }, v, seed, 0.01), 'linear');
      expectClose({ label: 'c', computed: fit.law.kind === 'linear' ? fit.law.c : NaN, expected: 980, tol: 0.005 });
    }), { seed: 1, numRuns: 200 });
  });
});

describe('bad data is refused with a typed error', () => {
  it('names the line of a bad row and catches Celsius in the kelvin column', () => {
    expect(() => readFvPoints('v,F\n0.1,98\n0.2,x\n0.3,294\n0.4,392')).toThrow(/line 3/);
    expect(() => readFvPoints('v,F,T\n0.1,98,293\n0.2,196,20')).toThrow(InputRangeError);
    expect(() => readFvPoints('v,F,T\n0.1,98,293\n0.2,196,20')).toThrow(/line 3.*kelvin/);
    expect(() => readFvPoints('0.1,98\n52,196')).toThrow(/line 2/);
  });
  it('removes the gas-force offset before fitting', () => {
    expect(readFvPoints('0.1,48\n-0.1,-148', -50).F).toEqual([98, -98]);
  });
  it('refuses points that cannot determine the law', () => {
    expect(() => fitDamperLaw([0, 0], [1, 2], 'linear')).toThrow(ComputationError);
    expect(() => fitDamperLaw([0.1, 0.1, 0.1], [1, 2, 3], 'power')).toThrow(ComputationError);
    expect(() => fitDamperLaw([0.1, 0.2, 0.3], [1, 2, 3], 'bilinear')).toThrow(ComputationError);
    expect(() => fitDamperLaw([0.1, 0.2, 0.3], [-1, -2, -3], 'power')).toThrow(/C ≤ 0/);
  });
});
