/**
 * Two-node body (oil and body joined by G_ob): the transient against the matrix-exponential closed
 * form, the one-node limit, the energy audit over the integration, steady oil temperature and the
 * fade equilibrium taken at the oil temperature.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  bodyCooling, dutyPower, fadeCoefficient, fadeEquilibrium, mineralOilCurve, oilTemperature, profileWarmUp, twoNodeLinear, twoNodeWarmUp, type Body, type FadeModel,
} from '../../../src/core/thermal/index.ts';
import { ComputationError, InputRangeError } from '../../../src/core/errors.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const UA = 0.745664;
const T0 = 298.15;
const lin = (T: number) => UA * (T - T0);
const NODES = { Coil: 475, Cbody: 920, Gob: 8, T0 };

/**
 * x′ = Ax + b with A = [[−G/C_o, G/C_o], [G/C_b, −(G + UA)/C_b]], b = [P/C_o, 0], x(0) = 0, solved by
 * scipy.linalg.expm (scipy 1.17.1, numpy 2.4.6) in float64: reference library, 9 s.f. kept.
 */
const EXPM_50W: readonly (readonly [t: number, oil: number, body: number])[] = [
  [600, 319.9909078305799, 315.3564013069206],
  [3600, 360.91835763004065, 354.9990932527146],
];

describe('twoNodeWarmUp: oil and body as two lumped nodes', () => {
  for (const [t, oil, body] of EXPM_50W) {
    it(`50 W from 25 °C: oil and body at ${t} s equal the matrix-exponential solution (reference library scipy@1.17.1, expm)`, () => {
      const r = twoNodeWarmUp(lin, NODES, { t: [0, 1e6], P: [50] }, 'off', t);
      expectClose({ label: 'oil', computed: r.oil.at(-1)!, expected: oil, tol: 1e-9, why: 'rtol 1e-9 adaptive integration of a linear system' });
      expectClose({ label: 'body', computed: r.body.at(-1)!, expected: body, tol: 1e-9, why: 'same' });
    });
  }
  it('150 W: the oil reaches 100 °C at 719.824 s (scipy brentq on the expm solution, xtol 1e-12)', () => {
    const r = twoNodeWarmUp(lin, NODES, { t: [0, 1e6], P: [150] }, 'off', 3600, { stopAt: 373.15 });
    expectClose({ label: 'tCross', computed: r.tCross!, expected: 719.8241970784654, tol: 1e-8, why: 'event located to round-off on rtol 1e-9 steps' });
  });
  it('with a very large G_ob the exact two-node run recovers the one-node closed form of a repeated on/off profile (Incropera §5.3, closed form)', () => {
    const p = { t: [0, 600, 1200], P: [120, 0] };
    const r = twoNodeLinear({ ...NODES, Gob: 1e4 }, UA, p, 'repeat', 3000).at(3000);
    const one = profileWarmUp({ Cth: 1395, UA, Tamb: T0 }, p, 'repeat');
    // oil − body ≈ P/G_ob = 0.012 K while heating; the mass-weighted mean follows the one-node solution
    const mean = (475 * r.oil + 920 * r.body) / 1395;
    expectClose({ label: 'mean T at 3000 s', computed: mean, expected: one.at(3000), tol: 1e-5, why: 'the weighted mean lags one node by about (C_oil/C)·P/G_ob ≈ 0.004 K, 1e-5 of T' });
  });
  it('energy audit: stored + shed = put in over the integration, for random profiles and conductances (property)', () => {
    fc.assert(fc.property(
      fc.array(fc.double({ min: 0, max: 500, noNaN: true }), { minLength: 1, maxLength: 12 }),
      fc.double({ min: 10, max: 2000, noNaN: true }), fc.double({ min: 0.5, max: 100, noNaN: true }), fc.boolean(),
      (P, tp, Gob, repeat) => {
        const t = P.map((_, i) => (tp * i) / P.length).concat([tp]);
        const body: Body = { D: 0.05, L: 0.35, orientation: 'horizontal', ends: false, eps: 0.9, Tamb: T0, V: 0, Gmount: 0.1 };
        const r = twoNodeWarmUp((T) => bodyCooling(body, T).Q, { ...NODES, Gob }, { t, P }, repeat ? 'repeat' : 'off', 3 * tp);
        const scale = Math.max(r.energyIn, 1);
        return Math.abs(r.energyIn - r.energyStored - r.energyLost) <= 1e-7 * scale;
      }), { seed: 1, numRuns: 40 });
  });
  it('refuses too many segments and bad capacities with typed errors', () => {
    expect(() => twoNodeWarmUp(lin, NODES, { t: [0, 0.5, 1], P: [1, 0] }, 'repeat', 1e6)).toThrow(ComputationError);
    expect(() => twoNodeWarmUp(lin, { ...NODES, Coil: 0 }, { t: [0, 1], P: [1] }, 'off', 10)).toThrow(InputRangeError);
    // a stiff oil node (τ_fast = 0.03 s against a 3000 s run) is refused before integrating, not ground through
    expect(() => twoNodeWarmUp(lin, { ...NODES, Gob: 1e4 }, { t: [0, 600, 1200], P: [120, 0] }, 'repeat', 3000)).toThrow(/oil follows the body/);
  });
});

