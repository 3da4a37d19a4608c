/**
 * Every equilibrium the thermal core reports balances its heat: a vertical body across Ra_L = 1e9,
 * the residual checks of the solvers, and properties over the whole input range of the pages.
 * Incropera = Incropera, DeWitt, Bergman & Lavine, Fundamentals of Heat and Mass Transfer, 6th ed.
 * Sources of the checks: Nu_L by eq. 9.26 (Incropera; published formula, evaluated in closed form);
 * the heat balances Q(T_s) = P are the definition of the equilibrium (closed form); √2 is the root
 * of x² − 2 (closed form); Nu_D = 23.09 is the churchillChuCylinder doc example (Incropera
 * Example 9.3 steam pipe, eq. 9.34; from memory); the 0.5 K and 2 % monotonicity margins are
 * common practice, no source (they only need to exceed the solver tolerance and miss the old jump).
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  bodyCooling, fadeEquilibrium, waltherFit, steadyTemperature, verticalPlateNusselt, type Body, type FadeModel,
} from '../../../src/core/thermal/index.ts';
import { ComputationError } from '../../../src/core/errors.ts';
import { checkedRoot } from '../../../src/core/thermal/checkedRoot.ts';
import { expectClose } from '../../helpers/expectClose.ts';

/** The audit case: vertical Ø100 × 1000 mm, ε = 0, still air at 25 °C; Ra_L crosses 1e9 near 310 K. */
const TALL: Body = { D: 0.1, L: 1, orientation: 'vertical', ends: false, eps: 0, Tamb: 298.15, V: 0 };

describe('vertical body: one continuous correlation over the offered range', () => {
  it('has no jump in Nu_L at Ra_L = 1e9 (all-range Churchill–Chu, Incropera eq. 9.26; closed form)', () => {
    const below = verticalPlateNusselt(1e9 * (1 - 1e-12), 0.7);
    const above = verticalPlateNusselt(1e9 * (1 + 1e-12), 0.7);
    // eq. 9.26 at Ra = 1e9, Pr = 0.7: {0.825 + 0.387·1e9^{1/6}/[1 + (0.492/0.7)^{9/16}]^{8/27}}² (closed form)
    const g = (1 + (0.492 / 0.7) ** (9 / 16)) ** (8 / 27);
    expectClose({ label: 'Nu_L(1e9⁻)', computed: below, expected: (0.825 + (0.387 * 1e9 ** (1 / 6)) / g) ** 2, tol: 1e-10, why: 'the same formula on both sides' });
    expectClose({ label: 'Nu_L jump', computed: above, expected: below, tol: 1e-10, why: 'continuous' });
  });
  it('sheds the 10 W it is given (audit case: reported T_s = 309.81 K shed only 8.97 W before)', () => {
    const r = steadyTemperature(TALL, 10);
    expectClose({ label: 'Q(T_s)', computed: bodyCooling(TALL, r.Ts).Q, expected: 10, tol: 1e-9, why: 'heat balance, closed form' });
  });
  it('gives different temperatures for 9 W and 11 W (the jump gave one temperature for 8.97–11.96 W)', () => {
    expect(steadyTemperature(TALL, 11).Ts - steadyTemperature(TALL, 9).Ts).toBeGreaterThan(0.5);
  });
  it('rates the body continuously as T_max crosses Ra_L = 1e9 (P_max jumped by ~34 % before)', () => {
    const T = Array.from({ length: 201 }, (_, i) => 305 + (10 * i) / 200);
    const Q = T.map((t) => bodyCooling(TALL, t).Q);
    for (let i = 1; i < Q.length; i++) expect(Q[i]! / Q[i - 1]!).toBeLessThan(1.02);
  });
});

describe('equilibrium solvers check their residual', () => {
  it('refuses a bracket that holds a jump, not a root (typed error)', () => {
    const step = (x: number) => (x < 1 ? -1 : 1);
    expect(() => checkedRoot(step, 0, 2, 'test balance', 'W')).toThrow(ComputationError);
    expect(() => checkedRoot(step, 0, 2, 'test balance', 'W')).toThrow(/not a root|jump/);
  });
  it('returns a true root to the asked tolerance', () => {
    expectClose({ label: '√2', computed: checkedRoot((x) => x * x - 2, 0, 2, 'x²', '').x, expected: Math.SQRT2, tol: 1e-9, why: 'closed form' });
  });
});

