/**
 * Ride comfort of the quarter car (calculator road-power): the ISO 2631-1 W_k and W_d weightings,
 * the W_k-weighted RMS body acceleration against an independent integration of the weighted PSD,
 * the comfort reaction bands, and the comfort and road-holding optima of the damping.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  comfortReaction, quarterCarGains, quarterCarOptimalDamping, quarterCarWhiteVariances, roadDisplacementPsd, roadDuty,
  WEIGHTING_WD, WEIGHTING_WK, weightingSquared, type WeightingFilter,
} from '../../../src/core/duty/index.ts';
import { InputRangeError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const TW210 = { ms: 240, mu: 36, ks: 16000, kt: 160000 };

/** The four filters of ISO 2631-1 Annex A as complex rational functions of s = j2πf, evaluated term by term (no squared-magnitude algebra). */
function weightingComplex(w: WeightingFilter, f: number): number {
  type C = [number, number];
  const mul = (a: C, b: C): C => [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]];
  const div = (a: C, b: C): C => { const d = b[0] ** 2 + b[1] ** 2; return [(a[0] * b[0] + a[1] * b[1]) / d, (a[1] * b[0] - a[0] * b[1]) / d]; };
  const add = (...xs: C[]): C => xs.reduce((p, x) => [p[0] + x[0], p[1] + x[1]], [0, 0] as C);
  const sc = (k: number, a: C): C => [k * a[0], k * a[1]];
  const s: C = [0, 2 * Math.PI * f];
  const om = (fx: number) => 2 * Math.PI * fx;
  const one: C = [1, 0];
  const hh = div(one, add(one, sc(Math.SQRT2 * om(w.f1), div(one, s)), sc(om(w.f1) ** 2, div(one, mul(s, s)))));
  const hl = div(one, add(one, sc(Math.SQRT2 / om(w.f2), s), sc(1 / om(w.f2) ** 2, mul(s, s))));
  const ht = div(add(one, sc(1 / om(w.f3), s)), add(one, sc(1 / (w.Q4 * om(w.f4)), s), sc(1 / om(w.f4) ** 2, mul(s, s))));
  let h = mul(mul(hh, hl), ht);
  if (w.step) {
    const { f5, Q5, f6, Q6 } = w.step;
    const hs = sc((om(f5) / om(f6)) ** 2, div(add(one, sc(1 / (Q5 * om(f5)), s), sc(1 / om(f5) ** 2, mul(s, s))), add(one, sc(1 / (Q6 * om(f6)), s), sc(1 / om(f6) ** 2, mul(s, s)))));
    h = mul(h, hs);
  }
  return Math.hypot(h[0], h[1]);
}

describe('ISO 2631-1 frequency weightings', () => {
  // ISO 2631-1:1997 Table 3 (W_k, W_d factors ×1000; from memory): the filter must reproduce them to ±0.005.
  const WK: [number, number][] = [[1, 0.482], [2, 0.531], [4, 0.967], [6.3, 1.054]];
  const WD: [number, number][] = [[0.5, 0.853], [1, 1.011], [2, 0.890], [4, 0.512]];
  it.each(WK)('|W_k(%s Hz)| = %s [iso2631_1 Table 3, from memory; tolerance ±0.005 absolute, the table is given to 3 digits]', (f, w) => {
    expect(Math.abs(Math.sqrt(weightingSquared(WEIGHTING_WK, f)) - w)).toBeLessThanOrEqual(0.005);
  });
  it.each(WD)('|W_d(%s Hz)| = %s [iso2631_1 Table 3, from memory; ±0.005 absolute]', (f, w) => {
    expect(Math.abs(Math.sqrt(weightingSquared(WEIGHTING_WD, f)) - w)).toBeLessThanOrEqual(0.005);
  });
  it('the squared-magnitude forms equal the Annex A transfer functions evaluated in complex arithmetic, 0.05–500 Hz [iso2631_1 Annex A eqs. A.1–A.4 (numbers from memory); closed form]', () => {
    fc.assert(fc.property(fc.double({ min: Math.log(0.05), max: Math.log(500), noNaN: true }), (u) => {
      const f = Math.exp(u);
      for (const w of [WEIGHTING_WK, WEIGHTING_WD]) {
        expect(Math.abs(Math.sqrt(weightingSquared(w, f)) / weightingComplex(w, f) - 1)).toBeLessThan(1e-12);
      }
    }), { seed: 1, numRuns: 200 });
  });
});

