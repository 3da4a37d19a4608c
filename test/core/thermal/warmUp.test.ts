import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { lumpedWarmUp, onOffDuty, rk4, timeToLimit, warmUpWithLoss, biotNumber, bodyCooling } from '../../../src/core/thermal/index.ts';
import { InputRangeError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

// Lumped capacitance with a heat source: Incropera, Fundamentals of Heat and Mass Transfer 6th ed., §5.3
// (from memory). Figures: C = 2.0 kg steel × 460 + 0.25 kg oil × 1900 = 1395 J/K, UA = 0.745664 W/K,
// T∞ = 25 °C, evaluated independently (reference library numpy, version not recorded).
const LT = { Cth: 1395, UA: 0.745664, Tamb: 298.15 } as const;

describe('lumpedWarmUp (closed form)', () => {
  it('gives τ, the equilibrium rise and T(600 s), T(3600 s) at 50 W', () => {
    const w = lumpedWarmUp({ ...LT, P: 50 });
    expectClose({ label: 'τ', computed: w.tau, expected: 1870.8, tol: 5e-5, why: '5 s.f.' });
    expectClose({ label: 'ΔT_ss', computed: w.Tss - 298.15, expected: 67.054, tol: 2e-5, why: '5 s.f.' });
    expectClose({ label: 'T(600)', computed: w.at(600) - 273.15, expected: 43.398, tol: 2e-5, why: '5 s.f.' });
    expectClose({ label: 'T(3600)', computed: w.at(3600) - 273.15, expected: 82.266, tol: 2e-5, why: '5 s.f.' });
    expect(w.timeTo(373.15)).toBeUndefined();
  });
  it('gives the time to 100 °C at 150 W', () => {
    expectClose({ label: 't_lim', computed: lumpedWarmUp({ ...LT, P: 150 }).timeTo(373.15)!, expected: 872.8, tol: 1e-4, why: '4 s.f.' });
  });
  it('refuses a non-positive capacity or conductance', () => {
    expect(() => lumpedWarmUp({ ...LT, P: 1, Cth: 0 })).toThrow(InputRangeError);
    expect(() => lumpedWarmUp({ ...LT, P: 1, UA: -1 })).toThrow(/UA/);
  });
  it('never overshoots the equilibrium at constant power', () => {
    fc.assert(fc.property(
      fc.double({ min: 0, max: 1000, noNaN: true }), fc.double({ min: 10, max: 1e5, noNaN: true }), fc.double({ min: 0.01, max: 100, noNaN: true }), fc.double({ min: 0, max: 1e6, noNaN: true }),
      (P, C, UA, t) => {
        const w = lumpedWarmUp({ P, Cth: C, UA, Tamb: 300 });
        const T = w.at(t);
        return T >= 300 - 1e-9 && T <= w.Tss + 1e-9;
      }), { seed: 1, numRuns: 100 });
  });
  it('reaches the temperature it says it reaches, when it says', () => {
    fc.assert(fc.property(fc.double({ min: 1, max: 500, noNaN: true }), fc.double({ min: 0.01, max: 0.99, noNaN: true }), (P, frac) => {
      const w = lumpedWarmUp({ ...LT, P });
      const target = 298.15 + frac * (w.Tss - 298.15);
      return Math.abs(w.at(w.timeTo(target)!) - target) < 1e-8;
    }), { seed: 1, numRuns: 100 });
  });
});

describe('onOffDuty (exact piecewise exponentials)', () => {
  it('equals the constant-power case at full duty', () => {
    const d = onOffDuty({ ...LT, P: 150 }, 1, 600);
    expectClose({ label: 't_lim', computed: d.timeTo(373.15)!, expected: 872.8, tol: 1e-4, why: 'same as LT-B' });
  });
  it('matches a phase-by-phase march for the cyclic peak and the time to a limit', () => {
    const b = { ...LT, P: 150 };
    const d = onOffDuty(b, 0.5, 600);
    // march: exact exponentials on each half period, 200 cycles
    const tau = LT.Cth / LT.UA;
    let th = 0;
    let peak = 0;
    for (let n = 0; n < 200; n++) {
      th = 150 / LT.UA + (th - 150 / LT.UA) * Math.exp(-300 / tau);
      peak = th;
      th *= Math.exp(-300 / tau);
    }
    expectClose({ label: 'cyclic peak', computed: d.Tpeak - 298.15, expected: peak, tol: 1e-9, why: 'same exponentials, geometric sum vs march' });
    const tl = d.timeTo(373.15)!;
    expectClose({ label: 'T(t_lim)', computed: d.at(tl), expected: 373.15, tol: 1e-10, why: 'consistency of at() and timeTo()' });
    expect(d.at(tl * 0.999)).toBeLessThan(373.15);
  });
  it('never rises above its cyclic peak', () => {
    fc.assert(fc.property(fc.double({ min: 0.05, max: 1, noNaN: true }), fc.double({ min: 10, max: 5000, noNaN: true }), fc.double({ min: 0, max: 2e4, noNaN: true }), (d, tp, t) => {
      const s = onOffDuty({ ...LT, P: 100 }, d, tp);
      return s.at(t) <= s.Tpeak + 1e-9;
    }), { seed: 1, numRuns: 100 });
  });
});

describe('RK4 and the quadrature route, checked against the closed form', () => {
  it('RK4 with constant UA matches the closed form within 1e-6 K with 400 steps over 2τ', () => {
    const w = lumpedWarmUp({ ...LT, P: 50 });
    const r = warmUpWithLoss((T) => LT.UA * (T - 298.15), 50, LT.Cth, 298.15, 2 * w.tau, 400);
    const err = Math.max(...r.t.map((t, i) => Math.abs(r.T[i]! - w.at(t))));
    expect(err).toBeLessThan(1e-6);
  });
  it('RK4 converges at fourth order (error ratio ≈ 16 when the step halves)', () => {
    const exact = Math.exp(-2);
    const e1 = Math.abs(rk4((_t, y) => -y, 1, 2, 20).y.at(-1)! - exact);
    const e2 = Math.abs(rk4((_t, y) => -y, 1, 2, 40).y.at(-1)! - exact);
    expect(e1 / e2).toBeGreaterThan(14);
    expect(e1 / e2).toBeLessThan(18);
  });
  it('quadrature of dt/dT gives the closed-form time to the limit', () => {
    const t = timeToLimit((T) => 150 - LT.UA * (T - 298.15), LT.Cth, 298.15, 373.15)!;
    expectClose({ label: 't_lim quadrature', computed: t, expected: lumpedWarmUp({ ...LT, P: 150 }).timeTo(373.15)!, tol: 1e-8, why: 'adaptive Simpson at 1e-9 relative' });
    expect(timeToLimit((T) => 50 - LT.UA * (T - 298.15), LT.Cth, 298.15, 373.15)).toBeUndefined();
  });
  it('RK4 with h(T) from the body model agrees with the quadrature time to 80 °C, and its energy audit closes', () => {
    const body = { D: 0.05, L: 0.35, orientation: 'horizontal' as const, ends: false, eps: 0.9, Tamb: 298.15, V: 0 };
    const Q = (T: number) => bodyCooling(body, T).Q;
    const tq = timeToLimit((T) => 60 - Q(T), LT.Cth, 298.15, 353.15)!;
    const r = rk4((_t, T) => (60 - Q(T)) / LT.Cth, 298.15, 3 * tq, 3000, 353.15);
    expectClose({ label: 't(80 °C) RK4 vs quadrature', computed: r.tCross!, expected: tq, tol: 1e-6, why: 'two independent methods, both at ≤1e-8 local error' });
    // energy audit: C·(T_end − T_0) = ∫(P − Q) dt by the trapezoid rule on the RK4 samples
    let net = 0;
    for (let i = 1; i < r.t.length; i++) net += 0.5 * (r.t[i]! - r.t[i - 1]!) * (60 - Q(r.y[i]!) + 60 - Q(r.y[i - 1]!));
    const stored = LT.Cth * (r.y.at(-1)! - 298.15);
    expect(Math.abs(net - stored) / stored).toBeLessThan(1e-4); // trapezoid error on ~3000 steps
  });
});

describe('biotNumber', () => {
  it('is h·L_c/k (Incropera 6th ed. eq. 5.10, closed form) and refuses k ≤ 0', () => {
    expectClose({ label: 'Bi', computed: biotNumber(13.5, 0.0125, 50), expected: 0.003375, tol: 1e-14, why: 'same arithmetic' });
    expect(() => biotNumber(10, 0.01, 0)).toThrow(/k/);
  });
});