describe('steady oil temperature and fade at the oil', () => {
  it('T_oil = T_b + P/G_ob (thermal resistance in series, Incropera 6th ed. eq. 3.19, from memory; closed form)', () => {
    expect(oilTemperature(353.15, 40, 8)).toBeCloseTo(358.15, 12);
  });
  it('the two-node fade equilibrium balances heat and power with c taken at T_oil = T_b + Q/G_ob, hotter and more faded than one node (closed form of the balance)', () => {
    const body: Body = { D: 0.05, L: 0.35, orientation: 'horizontal', ends: false, eps: 0.9, Tamb: T0, V: 0 };
    const model: FadeModel = { cRef: 980, Tref: T0, viscousShare: 0.5, oil: mineralOilCurve(20e-6, 4.5e-6) };
    const duty = { kind: 'harmonic' as const, X: 0.02, omega: 2 * Math.PI * 1.5 };
    const one = fadeEquilibrium(body, model, duty, 373.15).reached!;
    const two = fadeEquilibrium(body, model, duty, 373.15, 1395, { Gob: 2 }).reached!;
    const Q = bodyCooling(body, two.T).Q;
    expectClose({ label: 'Toil', computed: two.Toil, expected: two.T + Q / 2, tol: 1e-14, why: 'definition' });
    expectClose({ label: 'balance', computed: Q, expected: dutyPower(duty, fadeCoefficient(model, two.Toil)), tol: 1e-7, why: 'checked root' });
    expect(two.c).toBeLessThan(one.c);
    expect(one.Toil).toBe(one.T);
  });
});

describe('twoNodeLinear: the exact segment-by-segment solution at constant UA', () => {
  for (const [t, oil, body] of EXPM_50W) {
    it(`50 W: oil and body at ${t} s equal the matrix-exponential solution (reference library scipy@1.17.1, expm)`, () => {
      const r = twoNodeLinear(NODES, UA, { t: [0, 1e6], P: [50] }, 'off', t);
      expectClose({ label: 'oil', computed: r.at(t).oil, expected: oil, tol: 1e-13, why: 'closed form against closed form in float64' });
      expectClose({ label: 'body', computed: r.at(t).body, expected: body, tol: 1e-13, why: 'same' });
    });
  }
  it('150 W: the oil reaches 100 °C at 719.8242 s (scipy brentq on the expm solution)', () => {
    expectClose({ label: 'tCross', computed: twoNodeLinear(NODES, UA, { t: [0, 1e6], P: [150] }, 'off', 3600).tCross(373.15)!, expected: 719.8241970784654, tol: 1e-12, why: 'bisection to 1e-12 s' });
  });
  it('agrees with the integrated run on a repeated profile: end state, oil peak, energy audit (property)', () => {
    fc.assert(fc.property(
      fc.array(fc.double({ min: 0, max: 300, noNaN: true }), { minLength: 1, maxLength: 8 }),
      fc.double({ min: 60, max: 2000, noNaN: true }), fc.double({ min: 1, max: 50, noNaN: true }),
      (P, tp, Gob) => {
        const t = P.map((_, i) => (tp * i) / P.length).concat([tp]);
        const nodes = { ...NODES, Gob };
        const a = twoNodeLinear(nodes, UA, { t, P }, 'repeat', 3 * tp);
        const b = twoNodeWarmUp(lin, nodes, { t, P }, 'repeat', 3 * tp);
        const end = a.at(3 * tp);
        const scale = Math.max(1, ...P) / UA;
        return Math.abs(end.oil - b.oil.at(-1)!) <= 1e-6 * scale && Math.abs(end.body - b.body.at(-1)!) <= 1e-6 * scale
          && a.oilPeak >= b.oilPeak - 1e-6 * scale // the exact peak includes turning points between the integrator's steps
          && Math.abs(a.energyIn - a.energyStored - a.energyLost) <= 1e-9 * Math.max(1, a.energyIn);
      }), { seed: 1, numRuns: 40 });
  });
});