describe('W_k-weighted RMS body acceleration', () => {
  /**
   * Independent reference: the weighted PSD |W_k|²·|H_a|²·G_z summed by the composite trapezoid rule on
   * 400 000 equal steps of ln f from 10⁻³ to 10⁴ Hz (no adaptivity, no tails). The weighted PSD falls as
   * f^4 below 0.4 Hz and at least as f^-6 above 100 Hz, so the cut tails are below 1e-9 of the total,
   * and the trapezoid error at this step (3.9e-5 in ln f) is below 1e-8 relative.
   */
  function reference(car: typeof TW210 & { c: number }, road: { Gd0: number; w: number; V: number }): number {
    const n = 400_000;
    const u1 = Math.log(1e-3), u2 = Math.log(1e4), h = (u2 - u1) / n;
    let sum = 0;
    for (let i = 0; i <= n; i++) {
      const f = Math.exp(u1 + i * h);
      const g = weightingSquared(WEIGHTING_WK, f) * quarterCarGains(car, f).bodyAcceleration * roadDisplacementPsd(road, f) * f;
      sum += i === 0 || i === n ? 0.5 * g : g;
    }
    return Math.sqrt(sum * h);
  }
  it.each([
    ['TW-210 corner, class C, 20 m/s, w = 2', { ...TW210, c: 980 }, { Gd0: 256e-6, w: 2, V: 20 }],
    ['stiff light car, w = 2.5, 12 m/s', { ms: 180, mu: 40, ks: 30000, kt: 200000, c: 2500 }, { Gd0: 1024e-6, w: 2.5, V: 12 }],
    ['soft heavy car, w = 1.8, 30 m/s', { ms: 600, mu: 60, ks: 25000, kt: 300000, c: 1500 }, { Gd0: 64e-6, w: 1.8, V: 30 }],
  ])('%s: equals the trapezoid integral of the weighted PSD within 1e-6 [closed form of the integrand; numerical reference]', (_name, car, road) => {
    const r = roadDuty(car, road, { kind: 'linear', c: car.c });
    expectClose({ label: 'a_w', computed: r.awWk, expected: reference(car, road), tol: 1e-6, why: 'adaptive quadrature at 1e-8 plus tails against a 400 000-step trapezoid (error < 1e-8)' });
    expect(r.awWk).toBeLessThan(1.07 * r.accRms); // |W_k| ≤ 1.07 everywhere
  });
});

describe('comfort reaction bands', () => {
  // ISO 2631-1:1997 Annex C.2.3, public transport (from memory).
  it.each([[0.2, 'not uncomfortable'], [0.4, 'a little uncomfortable'], [0.55, 'a little uncomfortable to fairly uncomfortable'], [1.1, 'uncomfortable'], [1.5, 'uncomfortable to very uncomfortable'], [3, 'extremely uncomfortable']] as const)(
    'a_w = %s m/s² is "%s" [iso2631_1 Annex C, from memory]', (aw, text) => { expect(comfortReaction(aw)).toBe(text); });
  it('refuses a negative value, naming aw', () => { expect(() => comfortReaction(-1)).toThrow(InputRangeError); });
});

describe('comfort and road-holding optimum of the damping', () => {
  /** Golden-section search of a function of ln c (an independent minimiser). */
  function argmin(g: (c: number) => number): number {
    let a = Math.log(10), b = Math.log(1e6);
    const r = (Math.sqrt(5) - 1) / 2;
    for (let i = 0; i < 200; i++) {
      const x1 = b - r * (b - a), x2 = a + r * (b - a);
      if (g(Math.exp(x1)) < g(Math.exp(x2))) b = x2; else a = x1;
    }
    return Math.exp((a + b) / 2);
  }
  it('TW-210: comfort optimum k_s√(M/k_t) = 664.5 N·s/m, road-holding optimum 1948 N·s/m, each the minimum of its closed-form variance [gobbi2001 (from memory); closed form]', () => {
    const opt = quarterCarOptimalDamping(TW210);
    expectClose({ label: 'c comfort', computed: opt.comfort, expected: 16000 * Math.sqrt(276 / 160000), tol: 1e-12 });
    const acc = argmin((c) => quarterCarWhiteVariances({ ...TW210, c }, 1).bodyAcceleration);
    const tyre = argmin((c) => quarterCarWhiteVariances({ ...TW210, c }, 1).tyreLoad);
    expectClose({ label: 'comfort vs search', computed: opt.comfort, expected: acc, tol: 1e-6, why: 'golden section to 1e-8 in ln c; flat minimum' });
    expectClose({ label: 'road holding vs search', computed: opt.roadHolding, expected: tyre, tol: 1e-6 });
  });
  it('the optima exist and are positive for every quarter car in range', () => {
    fc.assert(fc.property(fc.double({ min: 1, max: 2e4, noNaN: true }), fc.double({ min: 0.5, max: 5e3, noNaN: true }), fc.double({ min: 100, max: 5e6, noNaN: true }), fc.double({ min: 1000, max: 1e7, noNaN: true }), (ms, mu, ks, kt) => {
      const o = quarterCarOptimalDamping({ ms, mu, ks, kt });
      expect(o.comfort).toBeGreaterThan(0);
      expect(o.roadHolding).toBeGreaterThan(0);
    }), { seed: 1, numRuns: 200 });
  });
});