const body = fc.record({
  D: fc.double({ min: 0.005, max: 1, noNaN: true }),
  L: fc.double({ min: 0.01, max: 5, noNaN: true }),
  orientation: fc.constantFrom('horizontal' as const, 'vertical' as const),
  ends: fc.boolean(),
  eps: fc.double({ min: 0, max: 1, noNaN: true }),
  Tamb: fc.double({ min: 223.15, max: 333.15, noNaN: true }),
  dTsur: fc.double({ min: -20, max: 200, noNaN: true }),
  V: fc.double({ min: 0, max: 90, noNaN: true }),
}).map(({ dTsur, ...b }): Body => ({ ...b, Tsur: b.Tamb + dTsur }));

describe('properties: every reported equilibrium satisfies its heat balance to 1e-6 relative', () => {
  // Powers from 1 mW (below that 1e-6 of P is finer than the solver's 1e-9 K resolution) to the pages' 20 kW, and 0.
  const power = fc.oneof(fc.constant(0), fc.double({ min: 1e-3, max: 20000, noNaN: true }));
  it('steadyTemperature: Q(T_s) = P wherever it answers', () => {
    fc.assert(fc.property(body, power, (b, P) => {
      let r;
      try { r = steadyTemperature(b, P); } catch (e) { if (e instanceof ComputationError) return true; throw e; }
      const Q = bodyCooling(b, r.Ts).Q;
      // 1e-6 of the larger of P and the two flows; absolute floor UA·2e-9 K, the solver's temperature
      // resolution (binds only when every flow vanishes: P = 0 with T_sur within round-off of T∞)
      const q = bodyCooling(b, r.Ts);
      const tol = Math.max(1e-6 * Math.max(P, Math.abs(q.Qconv), Math.abs(q.Qrad)), 2e-9 * q.UA);
      // at the lowest temperature offered the body may shed more than P already (then T_s is that end)
      if (r.Ts === Math.min(b.Tamb, b.Tsur ?? b.Tamb)) return Q - P >= -tol;
      return Math.abs(Q - P) <= tol;
    }), { seed: 19019, numRuns: 400 });
  });
  it('fadeEquilibrium: Q(T) = P(c(T)) at every crossing', () => {
    const model = fc.record({ cRef: fc.double({ min: 10, max: 1e5, noNaN: true }), Tref: fc.constant(298.15), viscousShare: fc.double({ min: 0, max: 1, noNaN: true }), oil: fc.constant(waltherFit(20e-6, 4.5e-6)) });
    fc.assert(fc.property(body, fc.double({ min: 1e-4, max: 0.1, noNaN: true }), fc.double({ min: 1, max: 200, noNaN: true }), fc.double({ min: 5, max: 300, noNaN: true }), model, (b, X, omega, dTlim, m) => {
      const Tlimit = Math.min(700, b.Tamb + dTlim);
      let eq;
      try { eq = fadeEquilibrium(b, m as FadeModel, { kind: 'harmonic', X, omega }, Tlimit); } catch (e) { if (e instanceof ComputationError) return true; throw e; }
      return eq.crossings.every((c) => {
        const q = bodyCooling(b, c.T);
        return Math.abs(q.Q - c.P) <= Math.max(1e-6 * Math.max(c.P, Math.abs(q.Qconv), Math.abs(q.Qrad)), 2e-9 * q.UA);
      });
    }), { seed: 19020, numRuns: 200 });
  });
});

describe('doc examples', () => {
  it('churchillChuCylinder(5.073e6, 0.697) returns the 23.09 its example states (closed form of Incropera eq. 9.34)', async () => {
    const { churchillChuCylinder } = await import('../../../src/core/thermal/index.ts');
    expectClose({ label: 'Nu_D', computed: churchillChuCylinder(5.073e6, 0.697), expected: 23.09, tol: 2e-4, why: 'the example gives 4 s.f.' });
  });
});
